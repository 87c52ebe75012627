import { describe, expect, it } from 'vitest';
import { assess, parseDesign } from '@/simulation';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { targetWarning } from '@/lib/species/consistency';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { toEngineSheet } from '@/lib/species/to-engine';
import { explain } from './explain';
import { HEAT_LAMP_ID, PERCH_ID, UV_LAMP_ID } from './layout';
import { propose } from './propose';
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
    '%s: the proposal passes the engine’s own assessment, or says plainly what it cannot meet and why',
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

      // The things a keeper most needs are met for every starting species.
      const status = (id: string) => p.assessment.findings.find((f) => f.id === id)?.status;
      for (const id of [
        'basking-uvi',
        'uv-refuge',
        'uv-gradient',
        'hot-spot',
        'cool-end',
        'shared-basking',
        'lamp-in-reach',
        'eye-safety',
      ]) {
        expect(status(id), `${id}: ${p.assessment.findings.find((f) => f.id === id)?.message}`).toBe('pass');
      }

      // The sheets' broadband hints are derived from their UV zone, so the two never contradict each
      // other and the hint passes too (zones: Ferguson et al. 2010, Zoo Biology 29:317–334).
      if (sheet.uvbTargetUw) {
        expect(targetWarning(sheet.uvZone, sheet.uvbTargetUw)).toBeNull();
        const uvb = p.assessment.findings.find((f) => f.id === 'basking-uvb');
        expect(uvb?.status, uvb?.message).toBe('pass');
      }

      // Anything else that is not a pass is only a broadband target that contradicts the UV zone, and
      // the explanation says so.
      const unexplained = p.unmet.filter(
        (f) =>
          !(f.id === 'basking-uvb' && sheet.uvbTargetUw && targetWarning(sheet.uvZone, sheet.uvbTargetUw)),
      );
      expect(unexplained.map((f) => `${f.id}: ${f.message}`)).toEqual([]);
      const text = explain(p, species, enclosure, lid);
      for (const f of p.unmet) {
        const line = text.find((l) => l.heading === `Not met: ${f.title}`);
        expect(line?.text).toMatch(/One lamp cannot meet both/);
      }

      // The pieces the guided start promises are there.
      const ids = p.design.objects.map((o) => o.id);
      expect(ids).toContain(UV_LAMP_ID);
      expect(ids).toContain(PERCH_ID);
      expect(p.design.objects.some((o) => o.type === 'hide')).toBe(true);
      if (p.candidate.heat) expect(ids).toContain(HEAT_LAMP_ID);
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
