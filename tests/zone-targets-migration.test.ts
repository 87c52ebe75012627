import { describe, expect, it } from 'vitest';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { createSheet } from '@/lib/species/mutations';
import { down, up } from '@/migrations/0006-zone-derived-uvb-targets';
import { SpeciesSheet } from '@/models';
import { createOrganisation, testDb, withTestDatabase } from './helpers/db';

withTestDatabase();

// A sheet as the starting catalogue seeded it before the broadband hints were derived from the zone.
const OLD_SOURCE = {
  citation: 'Common practice, no published source: keepers’ rule of thumb for broadband UVB meters',
  confidence: 'rough guide only',
  covers: ['uvbTargetUw' as const],
};

async function oldSheet(organisationId: number, seedKey: string, target: { min: number; max: number }) {
  const sheet = STARTING_SHEETS.find((s) => s.seedKey === seedKey)!;
  return createSheet(organisationId, { ...sheet, uvbTargetUw: target, sources: [OLD_SOURCE] }, null, {
    seedKey,
  });
}

describe('migration 0006: zone-derived broadband hints', () => {
  it('brings untouched seeded sheets in line with their zone and leaves edited ones alone', async () => {
    const org = await createOrganisation();
    const dragon = await oldSheet(org.id, 'pogona-vitticeps', { min: 25, max: 50 });
    const gecko = await oldSheet(org.id, 'correlophus-ciliatus', { min: 12, max: 25 });
    const edited = await oldSheet(org.id, 'uromastyx-ornata', { min: 30, max: 60 });
    const context = testDb().getQueryInterface();

    await up({ context });
    const now = (s: SpeciesSheet) => SpeciesSheet.findByPk(s.id);
    const d = (await now(dragon))!;
    // Zone 4 basking UV Index 4.5–9.5 (Ferguson et al. 2010, Zoo Biology 29:317–334) at 0.04 per µW/cm².
    expect([d.uvbTargetMinUw, d.uvbTargetMaxUw]).toEqual([115, 235]);
    const seeded = STARTING_SHEETS.find((s) => s.seedKey === 'pogona-vitticeps')!;
    expect([d.uvbTargetMinUw, d.uvbTargetMaxUw]).toEqual([seeded.uvbTargetUw!.min, seeded.uvbTargetUw!.max]);
    expect(JSON.parse(d.sourcesJson)[0].citation).toBe(
      seeded.sources.find((s) => s.covers.includes('uvbTargetUw'))!.citation,
    );
    const g = (await now(gecko))!;
    expect([g.uvbTargetMinUw, g.uvbTargetMaxUw]).toEqual([15, 35]);
    const e = (await now(edited))!;
    expect([e.uvbTargetMinUw, e.uvbTargetMaxUw]).toEqual([30, 60]);

    await down({ context });
    const back = (await now(dragon))!;
    expect([back.uvbTargetMinUw, back.uvbTargetMaxUw]).toEqual([25, 50]);
    expect(JSON.parse(back.sourcesJson)[0].citation).toBe(OLD_SOURCE.citation);
  });
});
