import { DomainError } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';
import type { Upload } from '@/models';
import { uploadFor } from './access';
import { backdropsOf } from './queries';

/** How many of an enclosure's photos the studio offers (newest first); the lamps page shows 12. */
export const STUDIO_PHOTO_LIMIT = 24;

export type StudioPhotos = {
  items: { id: number; name: string; url: string }[];
  uploadHref: string;
};

/**
 * The photos the studio of a variant may offer as its backdrop: the enclosure's own, when this user may
 * read the enclosure, and the photo the design already names if it is another one this user may still
 * read (a design file brought from another enclosure). Anything else — deleted, or not theirs to see —
 * is left out, so the studio shows "photo not available" without ever asking for it.
 */
export async function studioPhotos(
  user: CurrentUser,
  enclosure: { id: number; organisationId: number; keeperId: number },
  chosenUploadId: number | undefined,
): Promise<StudioPhotos> {
  const uploadHref = `/enclosures/${enclosure.id}/lamps`;
  const resource = {
    kind: 'enclosure',
    organisationId: enclosure.organisationId,
    keeperId: enclosure.keeperId,
  } as const;
  if (!can(user, 'read', resource)) return { items: [], uploadHref };
  const rows = await backdropsOf(enclosure.id, STUDIO_PHOTO_LIMIT);
  const items = rows.map((u) => photoItem(u));
  if (chosenUploadId !== undefined && !items.some((i) => i.id === chosenUploadId)) {
    const other = await readableBackdrop(user, chosenUploadId);
    if (other) items.push(photoItem(other, other.enclosureId !== enclosure.id));
  }
  return { items, uploadHref };
}

function photoItem(u: Upload, elsewhere = false) {
  const name = u.originalName ?? `Photo ${u.id}`;
  return { id: u.id, name: elsewhere ? `${name} (another enclosure)` : name, url: `/api/uploads/${u.id}` };
}

async function readableBackdrop(user: CurrentUser, id: number): Promise<Upload | null> {
  if (!Number.isSafeInteger(id) || id <= 0) return null;
  try {
    const u = await uploadFor(user, id, 'read');
    return u.kind === 'backdrop' ? u : null;
  } catch (e) {
    if (e instanceof DomainError) return null;
    throw e;
  }
}
