import 'server-only';
import { loadOwned, type EnclosureWithKeeper } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import type { Action } from '@/lib/permissions';

export type { EnclosureWithKeeper };

/**
 * An enclosure (with its keeper's name) together with the check that this user may do `action` to it,
 * and so to its designs, lamps and uploads, which share its ownership rules. Its organisation and keeper
 * come from the row, never from the client; someone who may not see it gets "not found".
 */
export const enclosureFor = (user: CurrentUser, id: number, action: Action): Promise<EnclosureWithKeeper> =>
  loadOwned('enclosure', id, user, action);
