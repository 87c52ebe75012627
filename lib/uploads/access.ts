import 'server-only';
import { loadOwned, type UploadWithEnclosure } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';

/**
 * The upload if this user may see it (`loadOwned`): a backdrop (or CSV) of an enclosure goes with that
 * enclosure's rights; anything without an enclosure is its uploader's and the organisation's owners' and
 * staff's, and only its uploader or an owner deletes it.
 */
export const uploadFor = (
  user: CurrentUser,
  id: number,
  action: 'read' | 'delete',
): Promise<UploadWithEnclosure> => loadOwned('upload', id, user, action);
