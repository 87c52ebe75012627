import { char, date, id, oneOf, ref, string, table, timestamps } from './columns';
import { ROLES } from './membership';

/** An e-mailed invitation to join an organisation. Only the SHA-256 of the token is stored. */
export class Invitation extends table('invitations', {
  id: id(),
  organisationId: ref(),
  email: string(254),
  role: oneOf(ROLES),
  tokenHash: char(64).unique(),
  invitedById: ref(),
  expiresAt: date(),
  acceptedAt: date().nullable(),
  revokedAt: date().nullable(),
  ...timestamps(),
}) {}
