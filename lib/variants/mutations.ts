import 'server-only';
import { literal } from 'sequelize';
import type { CurrentUser } from '@/lib/auth/session-user';
import { config } from '@/lib/config';
import { getSequelize } from '@/lib/db';
import { conflict } from '@/lib/errors';
import type { Design as DesignFile } from '@/simulation';
import { Design, ShareLink, Variant, type Enclosure } from '@/models';
import type { DesignWithEnclosure } from './access';
import { defaultDesignFor } from './default-design';
import { designDetail, designSummary, shareView, variantSummary } from './queries';
import type { DesignSummary, ShareView, VariantSummary } from './queries';
import { readStoredDesign, serializeDesign } from './stored-design';
import { newShareToken, shareUrl } from './tokens';
import { wholeSecond } from './time';

/** Writes of designs, their variants and share links. */

export const FIRST_VARIANT_NAME = 'Variant A';

/**
 * A new design with its first variant, in one transaction so there is never a design without a
 * variant. Without a design file, the first variant starts from the enclosure's default.
 */
export async function createDesign(
  user: CurrentUser,
  enclosure: Enclosure,
  input: { name: string; variantName?: string; design?: DesignFile },
): Promise<{ design: DesignSummary; variant: VariantSummary }> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    const design = await Design.create(
      { enclosureId: enclosure.id, name: input.name, createdById: user.id },
      { transaction },
    );
    const variant = await Variant.create(
      {
        designId: design.id,
        name: input.variantName ?? FIRST_VARIANT_NAME,
        designJson: serializeDesign(input.design ?? defaultDesignFor(enclosure)),
        createdById: user.id,
        updatedById: user.id,
      },
      { transaction },
    );
    return { design: designSummary(design, [variant]), variant: variantSummary(variant) };
  });
}

export async function renameDesign(design: Design, name: string): Promise<DesignSummary> {
  await design.update({ name });
  return designDetail(design);
}

/** Deleting a design removes its variants and their share links (foreign keys cascade). */
export async function deleteDesign(design: Design): Promise<void> {
  await design.destroy();
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

export async function createShare(
  user: CurrentUser,
  variant: Variant,
  input: { expiresInDays?: number },
  now = new Date(),
): Promise<ShareView & { token: string; url: string }> {
  const { token, tokenHash } = newShareToken();
  const expiresAt = input.expiresInDays
    ? wholeSecond(new Date(now.getTime() + input.expiresInDays * 86_400_000))
    : null;
  const share = await ShareLink.create({ variantId: variant.id, tokenHash, expiresAt, createdById: user.id });
  // The token is shown this once; only its hash is kept.
  return { ...shareView(share, now), token, url: shareUrl(config().APP_URL, token) };
}

/** Revoking is idempotent: the first revocation time is kept. */
export async function revokeShare(share: ShareLink): Promise<ShareView> {
  if (!share.revokedAt) await share.update({ revokedAt: wholeSecond() });
  return shareView(share);
}
