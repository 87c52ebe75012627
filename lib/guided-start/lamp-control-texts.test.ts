/**
 * Every text that gives lamp-control advice takes it from the engine's one table (LAMP_CONTROL): a
 * finding, the hot-surface check without a sheet, the cautions (shown by the app and printed in reports)
 * and the guided start's explanation. Walks every technology through every one of them. Self-ballasted
 * mercury vapour and metal halide, fluorescent and LED UV lamps are switched by a timer only and never
 * dimmed or put on a thermostat (common practice, no published source).
 */
import { describe, expect, it } from 'vitest';
import {
  assess,
  controlSummary,
  DESIGN_VERSION,
  LAMP_CONTROL,
  LAMP_TECH_IDS,
  LAMP_TECHS,
  lowerLabel,
  type Design,
  type LampTech,
} from '@/simulation';
import { explain } from './explain';
import type { Proposal } from './propose';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { applicableCautions } from '@/shared/cautions';

const sheet = {
  name: 'Test lizard',
  uvZone: 3 as const,
  baskingSurfaceC: [30, 32] as [number, number],
  coolEndC: [20, 30] as [number, number],
  photoperiodH: [12, 14] as [number, number],
};

/** One lamp of the technology, low over a ledge: far too hot, so the "too hot" advice is given. */
function hotDesign(tech: LampTech): Design {
  return {
    format: 'baskwell.design',
    version: DESIGN_VERSION,
    enclosure: { width: 90, height: 45, depth: 45, roomTempC: 24 },
    objects: [
      {
        type: 'lamp',
        id: 'lamp',
        name: 'The lamp',
        tech,
        form: 'bulb',
        x: 45,
        y: 42,
        watts: 300,
        uvbAt30: LAMP_TECHS[tech].uvbAt30,
      },
      { type: 'ledge', id: 'rock', x: 30, y: 0, width: 30, height: 25 },
    ],
  };
}

const sentences = (text: string) => text.split(/(?<=[.;])\s+/);
const forbidden = /dimming thermostat|on\/off thermostat|turn down the thermostat|run .* on a/i;

function checkTimerOnly(text: string, who: RegExp) {
  for (const s of sentences(text)) {
    if (!who.test(s)) continue;
    if (/thermostat|dim/i.test(s)) expect(s, s).toMatch(/never dim|timer only|separate/i);
    expect(s, s).not.toMatch(forbidden);
  }
}

function lampType(tech: LampTech): LampTypeDto {
  const base = STARTING_LAMP_TYPES[0]!;
  return {
    ...base,
    tech,
    name: `Catalogue ${tech}`,
    id: 1,
    organisationId: 1,
    presetKey: null,
    updatedAt: '2026-01-01T00:00:00.000Z',
  };
}

describe.each(LAMP_TECH_IDS.map((t) => [t] as const))('control advice for %s', (tech) => {
  const rule = LAMP_CONTROL[tech];
  const timerOnly = rule.control === 'timer-only';
  const who = new RegExp(`“The lamp”|${lowerLabel(LAMP_TECHS[tech].label)}|Catalogue ${tech}`, 'i');

  it('has a reason and a mark in the table', () => {
    expect(rule.reason.length).toBeGreaterThan(20);
    expect(['source', 'common practice, no published source', 'from memory']).toContain(rule.mark);
  });

  it('the too-hot finding and the hot-surface check follow the table', () => {
    const d = hotDesign(tech);
    const hot = assess(d, sheet).findings.find((f) => f.id === 'hot-spot')!;
    expect(hot.numbers.hotC).toBeGreaterThan(sheet.baskingSurfaceC[1]);
    const general = assess(d, undefined).findings.find((f) => f.id === 'hot-surface')!;
    for (const text of [hot.message, general.message]) {
      if (timerOnly) {
        checkTimerOnly(text, who);
        expect(text).toMatch(/by a timer only/);
        expect(text).toMatch(/separate, thermostat-controlled heat source|separate thermostat-controlled/);
      } else {
        expect(text).toMatch(
          rule.control === 'dimming-thermostat' ? /dimming thermostat/ : /on\/off thermostat/,
        );
      }
    }
    // The sheet's day length is named for the timer.
    expect(hot.message).toMatch(timerOnly ? /12–14 hour day/ : /thermostat/);
  });

  it('the cautions (app and reports) follow the table and name the photoperiod for UV lamps', () => {
    const d = hotDesign(tech);
    const cautions = applicableCautions({
      design: d,
      assessment: assess(d, sheet),
      photoperiodH: sheet.photoperiodH,
    });
    const control = cautions.find((c) => c.caution.id === 'thermostat')!;
    expect(control.urgent).toBe(true);
    if (timerOnly) {
      checkTimerOnly(control.caution.text, who);
      expect(control.caution.text).toMatch(/timer only \(on for the sheet’s 12–14 hour day\)/);
    } else {
      expect(control.caution.text).toMatch(/thermostat/);
      expect(control.caution.text).not.toMatch(/never dim/);
    }
  });

  it('the guided start’s explanation follows the table', () => {
    const uvTech: LampTech = LAMP_TECHS[tech].uvbAt30 > 0 ? tech : 't5';
    const p: Proposal = {
      candidate: {
        uv: lampType(uvTech),
        reflector: false,
        heat: LAMP_TECHS[tech].uvbAt30 > 0 ? null : lampType(tech),
        mount: 'above',
        perchTopCm: 20,
      },
      design: hotDesign(tech),
      assessment: assess(hotDesign(tech), sheet),
      unmet: [],
      harmful: [],
    };
    const text = explain(p, sheet, { width: 90, height: 45, depth: 45, roomTempC: 24 }, 'mesh');
    const control = text.find((l) => l.heading === 'Lamp control')!.text;
    if (timerOnly) {
      checkTimerOnly(control, who);
      expect(control).toMatch(/by a timer only/);
    } else {
      expect(control).toMatch(/thermostat/);
    }
    for (const line of text) if (line.heading !== 'Lamp control') expect(line.text).not.toMatch(forbidden);
  });

  it('the general summary puts it in the right group', () => {
    const summary = controlSummary();
    const group = summary.split('. ').find((g) => g.includes(LAMP_TECHS[tech].label))!;
    expect(group).toMatch(
      timerOnly ? /timer only, never dimmed/ : rule.control === 'dimming-thermostat' ? /dimming/ : /on\/off/,
    );
  });
});

describe('mercury vapour as the only heat', () => {
  it('is never told to be dimmed', () => {
    const d = hotDesign('mercury-vapour');
    const texts = [
      ...assess(d, sheet).findings.map((f) => f.message),
      ...applicableCautions({ design: d, assessment: assess(d, sheet) }).map((c) => c.caution.text),
    ];
    for (const t of texts) expect(t).not.toMatch(/use a (lower wattage or a )?dimming thermostat/);
    expect(texts.join(' ')).not.toMatch(/turn down the thermostat/);
  });
});

describe('the guided start’s explanation of a surface far too hot', () => {
  it('says "over 100 °C" rather than a figure no thermometer would confirm', () => {
    const d = hotDesign('halogen');
    const assessment = assess(d, sheet);
    const hot = assessment.findings.find((f) => f.numbers.hotC !== undefined)!;
    // The design hangs a halogen a few centimetres over the ledge, so the radiant model reads far past 100.
    expect(hot.numbers.hotC).toBeGreaterThan(100);
    const p: Proposal = {
      candidate: {
        uv: lampType('t5'),
        reflector: false,
        heat: lampType('halogen'),
        mount: 'above',
        perchTopCm: 20,
      },
      design: d,
      assessment,
      unmet: [],
      harmful: [],
    };
    const text = explain(p, sheet, { width: 90, height: 45, depth: 45, roomTempC: 24 }, 'mesh');
    const line = text.map((l) => l.text).find((t) => t.includes('hottest surface'))!;
    expect(line).toMatch(/The hottest surface the animal can reach is over 100 °C/);
    expect(line).not.toMatch(/about \d{3}/);
  });
});
