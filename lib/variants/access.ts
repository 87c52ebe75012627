import 'server-only';
import { allow } from '@/lib/access';
import { notFound } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import type { Action, EnclosureOwnedKind } from '@/lib/permissions';
import { Design, Enclosure, ShareLink, Variant } from '@/models';

/**
 * Loading a thing together with the enclosure that owns it, then asking `can`. Ownership always comes
 * from the enclosure (its organisation and keeper), never from anything the client sent. Someone who may
 * not even see the thing gets 404, so ids of other organisations reveal nothing.
 */

export type DesignWithEnclosure = Design & { enclosure: Enclosure };
export type VariantWithOwner = Variant & { design: DesignWithEnclosure };
export type ShareWithOwner = ShareLink & { variant: VariantWithOwner };

const owner = (e: Enclosure, kind: EnclosureOwnedKind) => ({
  kind,
  organisationId: e.organisationId,
  keeperId: e.keeperId,
});

export async function designFor(user: CurrentUser, id: number, action: Action): Promise<DesignWithEnclosure> {
  const design = (await Design.findByPk(id, {
    include: [{ model: Enclosure, as: 'enclosure', required: true }],
  })) as DesignWithEnclosure | null;
  if (!design) throw notFound('The design');
  allow(user, action, owner(design.enclosure, 'design'), 'The design');
  return design;
}

export async function variantFor(user: CurrentUser, id: number, action: Action): Promise<VariantWithOwner> {
  const variant = await loadVariantWithOwner(id);
  if (!variant) throw notFound('The variant');
  allow(user, action, owner(variant.design.enclosure, 'variant'), 'The variant');
  return variant;
}

export async function shareFor(user: CurrentUser, id: number, action: Action): Promise<ShareWithOwner> {
  const share = (await ShareLink.findByPk(id, {
    include: [
      {
        model: Variant,
        as: 'variant',
        required: true,
        include: [
          {
            model: Design,
            as: 'design',
            required: true,
            include: [{ model: Enclosure, as: 'enclosure', required: true }],
          },
        ],
      },
    ],
  })) as ShareWithOwner | null;
  if (!share) throw notFound('The share link');
  allow(user, action, owner(share.variant.design.enclosure, 'share'), 'The share link');
  return share;
}

export async function loadVariantWithOwner(id: number): Promise<VariantWithOwner | null> {
  return (await Variant.findByPk(id, {
    include: [
      {
        model: Design,
        as: 'design',
        required: true,
        include: [{ model: Enclosure, as: 'enclosure', required: true }],
      },
    ],
  })) as VariantWithOwner | null;
}
