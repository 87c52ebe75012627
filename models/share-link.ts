import { char, date, id, ref, table, timestamps } from './columns';

/**
 * A read-only public link to one variant. Only the SHA-256 of the token is stored, so a leaked
 * database does not leak working links; the token itself is shown once, when the link is created.
 */
export class ShareLink extends table('share_links', {
  id: id(),
  variantId: ref(),
  tokenHash: char(64).unique(),
  expiresAt: date().nullable(),
  revokedAt: date().nullable(),
  createdById: ref().nullable(),
  ...timestamps(),
}) {}
