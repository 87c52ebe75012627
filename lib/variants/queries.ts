import 'server-only';
import { Op, QueryTypes } from 'sequelize';
import { afterCursor, page } from '@/lib/api';
import { likeContains } from '@/lib/api/like';
import type { CurrentUser } from '@/lib/auth/session-user';
import type { Design as DesignFile } from '@/simulation';
import { physicsOf } from '@/simulation';
import { Design, Enclosure, ShareLink, User, Variant } from '@/models';
import { loadOwnedForPage, type DesignWithEnclosure } from '@/lib/access';
import { getSequelize } from '@/lib/db';
import { toEngineSheet } from '@/lib/species/to-engine';
import { attachedSpecies, type SpeciesOption } from './species';
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
  /** The organisation's sheet for the enclosure's species (matched as `attachedSpecies` does), if any. */
  species: SpeciesOption | null;
  design: ReturnType<typeof readStoredDesign>;
  expiresAt: string | null;
};

/** A working share link as stored: the variant's document still as saved text (`readStoredDesign`). */
export type ShareRecord = Omit<PublicShare, 'design'> & { designJson: string };

type ShareRow = {
  expiresAt: Date | null;
  variantId: number;
  variantName: string;
  version: number;
  variantUpdatedAt: Date;
  designJson: string;
  designName: string;
  enclosureName: string;
  organisationId: number;
  speciesName: string | null;
  organisationName: string | null;
  exampleData: number | null;
  sheetId: number | null;
  commonName: string | null;
  scientificName: string | null;
  uvZone: number;
  uvbTargetMinUw: number | null;
  uvbTargetMaxUw: number | null;
  baskingSurfaceMinC: number;
  baskingSurfaceMaxC: number;
  coolAirMinC: number;
  coolAirMaxC: number;
  nightMinC: number | null;
  photoperiodMinH: number | null;
  photoperiodMaxH: number | null;
  adultLengthCm: number | null;
  climbs: number;
  lowMelanin: number;
};

// One round trip for a public page that every visitor of a link asks for: the link (by the unique index
// on its hash), the variant and the names around it, and the sheets that may be the enclosure's species.
// The join compares names in the column's collation (case- and accent-insensitive), a superset of what
// `attachedSpecies` accepts; that function then picks among them exactly as the signed-in pages do.
const SHARE_SQL = `
SELECT sl.expires_at AS expiresAt,
       v.id AS variantId, v.name AS variantName, v.version, v.updated_at AS variantUpdatedAt,
       v.design_json AS designJson, d.name AS designName,
       e.name AS enclosureName, e.organisation_id AS organisationId, e.species_name AS speciesName,
       o.name AS organisationName, o.example_data AS exampleData,
       s.id AS sheetId, s.common_name AS commonName, s.scientific_name AS scientificName,
       s.uv_zone AS uvZone, s.uvb_target_min_uw AS uvbTargetMinUw, s.uvb_target_max_uw AS uvbTargetMaxUw,
       s.basking_surface_min_c AS baskingSurfaceMinC, s.basking_surface_max_c AS baskingSurfaceMaxC,
       s.cool_air_min_c AS coolAirMinC, s.cool_air_max_c AS coolAirMaxC, s.night_min_c AS nightMinC,
       s.photoperiod_min_h AS photoperiodMinH, s.photoperiod_max_h AS photoperiodMaxH,
       s.adult_length_cm AS adultLengthCm, s.climbs, s.low_melanin AS lowMelanin
  FROM share_links sl
  JOIN variants v ON v.id = sl.variant_id
  JOIN designs d ON d.id = v.design_id
  JOIN enclosures e ON e.id = d.enclosure_id
  LEFT JOIN organisations o ON o.id = e.organisation_id
  LEFT JOIN species_sheets s ON s.organisation_id = e.organisation_id
       AND (s.common_name = e.species_name OR s.scientific_name = e.species_name)
 WHERE sl.token_hash = :tokenHash AND sl.revoked_at IS NULL
 ORDER BY s.common_name, s.id`;

const pairOf = (min: number | null, max: number | null) =>
  min === null || max === null ? null : { min, max };

function sheetOf(r: ShareRow): SpeciesOption | null {
  if (r.sheetId === null || r.commonName === null || r.scientificName === null) return null;
  return {
    id: r.sheetId,
    name: r.commonName,
    scientificName: r.scientificName,
    sheet: toEngineSheet({
      commonName: r.commonName,
      uvZone: r.uvZone,
      baskingSurfaceC: { min: r.baskingSurfaceMinC, max: r.baskingSurfaceMaxC },
      coolAirC: { min: r.coolAirMinC, max: r.coolAirMaxC },
      nightMinC: r.nightMinC,
      uvbTargetUw: pairOf(r.uvbTargetMinUw, r.uvbTargetMaxUw),
      adultLengthCm: r.adultLengthCm,
      climbs: Boolean(r.climbs),
      lowMelanin: Boolean(r.lowMelanin),
      photoperiodH: pairOf(r.photoperiodMinH, r.photoperiodMaxH),
    }),
  };
}

/**
 * A working share link with everything its public page shows, the design still as stored text, in one
 * query: the page reads it on every view, so a revoked or expired link stops at once. Malformed,
 * unknown, revoked and expired tokens all give null.
 */
export async function findShare(token: string, now = new Date()): Promise<ShareRecord | null> {
  if (!isWellFormedShareToken(token)) return null;
  const rows = await getSequelize().query<ShareRow>(SHARE_SQL, {
    replacements: { tokenHash: hashShareToken(token) },
    type: QueryTypes.SELECT,
  });
  const r = rows[0];
  if (!r || shareLinkState({ revokedAt: null, expiresAt: r.expiresAt }, now) !== 'active') return null;
  return {
    variant: {
      id: r.variantId,
      name: r.variantName,
      version: r.version,
      updatedAt: new Date(r.variantUpdatedAt).toISOString(),
    },
    designName: r.designName,
    enclosureName: r.enclosureName,
    organisationName: r.organisationName ?? '',
    exampleData: Boolean(r.exampleData),
    organisationId: r.organisationId,
    speciesName: r.speciesName ?? null,
    species: attachedSpecies(
      rows.flatMap((row) => sheetOf(row) ?? []),
      r.speciesName,
    ),
    designJson: r.designJson,
    expiresAt: r.expiresAt ? new Date(r.expiresAt).toISOString() : null,
  };
}

/**
 * What an anonymous visitor of `/s/<token>` may see: exactly one variant and the names around it.
 * Malformed, unknown, revoked and expired tokens all give null (the page answers 404 alike).
 */
export async function resolveShareToken(token: string, now = new Date()): Promise<PublicShare | null> {
  const found = await findShare(token, now);
  if (!found) return null;
  const { designJson, ...rest } = found;
  // Without its photo backdrop: a visitor with the link may not read the enclosure's uploads.
  return { ...rest, design: physicsOf(readStoredDesign(designJson)) };
}
