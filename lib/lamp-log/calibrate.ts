import type { LampCalibration, LampObject } from '@/simulation';
import { LAMP_TECHS, ORDINARY_HOURS_PER_DAY } from '@/simulation';
import { dayNumber, DAYS_PER_MONTH, isoDay } from './dates';
import { defaultDecayFor } from './decay';
import { predict } from './fit';
import { toBareReference, type LampShape } from './geometry';
import { lampOutlook, type LampFacts, type ReadingFacts } from './outlook';

/**
 * Calibration: a lamp's meter readings replace the catalogue figures of its design lamp object, so the
 * studio's fields show this lamp rather than an average one. Pure: readings + lamp → proposed fields.
 *
 *  - `uvbAt30` (new, bare, 30 cm): the fitted output at first use. The outlook has brought every reading
 *    to the bare lamp at 30 cm (geometry.ts, `toBareReference`): a lid or screen it was read through is
 *    taken out there, once, because the design's own mesh objects put it back in the engine. Readings
 *    taken under the installed reflector are divided by the object's reflector gain.
 *    With only UV Index readings it is the UVI at 30 cm divided by the lamp's UVI-per-µW/cm² ratio.
 *  - `uviPerUvb`: the median ratio of UVI to µW/cm² readings taken at the same distance within an hour.
 *  - `decay`: the fitted curve as a table of (month, output factor), when the readings show the shape.
 *  - `ageMonths`: the lamp's age today, so the studio opens at "now".
 */

export type CalibratedFields = Partial<Pick<LampObject, 'uvbAt30' | 'uviPerUvb' | 'decay' | 'ageMonths'>>;

export type CalibrationNote = { at: string; from: number };

export type Calibration =
  | {
      ok: true;
      fields: CalibratedFields;
      calibrated: CalibrationNote;
      changes: { field: keyof CalibratedFields; from: unknown; to: unknown }[];
      notes: string[];
    }
  | { ok: false; reason: string };

/** Readings of both kinds taken together: same distance (±0.5 cm) within an hour. */
const PAIR_CM = 0.5;
const PAIR_MS = 60 * 60 * 1000;

export function pairedRatio(
  readings: readonly ReadingFacts[],
  shape: LampShape,
): { ratio: number; pairs: number } | null {
  // Each reading as the bare lamp at 30 cm, so a pair taken through different screens still compares.
  const bare = (r: ReadingFacts) => {
    const ref = toBareReference(shape, r);
    return ref.ok ? ref.value : null;
  };
  const uvb = readings.filter((r) => r.unit === 'uvb' && r.value > 0 && bare(r) !== null);
  const uvi = readings.filter((r) => r.unit === 'uvi' && r.value >= 0 && bare(r) !== null);
  const ratios: number[] = [];
  for (const a of uvi) {
    const ta = new Date(a.takenAt).getTime();
    const match = uvb
      .filter((b) => Math.abs(b.distanceCm - a.distanceCm) <= PAIR_CM)
      .map((b) => ({ b, dt: Math.abs(new Date(b.takenAt).getTime() - ta) }))
      .filter((m) => m.dt <= PAIR_MS)
      .sort((x, y) => x.dt - y.dt)[0];
    if (match) ratios.push((bare(a) as number) / (bare(match.b) as number));
  }
  if (ratios.length === 0) return null;
  ratios.sort((x, y) => x - y);
  const mid = Math.floor(ratios.length / 2);
  const ratio = ratios.length % 2 ? ratios[mid]! : (ratios[mid - 1]! + ratios[mid]!) / 2;
  return { ratio, pairs: ratios.length };
}

const round = (v: number, digits: number) => Math.round(v * 10 ** digits) / 10 ** digits;

export function calibrate(
  lamp: LampFacts,
  readings: readonly ReadingFacts[],
  object: LampObject,
  today: string,
): Calibration {
  const usable = readings.filter((r) => r.value > 0 && r.distanceCm > 0);
  if (usable.length === 0) return { ok: false, reason: 'No readings to calibrate from yet.' };
  if (object.tech !== lamp.type.tech) {
    return {
      ok: false,
      reason: `The design lamp “${object.id}” is a ${object.tech} lamp, but this lamp is ${lamp.type.tech}. Link the right design lamp.`,
    };
  }
  const outlook = lampOutlook(lamp, usable, null, today);
  const fit = outlook.fit;
  const unit = outlook.unit;
  if (!unit || fit.kind === 'none') return { ok: false, reason: 'No readings to calibrate from yet.' };

  const notes: string[] = [];
  const fields: CalibratedFields = {};
  const gain = object.reflectorGain ?? 1;
  const decay = (d: number) => (predict(fit, d, () => 1) ?? 0) / (predict(fit, 0, () => 1) || 1);
  const e0 = predict(fit, 0, () => 1);
  const pair = pairedRatio(usable, lamp.type);
  const currentRatio = object.uviPerUvb ?? LAMP_TECHS[object.tech].uviPerUvb;
  if (pair) {
    fields.uviPerUvb = round(pair.ratio, 4);
    notes.push(`UVI per µW/cm² from ${pair.pairs} paired reading${pair.pairs > 1 ? 's' : ''}.`);
  }

  // The fit's value at day 0 (first use); for a scaled default curve that is its scale.
  const start = fit.kind === 'default-scaled' ? fit.scale : (e0 as number);
  if (unit === 'uvb') {
    fields.uvbAt30 = round(start / gain, 1);
  } else {
    const ratio = fields.uviPerUvb ?? currentRatio;
    if (!(ratio > 0))
      return { ok: false, reason: 'UV Index readings need a UVI-per-µW/cm² ratio to calibrate.' };
    fields.uvbAt30 = round(start / ratio / gain, 1);
    notes.push('From UV Index readings, converted with the lamp’s UVI-per-µW/cm² ratio.');
  }
  if (gain !== 1) notes.push(`Readings taken under the reflector were divided by its gain (${gain}).`);

  if (fit.kind === 'exponential' || fit.kind === 'two-phase' || lamp.hoursPerDay !== ORDINARY_HOURS_PER_DAY) {
    // A fitted shape (or the usual shape at this lamp's pace) as a month-by-month table for the engine.
    const maxMonths = Math.min(600, Math.max(24, Math.ceil(outlook.ageMonths) + 12));
    const step = Math.max(1, Math.ceil(maxMonths / 199));
    const curve =
      fit.kind === 'default-scaled'
        ? (d: number) => (predict(fit, d, defaultDecayFor(lamp.type, lamp.hoursPerDay)) as number) / fit.scale
        : decay;
    const points: [number, number][] = [];
    for (let m = 0; m <= maxMonths; m += step) {
      points.push([m, round(Math.min(2, Math.max(0, curve(m * DAYS_PER_MONTH))), 4)]);
    }
    fields.decay = { points };
    notes.push(
      fit.kind === 'default-scaled'
        ? `Decay: the usual curve at ${lamp.hoursPerDay} hours a day.`
        : `Decay: fitted from ${fit.n} readings.`,
    );
  }
  if (fit.certainty !== 'fitted') notes.push(fit.note);
  fields.ageMonths = round(outlook.ageMonths, 1);

  const latest = Math.max(...usable.map((r) => dayNumber(r.takenAt)));
  const changes = (Object.keys(fields) as (keyof CalibratedFields)[]).map((field) => ({
    field,
    from: object[field] ?? null,
    to: fields[field],
  }));
  return { ok: true, fields, calibrated: { at: isoDay(latest), from: usable.length }, changes, notes };
}

/** The design file's note of a calibration (the lamp object's `calibration` field). */
export function designCalibrationNote(note: CalibrationNote): LampCalibration {
  return { at: note.at, from: `${note.from} meter reading${note.from === 1 ? '' : 's'}` };
}

/** The design lamp object with the calibrated fields, and the note of where they came from, written onto it. */
export function applyCalibration(
  object: LampObject,
  fields: CalibratedFields,
  note?: CalibrationNote,
): LampObject {
  return { ...object, ...fields, ...(note ? { calibration: designCalibrationNote(note) } : {}) };
}
