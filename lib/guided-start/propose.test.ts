import { describe, expect, it } from 'vitest';
import { assess, LAMP_CONTROL, neededBaskingCm, parseDesign, probe } from '@/simulation';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { targetWarning } from '@/lib/species/consistency';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { toEngineSheet } from '@/lib/species/to-engine';
import { explain } from './explain';
import { buildDesign, HEAT_LAMP_ID, PERCH_ID, UV_LAMP_ID } from './layout';
import { propose } from './propose';
import { blockedMessage } from './blocked';
import { TYPICAL_ENCLOSURES } from './typical-enclosures';

const catalogue: LampTypeDto[] = STARTING_LAMP_TYPES.map((t, i) => ({
  ...t,
  id: i + 1,
  organisationId: 1,
  updatedAt: '2025-01-01T00:00:00.000Z',
}));

describe('guided start proposal, for every starting species in its usual enclosure', () => {
  it('knows a usual enclosure for every starting sheet', () => {
    expect(Object.keys(TYPICAL_ENCLOSURES).sort()).toEqual(STARTING_SHEETS.map((s) => s.seedKey).sort());
  });

  it.each(STARTING_SHEETS.map((s) => [s.commonName, s] as const))(
    '%s: the proposal passes every finding of the engine’s assessment, and says why',
    (_name, sheet) => {
      const { enclosure, lid } = TYPICAL_ENCLOSURES[sheet.seedKey]!;
      const species = toEngineSheet(sheet);
      const p = propose({ species, enclosure, lid }, catalogue);
      expect(p, 'no proposal').not.toBeNull();
      if (!p) return;

      // The design is a valid design file, and the assessment is the engine's own.
      const parsed = parseDesign(p.design);
      expect(parsed.ok).toBe(true);
      const again = assess(p.design, species, { cellCm: 2 });
      expect(again.overall).toBe(p.assessment.overall);

      // Every finding passes for every starting species: UV and heat on one basking spot as long as the
      // animal needs, the lamps out of reach (for climbers, of the mesh they hang from too), the eyes,
      // the refuge, the gradient, the cool end, the night. Nothing is left to explain away.
      for (const f of p.assessment.findings) expect(f.status, `${f.id}: ${f.message}`).toBe('pass');
      expect(p.unmet).toEqual([]);
      expect(p.harmful).toEqual([]);
      const ids = (...want: string[]) => want.every((id) => p.assessment.findings.some((f) => f.id === id));
      expect(
        ids('basking-uvi', 'shared-basking', 'hot-spot', 'lamp-in-reach', 'eye-safety', 'uv-refuge'),
      ).toBe(true);

      // The shared basking spot is sized to the animal: 0.4 × its adult length (the engine's rule).
      const shared = p.assessment.findings.find((f) => f.id === 'shared-basking')!;
      expect(sheet.adultLengthCm).not.toBeNull();
      expect(shared.numbers.neededCm).toBeCloseTo(Math.max(5, 0.4 * sheet.adultLengthCm!), 6);
      expect(shared.numbers.overlapCm! + 0.5).toBeGreaterThanOrEqual(shared.numbers.neededCm!);

      // A climber under a mesh lid: every lamp stands beyond the reach distance above the mesh it hangs
      // from (15 cm, common practice, no published source), and the check counted the mesh as reachable.
      const lamps = p.design.objects.filter((o) => o.type === 'lamp');
      if (sheet.climbs && lid === 'mesh') {
        for (const l of lamps) expect(l.y - enclosure.height).toBeGreaterThanOrEqual(15);
        expect(p.candidate.mount).toBe('raised');
      }

      // The sheets' broadband hints are derived from their UV zone, so the two never contradict each
      // other (zones: Ferguson et al. 2010, Zoo Biology 29:317–334).
      if (sheet.uvbTargetUw) expect(targetWarning(sheet.uvZone, sheet.uvbTargetUw)).toBeNull();

      const text = explain(p, species, enclosure, lid);
      // It says why: one basking spot (Baines et al. 2016), and how to switch each lamp from the
      // engine's control table — UV lamps on a timer for the sheet's photoperiod, never dimmed.
      const line = (h: string) => text.find((l) => l.heading === h)?.text ?? '';
      expect(line('One basking spot')).toMatch(/Baines et al\. 2016/);
      expect(line('Lamp control')).toMatch(/timer/);
      for (const l of lamps) {
        if (l.type !== 'lamp') continue;
        const sentence = line('Lamp control')
          .split(/(?<=\.)\s+(?=Switch|Run)/)
          // Twin lamps are numbered in the design ("… (2 of 2)"); the sentence names their type.
          .find((t) => t.includes(l.name!.replace(/ \(\d+ of \d+\)$/, '')));
        expect(sentence, l.name).toMatch(
          LAMP_CONTROL[l.tech].control === 'timer-only' ? /by a timer only.*never dim/ : /thermostat/,
        );
      }
      if (sheet.climbs && lid === 'mesh') expect(line('Climbing')).toMatch(/above the lid/);
      expect(text.some((l) => l.heading.startsWith('Not met'))).toBe(false);

      // The pieces the guided start promises are there.
      const objectIds = p.design.objects.map((o) => o.id);
      expect(objectIds).toContain(UV_LAMP_ID);
      expect(objectIds).toContain(PERCH_ID);
      expect(p.design.objects.some((o) => o.type === 'hide')).toBe(true);
      if (p.candidate.heat) expect(objectIds).toContain(HEAT_LAMP_ID);
      // The walls the guided start was told are the walls the air model used.
      expect(p.design.enclosure.walls ?? 'glass').toBe(enclosure.walls ?? 'glass');
      expect(text.map((l) => l.heading)).toEqual(
        expect.arrayContaining(['UV lamp', 'Basking UV', 'Heat', 'Refuge']),
      );
    },
  );
});

describe('guided start proposal, edge cases', () => {
  const dragon = toEngineSheet(STARTING_SHEETS.find((s) => s.seedKey === 'pogona-vitticeps')!);
  const enclosure = { width: 120, height: 60, depth: 60, roomTempC: 22 };

  it('never hangs a UV lamp over a glass lid (glass passes no UVB, Duarte et al. 2009)', () => {
    const p = propose({ species: dragon, enclosure, lid: 'glass' }, catalogue)!;
    expect(p.candidate.mount).toBe('inside');
  });

  it('says plainly that no safe design exists rather than proposing one that could hurt the animal', () => {
    // A White's tree frog wants a basking surface of 28–31 °C (the sheet, from memory); in a room at
    // 35 °C every surface is hotter than that whatever the lamps do.
    const frogSheet = STARTING_SHEETS.find((s) => s.seedKey === 'litoria-caerulea')!;
    const frog = toEngineSheet(frogSheet);
    const hot = { width: 45, height: 60, depth: 45, roomTempC: 35 };
    const p = propose({ species: frog, enclosure: hot, lid: 'mesh' }, catalogue)!;
    expect(p.harmful.map((f) => f.id)).toContain('hot-spot');
    const message = blockedMessage(frogSheet.commonName, p.harmful);
    expect(message).toMatch(/No set-up from your lamp catalogue keeps a White’s tree frog safe/);
    expect(message).toMatch(/will not propose a design that could hurt the animal/);
    // The same frog in a usual room gets a design that passes.
    const ok = propose({ species: frog, enclosure: { ...hot, roomTempC: 22 }, lid: 'mesh' }, catalogue)!;
    expect(ok.harmful).toEqual([]);
  });

  it('tells the air model what the walls are made of', () => {
    // Wood holds the lamps' heat (U 2.5 against glass's 5 W/m²K, both from memory): the same lamps warm
    // the air under the lid more in a wooden vivarium than in a glass one (the engine's air model: the
    // rise under the lid is inversely proportional to U, so about twice).
    const glass = propose(
      { species: dragon, enclosure: { ...enclosure, walls: 'glass' }, lid: 'mesh' },
      catalogue,
    )!;
    const wooden = buildDesign(
      { ...enclosure, walls: 'wood' },
      'mesh',
      glass.candidate,
      neededBaskingCm(dragon),
    )!;
    expect(wooden.enclosure.walls).toBe('wood');
    expect(glass.design.enclosure.walls).toBeUndefined();
    // Near the lid at the cool end, far from the lamps' beams: what the air does.
    const underLid = (d: typeof wooden) =>
      probe(d, [{ x: 3, y: enclosure.height - 1 }], { cellCm: 2 })[0]!.tempC;
    const rise = (d: typeof wooden) => underLid(d) - enclosure.roomTempC;
    expect(rise(glass.design)).toBeGreaterThan(0.5);
    expect(rise(wooden) / rise(glass.design)).toBeGreaterThan(1.6);
  });

  it('returns null when the catalogue has no UV lamp', () => {
    const heatOnly = catalogue.filter((t) => t.uvbAt30 === 0);
    expect(propose({ species: dragon, enclosure, lid: 'mesh' }, heatOnly)).toBeNull();
  });

  it('leaves out tubes longer than the enclosure', () => {
    const narrow = { width: 40, height: 50, depth: 40, roomTempC: 22 };
    const p = propose({ species: dragon, enclosure: narrow, lid: 'mesh' }, catalogue);
    expect(p?.candidate.uv.form).toBe('bulb');
  });
});
