// Two people save the same variant from the same version at the same moment, round after round, through
// the real PUT /api/variants/[id] handler against the test MariaDB: each round exactly one wins (200) and
// the other gets 409 carrying the winner's version and design; nothing of the loser's is stored.
import { describe, expect, it } from 'vitest';
import * as enclosureDesignsRoute from '@/app/api/enclosures/[id]/designs/route';
import * as variantRoute from '@/app/api/variants/[id]/route';
import { Variant } from '@/models';
import { EXAMPLE_DESIGN } from '@/simulation/testing/fixtures';
import { createEnclosure, createMember, createOrganisation, withTestDatabase } from '../helpers/db';
import { call } from '../api/variants.helpers';

withTestDatabase();

const ROUNDS = 12;

/** A design told apart by the uv lamp's position and a name on every object. */
const designBy = (who: string, round: number) => ({
  ...EXAMPLE_DESIGN,
  objects: EXAMPLE_DESIGN.objects.map((o, i) => ({
    ...o,
    name: `${who} round ${round}`,
    ...(i === 0 ? { x: who === 'staff' ? 20 + round : 80 + round } : {}),
  })),
});

describe('two saves of one version', () => {
  it(`give exactly one success and one 409, ${ROUNDS} rounds in a row`, { timeout: 120_000 }, async () => {
    const org = await createOrganisation('Concurrent rooms');
    const { user: staff } = await createMember('staff', org);
    const { user: keeper } = await createMember('keeper', org);
    const enclosure = await createEnclosure(org, keeper);
    const made = await call(enclosureDesignsRoute.POST, {
      method: 'POST',
      path: `/api/enclosures/${enclosure.id}/designs`,
      params: { id: enclosure.id },
      user: staff,
      body: { name: 'Shared plan', design: EXAMPLE_DESIGN },
    });
    expect(made.status).toBe(201);
    const id = made.body.variant.id as number;
    const save = (user: typeof staff, who: string, round: number, baseVersion: number) =>
      call(variantRoute.PUT, {
        method: 'PUT',
        path: `/api/variants/${id}`,
        params: { id },
        user,
        body: { design: designBy(who, round), baseVersion },
      });

    const winners: string[] = [];
    for (let round = 1, version = 1; round <= ROUNDS; round++, version++) {
      const [a, b] = await Promise.all([
        save(staff, 'staff', round, version),
        save(keeper, 'keeper', round, version),
      ]);
      const context = `round ${round}: ${a.status} / ${b.status}`;
      expect([a.status, b.status].sort(), context).toEqual([200, 409]);
      const [won, lost] = a.status === 200 ? [a, b] : [b, a];
      const who = a.status === 200 ? 'staff' : 'keeper';
      winners.push(who);
      expect(won.body.variant.version, context).toBe(version + 1);
      expect(lost.body.error.code, context).toBe('stale');
      expect(lost.body.current.version, context).toBe(version + 1);
      expect(lost.body.current.design.objects[0].name, context).toBe(`${who} round ${round}`);
      const row = (await Variant.findByPk(id))!;
      expect(row.version, context).toBe(version + 1);
      expect(JSON.parse(row.designJson), context).toEqual(designBy(who, round));
    }
    console.info(`concurrent saves: ${ROUNDS} rounds, winners ${winners.join(' ')}`);
  });
});
