import 'server-only';
import { conflict } from '@/lib/errors';
import { literal } from 'sequelize';
import { afterCursor, page } from '@/lib/api';
import type { CurrentUser } from '@/lib/auth/session-user';
import { getSequelize } from '@/lib/db';
import { can } from '@/lib/permissions';
import type { Design as DesignFile } from '@/simulation';
import { User, Variant } from '@/models';
import type { DesignWithEnclosure } from './access';
import { loadVariantWithOwner } from './access';
import { defaultDesignFor } from './default-design';
import { readStoredDesign, serializeDesign } from './stored-design';
import { wholeSecond } from './time';
import { variantDetail, variantSummary, type VariantDetail, type VariantSummary } from './views';

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

export async function createVariant(
  user: CurrentUser,
  design: DesignWithEnclosure,
  input: { name: string; design?: DesignFile; from?: Variant },
): Promise<VariantSummary> {
  const designJson = input.design
    ? serializeDesign(input.design)
    : input.from
      ? input.from.designJson
      : serializeDesign(defaultDesignFor(design.enclosure));
  const variant = await Variant.create({
    designId: design.id,
    name: input.name,
    designJson,
    createdById: user.id,
    updatedById: user.id,
  });
  return variantSummary(variant);
}

export type SaveResult =
  | { ok: true; variant: { id: number; version: number; updatedAt: string } }
  | { ok: false; current: { version: number; design: DesignFile } };

/**
 * Saves a design if nobody else saved since `baseVersion`: one `UPDATE … WHERE id = ? AND version = ?`
 * is the compare-and-set, so two concurrent saves cannot both win, and a stale one overwrites nothing.
 * When it loses, the current version and design are read in the same transaction for the client to merge.
 */
export async function saveVariantDesign(
  user: CurrentUser,
  variant: Variant,
  input: { design: DesignFile; baseVersion: number; name?: string },
): Promise<SaveResult> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    const updatedAt = wholeSecond();
    const [affected] = await Variant.update(
      {
        designJson: serializeDesign(input.design),
        ...(input.name !== undefined ? { name: input.name } : {}),
        version: literal('version + 1') as unknown as number,
        updatedById: user.id,
        updatedAt,
      },
      { where: { id: variant.id, version: input.baseVersion }, transaction, silent: true },
    );
    if (affected === 1) {
      return {
        ok: true,
        variant: { id: variant.id, version: input.baseVersion + 1, updatedAt: updatedAt.toISOString() },
      };
    }
    const current = await Variant.findByPk(variant.id, {
      attributes: ['version', 'designJson'],
      transaction,
    });
    // Deleted meanwhile: nothing to merge with.
    if (!current) throw conflict('This variant was deleted by someone else.', 'gone');
    return { ok: false, current: { version: current.version, design: readStoredDesign(current.designJson) } };
  });
}

/** A new name only; the design and its version stay as they are, so a rename never makes the studio stale. */
export async function renameVariant(variant: Variant, name: string): Promise<VariantSummary> {
  await Variant.update({ name }, { where: { id: variant.id }, silent: true });
  return variantSummary(Object.assign(variant, { name }));
}

/** A design keeps at least one variant: the last one goes with the design itself. */
export async function deleteVariant(variant: Variant): Promise<void> {
  const sequelize = getSequelize();
  await sequelize.transaction(async (transaction) => {
    const siblings = await Variant.count({ where: { designId: variant.designId }, transaction });
    if (siblings <= 1) {
      throw conflict('A design keeps at least one variant. Delete the design instead.', 'last_variant');
    }
    await Variant.destroy({ where: { id: variant.id }, transaction });
  });
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
  if (!user || !Number.isSafeInteger(variantId) || variantId <= 0) return null;
  const variant = await loadVariantWithOwner(variantId);
  if (!variant) return null;
  const e = variant.design.enclosure;
  const resource = { kind: 'variant' as const, organisationId: e.organisationId, keeperId: e.keeperId };
  if (!can(user, 'read', resource)) return null;
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
    canEdit: can(user, 'update', resource),
  };
}
