import { describe, expect, it } from 'vitest';
import { lampListQuery, listLamps } from '@/lib/lamp-log/list-queries';
import { todayIso } from '@/lib/lamp-log/dates';
import { computeOutlooks, outlookJson } from '@/lib/lamp-log/stored-outlooks';
import { readStoredDesign } from '@/lib/variants/stored-design';
import { Lamp, LampOutlook, User, Variant } from '@/models';
import {
  addToOrganisation,
  countScaleRows,
  createScaleOrganisation,
  findScaleOrganisation,
  scaledSize,
} from '../scripts/lib/scale-org';
import { testDb, withTestDatabase } from './helpers/db';

// The scale benchmark's generated organisation (`npm run bench:scale`), at a tiny size: it makes the
// rows it is asked for, in this organisation only, with stored outlooks the lamp log reads, and grows
// the same organisation when asked again. Counts only: speed is the benchmark's to print.
withTestDatabase();

describe('the scale benchmark’s organisation', () => {
  it('has the rows asked for, outlooks the lamp log reads, and grows when asked again', async () => {
    const size = { enclosures: 12, lamps: 40, readings: 300, designs: 3 };
    expect(scaledSize(size, 2)).toEqual({ enclosures: 24, lamps: 80, readings: 600, designs: 6 });

    const org = await createScaleOrganisation('scale test');
    const added = await addToOrganisation(testDb(), org, size);
    expect(added).toMatchObject({ ...size, variants: 6, keepers: 2, outlooks: 40 });
    // The benchmark signs in as the owner: sign-in refuses an address never confirmed.
    expect((await User.findOne({ where: { email: org.ownerEmail } }))?.emailConfirmedAt).toBeInstanceOf(Date);
    expect(await countScaleRows(testDb(), org.organisationId)).toEqual({
      ...size,
      variants: 6,
      keepers: 2,
      outlooks: 40,
    });

    // Every variant is a design the app can read, and the lamp log lists the lamps from stored outlooks.
    const variants = await Variant.findAll();
    expect(variants).toHaveLength(6);
    for (const v of variants) expect(readStoredDesign(v.designJson).objects.length).toBeGreaterThan(1);
    const { keeper: _keeper, ...query } = lampListQuery.parse({
      organisationId: String(org.organisationId),
      limit: '50',
      // Retired lamps too: the generated histories retire a few.
      retired: '1',
    });
    const page = await listLamps(query);
    expect(page.total).toBe(40);
    expect(page.counts.pending).toBe(0);

    // Growing the same organisation: the earlier rows stay, the new ones add up.
    await addToOrganisation(testDb(), org, scaledSize(size, 1), { offset: size.enclosures });
    expect(await countScaleRows(testDb(), org.organisationId)).toEqual({
      enclosures: 24,
      lamps: 80,
      readings: 600,
      designs: 6,
      variants: 12,
      keepers: 4,
      outlooks: 80,
    });
    const found = await findScaleOrganisation(testDb());
    expect(found).toMatchObject({
      organisationId: org.organisationId,
      ownerEmail: org.ownerEmail,
      size: { enclosures: 24, lamps: 80, readings: 600, designs: 6 },
    });
  }, 180_000);
});

describe('the scale benchmark’s seeded outlooks', () => {
  it('are what a fresh recompute gives, for lamps that share a history as for the rest', async () => {
    // Two enclosures, 45 UV lamps on 2 × 12 histories: many lamps share one, so most outlooks are copies.
    const size = { enclosures: 2, lamps: 60, readings: 450, designs: 1 };
    const org = await createScaleOrganisation('scale outlook test');
    const added = await addToOrganisation(testDb(), org, size);
    expect(added.outlooks).toBe(60);
    expect(added.computedOutlooks).toBeLessThan(60);

    const today = todayIso();
    const lamps = await Lamp.findAll({ order: [['id', 'ASC']] });
    expect(lamps).toHaveLength(60);
    const fresh = await computeOutlooks(lamps, today);
    const stored = new Map((await LampOutlook.findAll()).map((o) => [o.lampId, o]));
    const statuses = new Set<string>();
    for (const c of fresh) {
      const row = stored.get(c.lamp.id)!;
      expect(row, `lamp ${c.lamp.id}`).toBeTruthy();
      const o = c.outlook;
      statuses.add(o.status);
      expect(JSON.parse(row.outlookJson), `lamp ${c.lamp.id}`).toEqual(
        JSON.parse(JSON.stringify(outlookJson(c.species, o))),
      );
      expect({
        status: row.status,
        testDueOn: row.testDueOn,
        replaceDueOn: row.replaceDueOn,
        fallsBelowOn: row.fallsBelowOn,
        lastReadingAt: row.lastReadingAt?.toISOString() ?? null,
        asOf: row.asOf,
        sourceVersion: row.sourceVersion,
      }).toEqual({
        status: o.status,
        testDueOn: o.testDueOn,
        replaceDueOn: o.replaceDueOn,
        fallsBelowOn: o.fallsBelowOn,
        lastReadingAt: o.lastReading ? new Date(o.lastReading.takenAt).toISOString() : null,
        asOf: today,
        sourceVersion: c.lamp.outlookVersion,
      });
    }
    // Shared histories still give the lamp log more than one status to show.
    expect(statuses.size).toBeGreaterThan(1);
  }, 180_000);
});
