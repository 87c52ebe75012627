/**
 * Every place that uses a lamp's lifetime takes it from the engine's one table (LAMP_LIFETIME): the
 * studio's ageing preview (a lamp of the technology, and a lamp placed from the starting catalogue), the
 * catalogue's starting entries and its form's defaults, the lamp log's outlook (replacement date, share of
 * output left, next test), the reminders and the guided start (its design and its explanation). Walks every
 * technology through each of them and reads what each one actually uses, so a copy that drifts fails here.
 * The table's own figures and their sources are checked in simulation/model/lifetime.test.ts.
 */
import { describe, expect, it } from 'vitest';
import {
  LAMP_LIFETIME,
  LAMP_PRESETS,
  LAMP_TECH_IDS,
  LAMP_TECHS,
  lampUvbFactor,
  resolveLamp,
  techHalfLifeMonths,
  type LampObject,
  type LampPresetId,
  type LampTech,
} from '@/simulation';
import { STARTING_LAMP_TYPES, type StartingLampType } from '@/lib/lamp-types/starting-lamp-types';
import { lampObjectFromType } from '@/lib/lamp-types/to-engine';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { lampOutlook, type LampFacts } from '@/lib/lamp-log/outlook';
import { dayNumber, DAYS_PER_MONTH } from '@/lib/lamp-log/dates';
import { dueItems } from '@/lib/reminders/due';
import { buildDesign } from '@/lib/guided-start/layout';
import { explain } from '@/lib/guided-start/explain';
import { lampPayload, techDefaults } from '@/components/catalogue/lamp-form-state';
import { applyTech } from '@/components/studio/state/lampPresets';
import { defaultLamp } from '@/shared/object-kinds/lamp';

/** Months (to a quarter) until a lamp object's UVB is half of new in the studio's ageing, or null if never. */
function studioHalfLife(obj: LampObject): number | null {
  const r = resolveLamp({ ...obj, ageMonths: 0 });
  for (let m = 0; m <= 600; m += 0.25) if (lampUvbFactor(r, m) <= 0.5) return m;
  return null;
}

function entryOf(tech: LampTech): StartingLampType {
  const preset = (Object.keys(LAMP_PRESETS) as LampPresetId[]).find(
    (k) => LAMP_PRESETS[k].lamp.tech === tech,
  )!;
  return STARTING_LAMP_TYPES.find((t) => t.presetKey === preset)!;
}

const dto = (t: StartingLampType): LampTypeDto => {
  const { presetKey, ...rest } = t;
  return { ...rest, presetKey, id: 1, organisationId: 1, updatedAt: '2026-01-01T00:00:00.000Z' };
};

const FIRST_USED = '2026-01-05';
const monthsSince = (day: string) => (dayNumber(day) - dayNumber(FIRST_USED)) / DAYS_PER_MONTH;

function logLamp(t: StartingLampType): LampFacts {
  return {
    id: 1,
    label: 'Lamp',
    firstUsedOn: FIRST_USED,
    hoursPerDay: 12,
    retiredOn: null,
    baskingDistanceCm: null,
    baskingTransmission: null,
    type: { ...t, lengthCm: t.lengthCm },
  };
}

const sheet = {
  name: 'Test lizard',
  uvZone: 3 as const,
  baskingSurfaceC: [30, 35] as [number, number],
  coolEndC: [22, 28] as [number, number],
};

describe.each(LAMP_TECH_IDS.map((t) => [t] as const))('the lifetime of %s', (tech) => {
  const life = LAMP_LIFETIME[tech];
  const half = techHalfLifeMonths(tech);
  const entry = entryOf(tech);
  const uv = LAMP_TECHS[tech].uvbAt30 > 0;

  it('the studio ages a lamp of the technology, and one placed from the catalogue, by the table', () => {
    const own = applyTech(defaultLamp('l1', 30, 50), tech);
    expect(studioHalfLife(own)).toBe(half === null ? null : Math.round(half * 4) / 4);
    const placed = lampObjectFromType(entry, { id: 'l2', x: 30, y: 50 });
    expect(studioHalfLife(placed)).toBe(half === null ? null : Math.round(half * 4) / 4);
  });

  it('the catalogue seeds, and its form suggests, the table’s half-life and replacement interval', () => {
    expect(entry.halfLifeMonths).toBe(half);
    expect(entry.replaceAfterMonths).toBe(life.replaceMonths);
    const form = lampPayload({
      ...techDefaults(tech, 'cm'),
      name: 'New lamp',
      notes: '',
      sources: {},
      length: '55',
    });
    expect(form.halfLifeMonths).toBe(half);
    expect(form.replaceAfterMonths).toBe(life.replaceMonths);
  });

  it('the lamp log’s outlook and the reminders use the table’s figures', () => {
    const lamp = logLamp(entry);
    const today = '2026-02-01';
    const o = lampOutlook(lamp, [], null, today);
    if (!uv) {
      expect(o.status).toBe('heat-only');
      expect(o.replaceDueOn).toBeNull();
      expect(o.testDueOn).toBeNull();
      return;
    }
    // Replacement without readings: the usual interval, in months of 12-hour days.
    if (life.replaceMonths === null) expect(o.replaceDueOn).toBeNull();
    else expect(monthsSince(o.replaceDueOn!)).toBeCloseTo(life.replaceMonths, 1);
    // The share of output left follows the table's curve.
    if (half !== null) {
      const atHalf = lampOutlook(lamp, [], null, isoAfterMonths(half));
      expect(atHalf.remainingFraction).toBeCloseTo(0.5, 1);
    }
    // The next test after a reading: the table's test interval.
    const reading = { takenAt: '2026-03-01T12:00:00.000Z', distanceCm: 30, value: 40, unit: 'uvb' as const };
    const tested = lampOutlook(lamp, [reading], null, '2026-03-02');
    expect(monthsSince(tested.testDueOn!) - monthsSince('2026-03-01')).toBeCloseTo(life.testMonths!, 1);

    // The reminder for the replacement goes out for the same date.
    if (life.replaceMonths !== null) {
      const items = dueItems(
        [
          {
            lampId: 1,
            label: 'Lamp',
            enclosureName: 'Tank',
            keeperId: 1,
            status: o.status,
            testDueOn: o.testDueOn,
            replaceDueOn: o.replaceDueOn,
            replaceBasis: o.replaceBasis,
            reasons: o.reasons,
          },
        ],
        o.replaceDueOn!,
      );
      const replace = items.find((i) => i.kind === 'replace')!;
      expect(monthsSince(replace.dueOn)).toBeCloseTo(life.replaceMonths, 1);
    }
  });

  it('the guided start’s design and explanation use the table', () => {
    const uvEntry = uv ? entry : entryOf('t5');
    const enc = { width: 120, height: 60, depth: 60, roomTempC: 24 };
    const candidate = {
      uv: dto(uvEntry),
      reflector: false,
      heat: uv ? null : dto(entry),
      mount: 'above' as const,
      perchTopCm: 30,
    };
    const design = buildDesign(enc, 'mesh', candidate)!;
    const lamps = design.objects.filter((o): o is LampObject => o.type === 'lamp');
    const placed = lamps.find((l) => l.tech === tech)!;
    expect(studioHalfLife(placed)).toBe(half === null ? null : Math.round(half * 4) / 4);
    if (!uv) return;
    const text = explain(
      { candidate, design, assessment: { findings: [], overall: 'pass' }, unmet: [], harmful: [] },
      sheet,
      enc,
      'mesh',
    ).find((l) => l.heading === 'Lamp life')!.text;
    if (life.replaceMonths === null) expect(text).toMatch(/no established replacement interval/);
    else expect(Number(/after about (\d+(?:\.\d+)?) months/.exec(text)?.[1])).toBe(life.replaceMonths);
    expect(Number(/falls to about half in (\d+(?:\.\d+)?) months/.exec(text)?.[1])).toBe(half);
    expect(Number(/every (\d+(?:\.\d+)?) months/.exec(text)?.[1])).toBe(life.testMonths);
  });
});

function isoAfterMonths(months: number): string {
  const d = new Date((dayNumber(FIRST_USED) + Math.round(months * DAYS_PER_MONTH)) * 86_400_000);
  return d.toISOString().slice(0, 10);
}
