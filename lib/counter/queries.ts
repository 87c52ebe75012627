import 'server-only';
import { invalid } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import { counterLampFor } from '@/lib/customers/access';
import { todayIso } from '@/lib/lamp-log/dates';
import type { SpeciesNeed } from '@/lib/lamp-log/need';
import type { ReadingFacts } from '@/lib/lamp-log/outlook';
import { lampFacts, needOfSheet, readingFacts } from '@/lib/lamp-log/facts';
import { allLampTypes, toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import { allSheets } from '@/lib/species/queries';
import { CounterLamp, CounterReading, Customer, LampType, SpeciesSheet } from '@/models';
import { throughShare } from '@/shared/reading-setup';
import { displayToCm } from '@/shared/units';
import { assessCounterLamp, firstUsedFromMonths, type CounterVerdict } from './assess';
import type { AssessInput, CounterLampInput, CounterReadingInput } from './schemas';

/** Reads of the counter: a test's answer before it is saved, and a kept lamp with its readings. */

const round1 = (v: number) => Math.round(v * 10) / 10;

export type CounterAnswerDto = {
  verdict: CounterVerdict;
  lampTypeName: string;
  firstUsedOn: string;
  ageMonths: number;
  fit: { kind: string; n: number; note: string };
  readingNotes: string[];
  photoperiod: string | null;
  speciesName: string | null;
  /** Earlier readings of this lamp that went into the answer. */
  earlierReadings: number;
};

/** The lamp's columns as the customer described it (distances in cm, the age as a date). */
export function lampColumns(l: CounterLampInput, today: string) {
  return {
    lampTypeId: l.lampTypeId,
    firstUsedOn: l.firstUsedOn ?? firstUsedFromMonths(today, l.ageMonths ?? 0),
    firstUsedEstimated: !l.firstUsedOn,
    hoursPerDay: l.hoursPerDay,
    speciesSheetId: l.speciesSheetId ?? null,
    baskingDistanceCm: l.baskingDistance ? round1(displayToCm(l.baskingDistance, l.lengthUnit)) : null,
    baskingTransmission: l.baskingTransmission ?? null,
    label: l.label,
  };
}

/** A kept lamp's columns, in the shape of a described one. */
const keptColumns = (l: CounterLamp): ReturnType<typeof lampColumns> => ({
  lampTypeId: l.lampTypeId,
  firstUsedOn: l.firstUsedOn,
  firstUsedEstimated: l.firstUsedEstimated,
  hoursPerDay: l.hoursPerDay,
  speciesSheetId: l.speciesSheetId ?? null,
  baskingDistanceCm: l.baskingDistanceCm ?? null,
  baskingTransmission: l.baskingTransmission ?? null,
  label: l.label ?? null,
});

/** The reading's columns: stored in cm, with the share of what lay between (required for a screen). */
export function readingColumns(r: CounterReadingInput, lidShare: number | null, takenAt: Date) {
  const share = throughShare(lidShare, r.through, r.throughTransmission);
  if (!share.ok) throw invalid('reading.throughTransmission', share.message);
  return {
    takenAt,
    distanceCm: round1(displayToCm(r.distance, r.distanceUnit)),
    value: r.value,
    unit: r.unit,
    through: r.through,
    throughTransmission: share.share,
    warmedUp: r.warmedUp,
    meter: r.meter ?? null,
  };
}

type Resolved = {
  organisationId: number;
  existing: CounterLamp | null;
  lamp: ReturnType<typeof lampColumns>;
  type: LampType;
  sheet: SpeciesSheet | null;
  earlier: CounterReading[];
  reading: ReturnType<typeof readingColumns>;
};

/**
 * Everything a test needs, checked against the organisation: the lamp (a new one as described, or a kept
 * one with its earlier readings; home details given now replace the kept ones), its type and species.
 */
export async function resolveTest(user: CurrentUser, input: AssessInput, now: Date): Promise<Resolved> {
  const today = todayIso(now);
  const existing = input.counterLampId ? await counterLampFor(user, input.counterLampId, 'update') : null;
  if (existing && existing.organisationId !== input.organisationId) {
    throw invalid('counterLampId', 'That lamp was tested by another organisation.');
  }
  const described = input.lamp ? lampColumns(input.lamp, today) : null;
  // A kept lamp keeps its type and age; its use and home may have changed since.
  const lamp =
    existing && described
      ? {
          ...keptColumns(existing),
          hoursPerDay: described.hoursPerDay,
          speciesSheetId: described.speciesSheetId,
          baskingDistanceCm: described.baskingDistanceCm,
          baskingTransmission: described.baskingTransmission,
        }
      : (described ?? keptColumns(existing!));
  if (lamp.firstUsedOn > today)
    throw invalid('lamp.firstUsedOn', 'The first switch-on cannot be in the future.');
  const type = await LampType.findByPk(lamp.lampTypeId);
  if (!type || type.organisationId !== input.organisationId) {
    throw invalid('lamp.lampTypeId', 'That lamp type is not in this organisation’s lamp catalogue.');
  }
  const sheet = lamp.speciesSheetId ? await SpeciesSheet.findByPk(lamp.speciesSheetId) : null;
  if (lamp.speciesSheetId && (!sheet || sheet.organisationId !== input.organisationId)) {
    throw invalid('lamp.speciesSheetId', 'That species is not among this organisation’s species sheets.');
  }
  const earlier = existing
    ? await CounterReading.findAll({ where: { counterLampId: existing.id }, order: [['takenAt', 'ASC']] })
    : [];
  const reading = readingColumns(input.reading, lamp.baskingTransmission, now);
  return { organisationId: input.organisationId, existing, lamp, type, sheet, earlier, reading };
}

/** What an answer is computed from: a lamp (a counter lamp, or one in a keeper's enclosure) and its need. */
export type AnswerSource = {
  lampId: number | null;
  lamp: ReturnType<typeof lampColumns>;
  type: LampType;
  species: { need: SpeciesNeed; name: string } | null;
};

const speciesOfSheet = (sheet: SpeciesSheet | null) =>
  sheet ? { need: needOfSheet(sheet), name: sheet.commonName } : null;

/** A resolved counter test as the answer takes it. */
export const sourceOf = (r: Resolved): AnswerSource => ({
  lampId: r.existing?.id ?? null,
  lamp: r.lamp,
  type: r.type,
  species: speciesOfSheet(r.sheet),
});

/** The answer for a lamp and all its readings, computed as the lamp log computes an outlook. */
export function answerOf(r: AnswerSource, readings: ReadingFacts[], today: string): CounterAnswerDto {
  const type = lampTypeDto(r.type);
  const facts = lampFacts(
    {
      id: r.lampId ?? 0,
      label: r.lamp.label ?? type.name,
      firstUsedOn: r.lamp.firstUsedOn,
      hoursPerDay: r.lamp.hoursPerDay,
      retiredOn: null,
      baskingDistanceCm: r.lamp.baskingDistanceCm,
      baskingTransmission: r.lamp.baskingTransmission,
    },
    type,
  );
  const { outlook, verdict } = assessCounterLamp({
    lamp: facts,
    readings,
    species: r.species?.need ?? null,
    today,
    ageEstimated: r.lamp.firstUsedEstimated,
  });
  return {
    verdict,
    lampTypeName: type.name,
    firstUsedOn: r.lamp.firstUsedOn,
    ageMonths: outlook.ageMonths,
    fit: { kind: outlook.fit.kind, n: outlook.fit.n, note: outlook.fit.note },
    readingNotes: outlook.readingNotes,
    photoperiod: outlook.photoperiod,
    speciesName: r.species?.name ?? null,
    earlierReadings: readings.length - 1,
  };
}

/** Every reading of a resolved test, the one taken now last. */
export const readingsOf = (r: Resolved): ReadingFacts[] => [...r.earlier.map(readingFacts), r.reading];

export async function assessTest(user: CurrentUser, input: AssessInput, now = new Date()) {
  const resolved = await resolveTest(user, input, now);
  return answerOf(sourceOf(resolved), readingsOf(resolved), todayIso(now));
}

export type CounterLampView = {
  id: number;
  organisationId: number;
  /** `mayEmail`: the customer has an address and agreed to e-mails. */
  customer: { id: number; name: string; mayEmail: boolean } | null;
  label: string | null;
  lampTypeId: number;
  lampTypeName: string;
  firstUsedOn: string;
  firstUsedEstimated: boolean;
  hoursPerDay: number;
  speciesSheetId: number | null;
  baskingDistanceCm: number | null;
  baskingTransmission: number | null;
  readings: {
    id: number;
    takenAt: string;
    distanceCm: number;
    value: number;
    unit: string;
    through: string;
    verdict: string;
    testAgainOn: string | null;
  }[];
  /** Today's answer from every reading (the lamp's own fit once it has two on different days). */
  answer: CounterAnswerDto | null;
};

/** A kept lamp with its customer, readings and today's answer from all of them. */
export async function counterLampView(lamp: CounterLamp, today = todayIso()): Promise<CounterLampView> {
  const [type, customer, sheet, readings] = await Promise.all([
    LampType.findByPk(lamp.lampTypeId),
    lamp.customerId ? Customer.findByPk(lamp.customerId) : null,
    lamp.speciesSheetId ? SpeciesSheet.findByPk(lamp.speciesSheetId) : null,
    CounterReading.findAll({ where: { counterLampId: lamp.id }, order: [['takenAt', 'ASC']] }),
  ]);
  const kept = keptColumns(lamp);
  const answer =
    type && readings.length > 0
      ? answerOf(
          { lampId: lamp.id, lamp: kept, type, species: speciesOfSheet(sheet) },
          readings.map(readingFacts),
          today,
        )
      : null;
  return {
    id: lamp.id,
    organisationId: lamp.organisationId,
    customer: customer
      ? {
          id: customer.id,
          name: customer.name,
          mayEmail: Boolean(customer.email && customer.reminderConsentAt),
        }
      : null,
    ...kept,
    lampTypeName: type?.name ?? 'Unknown lamp type',
    readings: readings.map((r) => ({
      id: r.id,
      takenAt: r.takenAt.toISOString(),
      distanceCm: r.distanceCm,
      value: r.value,
      unit: r.unit,
      through: r.through,
      verdict: r.verdict,
      testAgainOn: r.testAgainOn ?? null,
    })),
    answer,
  };
}

/** What the counter screen offers: the organisation's lamp catalogue and species sheets, by name. */
export async function counterChoices(organisationId: number) {
  const [types, sheets] = await Promise.all([allLampTypes(organisationId), allSheets(organisationId)]);
  return {
    lampTypes: types.map((t) => ({ id: t.id, name: t.name })).sort((a, b) => a.name.localeCompare(b.name)),
    species: sheets.map((s) => ({ id: s.id, name: s.commonName })),
  };
}
