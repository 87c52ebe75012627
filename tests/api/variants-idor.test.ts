// Every design, variant and share route, tried by people who must not reach the thing: a keeper of the
// same organisation who does not own the enclosure, the owner and staff of another organisation, and a signed-in
// user of no organisation. Each must get 404 (existence not revealed) and nothing may change; the
// compare and studio pages' loaders must show them nothing either.
import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import * as designRoute from '@/app/api/designs/[id]/route';
import * as designVariantsRoute from '@/app/api/designs/[id]/variants/route';
import * as enclosureDesignsRoute from '@/app/api/enclosures/[id]/designs/route';
import * as shareRoute from '@/app/api/shares/[id]/route';
import * as exportRoute from '@/app/api/variants/[id]/export/route';
import * as variantRoute from '@/app/api/variants/[id]/route';
import * as sharesRoute from '@/app/api/variants/[id]/shares/route';
import { loadUserById } from '@/lib/auth/session-user';
import { getVariantForUser, resolveShareToken } from '@/lib/variants/queries';
import { visibleVariants } from '@/lib/variants/visible';
import type { User } from '@/models';
import { createMember, createUser, testDb, withTestDatabase } from '../helpers/db';
import { createEnclosureWorld } from '../helpers/world';
import { expectNoInternals, type Reply } from './http';
import { call, postDesign, postShare } from './variants.helpers';

withTestDatabase();

async function world() {
  const {
    staff,
    keeper,
    otherKeeper,
    outsider,
    otherOrg,
    enclosure,
    foreign: theirEnclosure,
  } = await createEnclosureWorld({ shopName: 'Shop A' });
  const { user: otherStaff } = await createMember('staff', otherOrg);
  const { user: nobody } = await createUser();
  const { designId, variantId } = await postDesign(staff, enclosure.id, { name: 'Plan' });
  const shared = await postShare(keeper, variantId);
  // The outsider's own design, to try pulling the victim's variant into it.
  const theirs = await postDesign(outsider, theirEnclosure.id, { name: 'Mine' });
  return {
    staff,
    keeper,
    attackers: { otherKeeper, outsider, otherStaff, nobody },
    enclosureId: enclosure.id,
    designId,
    variantId,
    shareId: shared.body.share.id as number,
    token: shared.body.share.token as string,
    outsiderDesignId: theirs.designId,
  };
}

type World = Awaited<ReturnType<typeof world>>;
type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
/** The thing in the world a route's `[id]` names. */
type Target = 'enclosureId' | 'designId' | 'variantId' | 'shareId' | 'outsiderDesignId';
type Attempt = {
  name: string;
  handler: Handler;
  method: Method;
  path: (w: World) => string;
  id: (w: World) => number;
  body?: (w: World) => unknown;
};

const design = {
  format: 'baskwell.design',
  version: 2,
  enclosure: { width: 120, height: 60, depth: 60 },
  objects: [],
};

/** One attempt: `method` of a route module on the address `path` makes of the target's id. */
const attempt = (
  name: string,
  route: Partial<Record<Method, Handler>>,
  method: Method,
  target: Target,
  path: (id: number) => string,
  body?: (w: World) => unknown,
): Attempt => ({
  name,
  handler: route[method]!,
  method,
  path: (w) => path(w[target]),
  id: (w) => w[target],
  body,
});

const enclosureDesigns = (id: number) => `/api/enclosures/${id}/designs`;
const designPath = (id: number) => `/api/designs/${id}`;
const designVariants = (id: number) => `/api/designs/${id}/variants`;
const variantPath = (id: number) => `/api/variants/${id}`;
const variantShares = (id: number) => `/api/variants/${id}/shares`;
const named = () => ({ name: 'x' });

const attempts: Attempt[] = [
  attempt('list designs', enclosureDesignsRoute, 'GET', 'enclosureId', enclosureDesigns),
  attempt('create design', enclosureDesignsRoute, 'POST', 'enclosureId', enclosureDesigns, named),
  attempt('read design', designRoute, 'GET', 'designId', designPath),
  attempt('rename design', designRoute, 'PATCH', 'designId', designPath, named),
  attempt('delete design', designRoute, 'DELETE', 'designId', designPath),
  attempt('list variants', designVariantsRoute, 'GET', 'designId', designVariants),
  attempt('create variant', designVariantsRoute, 'POST', 'designId', designVariants, () => ({
    name: 'x',
    design,
  })),
  attempt(
    'copy the variant into their own design',
    designVariantsRoute,
    'POST',
    'outsiderDesignId',
    designVariants,
    (w) => ({ name: 'stolen', fromVariantId: w.variantId }),
  ),
  attempt('read variant', variantRoute, 'GET', 'variantId', variantPath),
  attempt('save variant', variantRoute, 'PUT', 'variantId', variantPath, () => ({ design, baseVersion: 1 })),
  attempt('rename variant', variantRoute, 'PATCH', 'variantId', variantPath, named),
  attempt('delete variant', variantRoute, 'DELETE', 'variantId', variantPath),
  attempt('list shares', sharesRoute, 'GET', 'variantId', variantShares),
  attempt('create share', sharesRoute, 'POST', 'variantId', variantShares, () => ({})),
  attempt('revoke share', shareRoute, 'DELETE', 'shareId', (id) => `/api/shares/${id}`),
  ...(['json', 'png', 'pdf'] as const).map((format) =>
    attempt(
      `export ${format}`,
      exportRoute,
      'GET',
      'variantId',
      (id) => `/api/variants/${id}/export?format=${format}`,
    ),
  ),
];

async function snapshot() {
  const db = testDb();
  const q = (sql: string) => db.query(sql, { type: QueryTypes.SELECT });
  return {
    designs: await q('SELECT * FROM designs ORDER BY id'),
    variants: await q('SELECT * FROM variants ORDER BY id'),
    shares: await q('SELECT * FROM share_links ORDER BY id'),
  };
}

describe('no one reaches another keeper’s or organisation’s designs', () => {
  it('answers 404 to every route and changes nothing', async () => {
    const w = await world();
    const before = await snapshot();
    const failures: string[] = [];
    for (const [who, user] of Object.entries(w.attackers) as [string, User][]) {
      for (const a of attempts) {
        const r = await call(a.handler, {
          method: a.method,
          path: a.path(w),
          params: { id: a.id(w) },
          user,
          body: a.body?.(w),
        });
        // The outsider owns the target design of the copy attempt: 404 then names the source variant.
        if (r.status !== 404) failures.push(`${who} ${a.name}: ${r.status}`);
        else expect(r.body.error.code).toBe('not_found');
        expectNoInternals({ ...r, text: JSON.stringify(r.body) } as Reply);
      }
    }
    expect(failures).toEqual([]);
    expect(await snapshot()).toEqual(before);
    expect(await resolveShareToken(w.token)).not.toBeNull();
  });

  it('lets the owning keeper and staff through the same routes (the attempts above are real)', async () => {
    const w = await world();
    for (const user of [w.keeper, w.staff]) {
      for (const a of attempts.filter((x) => x.method === 'GET')) {
        const r = await call(a.handler, { method: a.method, path: a.path(w), params: { id: a.id(w) }, user });
        expect(r.status, `${a.name}`).toBe(200);
      }
    }
  });
});

describe('the pages show nothing of another keeper’s or organisation’s variants', () => {
  it('loads no variant for the compare and studio pages and lists none in the pickers', async () => {
    const w = await world();
    for (const [who, attacker] of Object.entries(w.attackers) as [string, User][]) {
      const user = await loadUserById(attacker.id);
      expect(user, who).not.toBeNull();
      expect(await getVariantForUser(user, w.variantId), who).toBeNull();
      const ids = (await visibleVariants(user!)).map((v) => v.id);
      expect(ids, who).not.toContain(w.variantId);
    }
    // The same loaders do show it to the keeper who owns the enclosure and to staff.
    for (const owner of [w.keeper, w.staff]) {
      const user = await loadUserById(owner.id);
      expect((await getVariantForUser(user, w.variantId))?.id).toBe(w.variantId);
      expect((await visibleVariants(user!)).map((v) => v.id)).toContain(w.variantId);
    }
  });
});
