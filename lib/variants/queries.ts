import 'server-only';
import { Op } from 'sequelize';
import { afterCursor, page } from '@/lib/api';
import { likeContains } from '@/lib/api/like';
import type { CurrentUser } from '@/lib/auth/session-user';
import type { Design as DesignFile } from '@/simulation';
import { physicsOf } from '@/simulation';
import { Design, Enclosure, Organisation, ShareLink, User, Variant } from '@/models';
import { loadOwnedForPage, type DesignWithEnclosure } from '@/lib/access';
import { readStoredDesign } from './stored-design';
import { hashShareToken, isWellFormedShareToken, shareLinkState, type ShareLinkState } from './tokens';

/** Reads of designs, their variants and share links, and the JSON shapes they answer with. */

/** The JSON shapes the API answers with (and the client components read). Dates are ISO strings. */

export type VariantSummary = {
  id: number;
  designId: number;
  name: string;
  version: number;
  updatedAt: string;
};
export type VariantDetail = VariantSummary & {
  design: DesignFile;
  updatedBy: { id: number; name: string } | null;
};
export type DesignSummary = {
  id: number;
  enclosureId: number;
  name: string;
  createdAt: string;
  updatedAt: string;
  variants: VariantSummary[];
};
export type ShareView = {
  id: number;
  variantId: number;
  state: ShareLinkState;
  expiresAt: string | null;
  revokedAt: string | null;
  createdAt: string;
};

const iso = (d: Date | string) => new Date(d).toISOString();

export function variantSummary(v: Variant): VariantSummary {
  return { id: v.id, designId: v.designId, name: v.name, version: v.version, updatedAt: iso(v.updatedAt) };
}

export function variantDetail(v: Variant & { updatedBy?: User | null }): VariantDetail {
  return {
    ...variantSummary(v),
    design: readStoredDesign(v.designJson),
    updatedBy: v.updatedBy ? { id: v.updatedBy.id, name: v.updatedBy.name } : null,
  };
}

export function designSummary(d: Design, variants: Variant[]): DesignSummary {
  // A design "changed" when any of its variants did; the list sorts by that.
  const latest = Math.max(
    new Date(d.updatedAt).getTime(),
    ...variants.map((v) => new Date(v.updatedAt).getTime()),
  );
  return {
    id: d.id,
    enclosureId: d.enclosureId,
    name: d.name,
    createdAt: iso(d.createdAt),
    updatedAt: new Date(latest).toISOString(),
    variants: variants.map(variantSummary),
  };
}

export function shareView(s: ShareLink, now = new Date()): ShareView {
  return {
    id: s.id,
    variantId: s.variantId,
    state: shareLinkState(s, now),
    expiresAt: s.expiresAt ? iso(s.expiresAt) : null,
    revokedAt: s.revokedAt ? iso(s.revokedAt) : null,
    createdAt: iso(s.createdAt),
  };
}

/** Variants listed with each design; designs rarely have more, and the full list is one request away. */
export const VARIANTS_PER_DESIGN = 100;

export async function listDesigns(
  enclosure: Enclosure,
  opts: { cursor?: number; limit: number; q?: string },
): Promise<{ items: DesignSummary[]; nextCursor: string | null }> {
  const rows = await Design.findAll({
    where: {
      enclosureId: enclosure.id,
      ...afterCursor(opts.cursor),
      ...(opts.q ? { name: { [Op.like]: likeContains(opts.q) } } : {}),
    },
    order: [['id', 'ASC']],
    limit: opts.limit + 1,
  });
  const variants = await variantsOf(rows.slice(0, opts.limit).map((d) => d.id));
  return page(rows, opts.limit, (d) => designSummary(d, variants.get(d.id) ?? []));
}

export async function designDetail(design: Design): Promise<DesignSummary> {
  const variants = await variantsOf([design.id]);
  return designSummary(design, variants.get(design.id) ?? []);
}

async function variantsOf(designIds: number[]): Promise<Map<number, Variant[]>> {
  const out = new Map<number, Variant[]>();
  if (designIds.length === 0) return out;
  // Summaries only: the (possibly large) design documents stay in the database.
  const rows = await Variant.findAll({
    where: { designId: designIds },
    attributes: ['id', 'designId', 'name', 'version', 'updatedAt'],
    order: [['id', 'ASC']],
  });
  for (const v of rows) {
    const list = out.get(v.designId) ?? [];
    if (list.length < VARIANTS_PER_DESIGN) list.push(v);
    out.set(v.designId, list);
  }
  return out;
}

export type DesignForPage = {
  design: DesignSummary;
  enclosure: { id: number; name: string; organisationId: number };
  canEdit: boolean;
};

/** For the design page: the design if this user may read it, else null (the page answers 404 alike). */
export async function getDesignForUser(user: CurrentUser, designId: number): Promise<DesignForPage | null> {
  const found = await loadOwnedForPage('design', designId, user);
  if (!found) return null;
  const { record: design, canEdit } = found;
  const e = design.enclosure;
  return {
    design: await designDetail(design),
    enclosure: { id: e.id, name: e.name, organisationId: e.organisationId },
    canEdit,
  };
}

export async function listVariants(
  design: DesignWithEnclosure,
  opts: { cursor?: number; limit: number },
): Promise<{ items: VariantSummary[]; nextCursor: string | null }> {
  const rows = await Variant.findAll({
    where: { designId: design.id, ...afterCursor(opts.cursor) },
    attributes: ['id', 'designId', 'name', 'version', 'updatedAt'],
    order: [['id', 'ASC']],
    limit: opts.limit + 1,
  });
  return page(rows, opts.limit, variantSummary);
}

export async function variantDetailOf(variant: Variant): Promise<VariantDetail> {
  const updatedBy = variant.updatedById
    ? await User.findByPk(variant.updatedById, { attributes: ['id', 'name'] })
    : null;
  return variantDetail(Object.assign(variant, { updatedBy }));
}

export type VariantForPage = VariantDetail & {
  designName: string;
  enclosure: {
    id: number;
    name: string;
    organisationId: number;
    keeperId: number;
    speciesName: string | null;
  };
  /** Whether this user may save changes (the page shows a read-only view otherwise). */
  canEdit: boolean;
};

/**
 * For server components (the studio, the compare page): the variant if this user may read it, else
 * null — a page answers "not found" either way, so nobody learns whether someone else's variant exists.
 */
export async function getVariantForUser(
  user: CurrentUser | null,
  variantId: number,
): Promise<VariantForPage | null> {
  const found = user && (await loadOwnedForPage('variant', variantId, user));
  if (!found) return null;
  const { record: variant, canEdit } = found;
  const e = variant.design.enclosure;
  return {
    ...(await variantDetailOf(variant)),
    designName: variant.design.name,
    enclosure: {
      id: e.id,
      name: e.name,
      organisationId: e.organisationId,
      keeperId: e.keeperId,
      speciesName: e.speciesName ?? null,
    },
    canEdit,
  };
}

export async function listShares(
  variant: Variant,
  opts: { cursor?: number; limit: number },
): Promise<{ items: ShareView[]; nextCursor: string | null }> {
  const rows = await ShareLink.findAll({
    where: { variantId: variant.id, ...afterCursor(opts.cursor) },
    order: [['id', 'ASC']],
    limit: opts.limit + 1,
  });
  const now = new Date();
  return page(rows, opts.limit, (s) => shareView(s, now));
}

export type PublicShare = {
  variant: { id: number; name: string; version: number; updatedAt: string };
  designName: string;
  enclosureName: string;
  organisationName: string;
  /** The organisation's data is invented example data (the demo). */
  exampleData: boolean;
  speciesName: string | null;
  organisationId: number;
  design: ReturnType<typeof readStoredDesign>;
  expiresAt: string | null;
};

/**
 * What an anonymous visitor of `/s/<token>` may see: exactly one variant and the names around it.
 * Malformed, unknown, revoked and expired tokens all give null (the page answers 404 alike).
 */
export async function resolveShareToken(token: string, now = new Date()): Promise<PublicShare | null> {
  if (!isWellFormedShareToken(token)) return null;
  const share = await ShareLink.findOne({
    where: { tokenHash: hashShareToken(token), revokedAt: { [Op.is]: null } },
  });
  if (!share || shareLinkState(share, now) !== 'active') return null;
  const variant = (await Variant.findByPk(share.variantId, {
    include: [
      {
        model: Design,
        as: 'design',
        required: true,
        include: [
          {
            model: Enclosure,
            as: 'enclosure',
            required: true,
            include: [{ model: Organisation, as: 'organisation', attributes: ['id', 'name', 'exampleData'] }],
          },
        ],
      },
    ],
  })) as (Variant & { design: Design & { enclosure: Enclosure & { organisation?: Organisation } } }) | null;
  if (!variant) return null;
  const enclosure = variant.design.enclosure;
  return {
    variant: {
      id: variant.id,
      name: variant.name,
      version: variant.version,
      updatedAt: new Date(variant.updatedAt).toISOString(),
    },
    designName: variant.design.name,
    enclosureName: enclosure.name,
    organisationName: enclosure.organisation?.name ?? '',
    exampleData: enclosure.organisation?.exampleData ?? false,
    organisationId: enclosure.organisationId,
    speciesName: enclosure.speciesName ?? null,
    // Without its photo backdrop: a visitor with the link may not read the enclosure's uploads.
    design: physicsOf(readStoredDesign(variant.designJson)),
    expiresAt: share.expiresAt ? share.expiresAt.toISOString() : null,
  };
}
