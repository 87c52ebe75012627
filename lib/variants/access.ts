import 'server-only';
import {
  loadOwned,
  type DesignWithEnclosure,
  type ShareWithOwner,
  type VariantWithOwner,
} from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import type { Action } from '@/lib/permissions';

export type { DesignWithEnclosure, ShareWithOwner, VariantWithOwner };

/**
 * Loading a design, variant or share link together with the enclosure that owns it, then asking `can`
 * (`loadOwned`). Ownership always comes from the enclosure (its organisation and keeper), never from
 * anything the client sent. Someone who may not even see the thing gets 404, so ids of other
 * organisations reveal nothing.
 */
export const designFor = (user: CurrentUser, id: number, action: Action) =>
  loadOwned('design', id, user, action);

export const variantFor = (user: CurrentUser, id: number, action: Action) =>
  loadOwned('variant', id, user, action);

export const shareFor = (user: CurrentUser, id: number, action: Action) =>
  loadOwned('share', id, user, action);
