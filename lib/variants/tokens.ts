import 'server-only';
import { createHash, randomBytes } from 'node:crypto';

/** 32 random bytes = 256 bits, well above the 128 bits that make a link unguessable. */
export const SHARE_TOKEN_BYTES = 32;

/** base64url of 32 bytes is always 43 characters, no padding. */
const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

export type NewShareToken = { token: string; tokenHash: string };

/** A fresh share token and the hash we store. The token itself is never stored. */
export function newShareToken(): NewShareToken {
  const token = randomBytes(SHARE_TOKEN_BYTES).toString('base64url');
  return { token, tokenHash: hashShareToken(token) };
}

/** Hex SHA-256 of the token: a lookup key that cannot be turned back into a working link. */
export function hashShareToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** Cheap shape check so malformed paths never reach the database. */
export function isWellFormedShareToken(token: string): boolean {
  return TOKEN_PATTERN.test(token);
}

export type ShareLinkState = 'active' | 'revoked' | 'expired';

/** Whether a link still opens its page. A revoked link stays revoked even if it also expired. */
export function shareLinkState(
  link: { revokedAt: Date | null; expiresAt: Date | null },
  now: Date = new Date(),
): ShareLinkState {
  if (link.revokedAt) return 'revoked';
  if (link.expiresAt && link.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'active';
}

/** The public address of a share link. */
export function shareUrl(appUrl: string, token: string): string {
  return `${appUrl.replace(/\/+$/, '')}/s/${token}`;
}
