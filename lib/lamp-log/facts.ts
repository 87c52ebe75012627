import type { LampTypeDto } from '@/lib/lamp-types/schema';
import type { Lamp, Reading, SpeciesSheet } from '@/models';
import type { SpeciesNeed } from './need';
import type { LampFacts, ReadingFacts } from './outlook';

/**
 * The outlook's inputs made from stored rows: a lamp and its type, a reading (of the lamp log, or taken
 * at the counter), a species sheet. The lamp log, the counter, the population curve and the demo use them.
 */

export type LampFactsSource = Pick<
  Lamp,
  'id' | 'label' | 'firstUsedOn' | 'hoursPerDay' | 'retiredOn' | 'baskingDistanceCm' | 'baskingTransmission'
>;

export function lampFacts(lamp: LampFactsSource, type: LampTypeDto): LampFacts {
  return {
    id: lamp.id,
    label: lamp.label,
    firstUsedOn: lamp.firstUsedOn,
    hoursPerDay: lamp.hoursPerDay,
    retiredOn: lamp.retiredOn ?? null,
    baskingDistanceCm: lamp.baskingDistanceCm ?? null,
    baskingTransmission: lamp.baskingTransmission ?? null,
    type: {
      name: type.name,
      tech: type.tech,
      form: type.form,
      lengthCm: type.lengthCm,
      uvbAt30: type.uvbAt30,
      uviPerUvb: type.uviPerUvb,
      halfLifeMonths: type.halfLifeMonths,
      decayPoints: type.decayPoints,
      adoptedCurve: type.adoptedCurve ?? null,
      replaceAfterMonths: type.replaceAfterMonths,
    },
  };
}

/** A stored reading (of the lamp log, or taken at the counter: the same fields) as the outlook takes it. */
export const readingFacts = (
  r: Pick<
    Reading,
    'id' | 'takenAt' | 'distanceCm' | 'value' | 'unit' | 'through' | 'throughTransmission' | 'warmedUp'
  >,
): ReadingFacts => ({
  id: r.id,
  takenAt: r.takenAt,
  distanceCm: r.distanceCm,
  value: r.value,
  unit: r.unit,
  through: r.through,
  throughTransmission: r.throughTransmission ?? null,
  warmedUp: r.warmedUp,
});

/** What a species sheet asks of a lamp's basking zone, as the outlook takes it. */
export function needOfSheet(sheet: SpeciesSheet): SpeciesNeed {
  return {
    name: sheet.commonName,
    uvZone: sheet.uvZone,
    uvbTargetUw:
      sheet.uvbTargetMinUw !== null && sheet.uvbTargetMaxUw !== null
        ? { min: sheet.uvbTargetMinUw, max: sheet.uvbTargetMaxUw }
        : null,
    photoperiodH:
      sheet.photoperiodMinH !== null && sheet.photoperiodMaxH !== null
        ? { min: sheet.photoperiodMinH, max: sheet.photoperiodMaxH }
        : null,
  };
}
