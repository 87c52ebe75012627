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
type Attempt = {
  name: string;
  handler: (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
  method: string;
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

const attempts: Attempt[] = [
  {
    name: 'list designs',
    handler: enclosureDesignsRoute.GET,
    method: 'GET',
    path: (w) => `/api/enclosures/${w.enclosureId}/designs`,
    id: (w) => w.enclosureId,
  },
  {
    name: 'create design',
    handler: enclosureDesignsRoute.POST,
    method: 'POST',
    path: (w) => `/api/enclosures/${w.enclosureId}/designs`,
    id: (w) => w.enclosureId,
    body: () => ({ name: 'x' }),
  },
  {
    name: 'read design',
    handler: designRoute.GET,
    method: 'GET',
    path: (w) => `/api/designs/${w.designId}`,
    id: (w) => w.designId,
  },
  {
    name: 'rename design',
    handler: designRoute.PATCH,
    method: 'PATCH',
    path: (w) => `/api/designs/${w.designId}`,
    id: (w) => w.designId,
    body: () => ({ name: 'x' }),
  },
  {
    name: 'delete design',
    handler: designRoute.DELETE,
    method: 'DELETE',
    path: (w) => `/api/designs/${w.designId}`,
    id: (w) => w.designId,
  },
  {
    name: 'list variants',
    handler: designVariantsRoute.GET,
    method: 'GET',
    path: (w) => `/api/designs/${w.designId}/variants`,
    id: (w) => w.designId,
  },
  {
    name: 'create variant',
    handler: designVariantsRoute.POST,
    method: 'POST',
    path: (w) => `/api/designs/${w.designId}/variants`,
    id: (w) => w.designId,
    body: () => ({ name: 'x', design }),
  },
  {
    name: 'copy the variant into their own design',
    handler: designVariantsRoute.POST,
    method: 'POST',
    path: (w) => `/api/designs/${w.outsiderDesignId}/variants`,
    id: (w) => w.outsiderDesignId,
    body: (w) => ({ name: 'stolen', fromVariantId: w.variantId }),
  },
  {
    name: 'read variant',
    handler: variantRoute.GET,
    method: 'GET',
    path: (w) => `/api/variants/${w.variantId}`,
    id: (w) => w.variantId,
  },
  {
    name: 'save variant',
    handler: variantRoute.PUT,
    method: 'PUT',
    path: (w) => `/api/variants/${w.variantId}`,
    id: (w) => w.variantId,
    body: () => ({ design, baseVersion: 1 }),
  },
  {
    name: 'rename variant',
    handler: variantRoute.PATCH,
    method: 'PATCH',
    path: (w) => `/api/variants/${w.variantId}`,
    id: (w) => w.variantId,
    body: () => ({ name: 'x' }),
  },
  {
    name: 'delete variant',
    handler: variantRoute.DELETE,
    method: 'DELETE',
    path: (w) => `/api/variants/${w.variantId}`,
    id: (w) => w.variantId,
  },
  {
    name: 'list shares',
    handler: sharesRoute.GET,
    method: 'GET',
    path: (w) => `/api/variants/${w.variantId}/shares`,
    id: (w) => w.variantId,
  },
  {
    name: 'create share',
    handler: sharesRoute.POST,
    method: 'POST',
    path: (w) => `/api/variants/${w.variantId}/shares`,
    id: (w) => w.variantId,
    body: () => ({}),
  },
  {
    name: 'revoke share',
    handler: shareRoute.DELETE,
    method: 'DELETE',
    path: (w) => `/api/shares/${w.shareId}`,
    id: (w) => w.shareId,
  },
  ...(['json', 'png', 'pdf'] as const).map((format): Attempt => ({
    name: `export ${format}`,
    handler: exportRoute.GET,
    method: 'GET',
    path: (w) => `/api/variants/${w.variantId}/export?format=${format}`,
    id: (w) => w.variantId,
  })),
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
