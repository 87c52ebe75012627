import 'server-only';
import { Op } from 'sequelize';
import { afterCursor, page } from '@/lib/api';
import { likeContains } from '@/lib/api/like';
import type { CurrentUser } from '@/lib/auth/session-user';
import { getSequelize } from '@/lib/db';
import type { Design as DesignFile } from '@/simulation';
import { can } from '@/lib/permissions';
import { Design, Enclosure, Variant } from '@/models';
import { defaultDesignFor } from './default-design';
import { serializeDesign } from './stored-design';
import { designSummary, variantSummary, type DesignSummary, type VariantSummary } from './views';

/** Variants listed with each design; designs rarely have more, and the full list is one request away. */
export const VARIANTS_PER_DESIGN = 100;

export const FIRST_VARIANT_NAME = 'Variant A';

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

export type DesignForPage = {
  design: DesignSummary;
  enclosure: { id: number; name: string; organisationId: number };
  canEdit: boolean;
};

/** For the design page: the design if this user may read it, else null (the page answers 404 alike). */
export async function getDesignForUser(user: CurrentUser, designId: number): Promise<DesignForPage | null> {
  if (!Number.isSafeInteger(designId) || designId <= 0) return null;
  const design = (await Design.findByPk(designId, {
    include: [{ model: Enclosure, as: 'enclosure', required: true }],
  })) as (Design & { enclosure: Enclosure }) | null;
  if (!design) return null;
  const e = design.enclosure;
  const resource = { kind: 'design' as const, organisationId: e.organisationId, keeperId: e.keeperId };
  if (!can(user, 'read', resource)) return null;
  return {
    design: await designDetail(design),
    enclosure: { id: e.id, name: e.name, organisationId: e.organisationId },
    canEdit: can(user, 'update', resource),
  };
}
