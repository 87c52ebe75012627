import { describe, expect, it } from 'vitest';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { toColumns } from '@/lib/lamp-types/mutations';
import { down, up } from '@/migrations/0015-lamp-lifetime-table';
import { Lamp, LampType } from '@/models';
import { createEnclosure, createMember, testDb, withTestDatabase } from './helpers/db';

withTestDatabase();

// A catalogue entry as an organisation was seeded with before the lifetime table: the half-life and
// replacement interval the old engine and replacement list gave.
async function oldEntry(organisationId: number, presetKey: string, half: number, replace: number | null) {
  const seeded = STARTING_LAMP_TYPES.find((t) => t.presetKey === presetKey)!;
  const { presetKey: _k, ...input } = seeded;
  return LampType.create({
    organisationId,
    ...toColumns({
      ...input,
      halfLifeMonths: half,
      replaceAfterMonths: replace,
      sources: { ...input.sources, halfLifeMonths: 'old note', replaceAfterMonths: 'old note' },
    }),
    presetKey,
    createdById: null,
    updatedById: null,
  });
}

describe('migration 0015: one lamp lifetime table', () => {
  it('brings untouched seeded entries to the table, leaves edited ones alone and marks outlooks stale', async () => {
    const { organisation: org, user } = await createMember('owner');
    const t8 = await oldEntry(org.id, 't8-medium', 12, 6);
    const mv = await oldEntry(org.id, 'mercury-vapour-160', 13, 12);
    const edited = await oldEntry(org.id, 'metal-halide-70', 18, 12);
    const enclosure = await createEnclosure(org, user);
    const lamp = await Lamp.create({
      enclosureId: enclosure.id,
      lampTypeId: t8.id,
      label: 'Tube',
      firstUsedOn: '2026-01-01',
      hoursPerDay: 12,
      createdById: user.id,
    });
    const versionBefore = (await Lamp.findByPk(lamp.id))!.outlookVersion;
    const context = testDb().getQueryInterface();

    await up({ context });
    const now = async (t: LampType) => (await LampType.findByPk(t.id))!;
    const seededT8 = STARTING_LAMP_TYPES.find((t) => t.presetKey === 't8-medium')!;
    const a = await now(t8);
    // T8 UVB tubes: replaced every 6 months (common practice, no published source); half-life 6 months
    // (from memory) — the migration writes the figures the starting catalogue now seeds.
    expect([a.halfLifeMonths, a.replaceAfterMonths]).toEqual([6, 6]);
    expect([a.halfLifeMonths, a.replaceAfterMonths]).toEqual([
      seededT8.halfLifeMonths,
      seededT8.replaceAfterMonths,
    ]);
    expect(JSON.parse(a.sourcesJson).halfLifeMonths).toBe(seededT8.sources.halfLifeMonths);
    expect(JSON.parse(a.sourcesJson).uvbAt30).toBe(seededT8.sources.uvbAt30);
    const b = await now(mv);
    expect([b.halfLifeMonths, b.replaceAfterMonths]).toEqual([6, 6]);
    const e = await now(edited);
    expect([e.halfLifeMonths, e.replaceAfterMonths]).toEqual([18, 12]);
    expect((await Lamp.findByPk(lamp.id))!.outlookVersion).toBe(versionBefore + 1);

    await down({ context });
    const back = await now(mv);
    expect([back.halfLifeMonths, back.replaceAfterMonths]).toEqual([13, 12]);
    expect(JSON.parse(back.sourcesJson).halfLifeMonths).toMatch(/half-life 13 months/);
  });
});
