import { char, date, id, ref, string, table, timestamp } from './columns';

/** What an e-mailed single-use link does: choose a new password, or confirm a new account's address. */
export const LINK_PURPOSES = ['password-reset', 'confirm-account'] as const;
export type LinkPurpose = (typeof LINK_PURPOSES)[number];

/** An e-mailed single-use link: what it is for, the hash of its token, when it lapses, when it was used. */
export class AccountLink extends table(
  'account_links',
  {
    id: id(),
    userId: ref(),
    purpose: string(20).as<LinkPurpose>(),
    tokenHash: char(64).unique(),
    expiresAt: date(),
    usedAt: date().nullable(),
    createdAt: timestamp(),
  },
  { updatedAt: false },
) {}
