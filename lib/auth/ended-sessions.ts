import 'server-only';
import { randomBytes } from 'node:crypto';
import { Op } from 'sequelize';
import { EndedSession } from '@/models';
import { SESSION_MAX_AGE_S } from './lifetime';
import { loadUnendedSessionUser, type CurrentUser } from './session-user';

/**
 * Signing out ends that one session on the server, not only in the browser: each session cookie carries a
 * random session id (`sid`), and signing out records it as ended. A cookie without one, or with an ended
 * one, is refused, so a copied cookie stops working the moment its owner signs out. "Sign out everywhere"
 * and a password change still work through the session version.
 */

/** 192 random bits: a session id no one can guess or enumerate. */
export const newSessionId = () => randomBytes(24).toString('base64url');

const SID = /^[A-Za-z0-9_-]{16,64}$/;

export type SessionClaims = { uid?: unknown; sv?: unknown; sid?: unknown };

/** The person behind a session token, or null when the token is malformed, signed out or ended. */
export async function loadActiveSession(token: SessionClaims): Promise<CurrentUser | null> {
  const { uid, sv, sid } = token;
  if (typeof uid !== 'number' || typeof sv !== 'number' || typeof sid !== 'string' || !SID.test(sid))
    return null;
  return loadUnendedSessionUser(uid, sv, sid);
}

/** Whether a session id was signed out (a malformed id counts as ended). */
export async function isSessionEnded(sid: string): Promise<boolean> {
  if (!SID.test(sid)) return true;
  return (await EndedSession.findByPk(sid, { attributes: ['sid'] })) !== null;
}

/**
 * Records a session as ended until `expiresAt` (when its cookie would lapse anyway; at most the session
 * lifetime from now). Ending it twice is harmless.
 */
export async function endSession(sid: string, userId: number, expiresAt?: Date, now = new Date()) {
  if (!SID.test(sid)) return;
  const latest = new Date(now.getTime() + SESSION_MAX_AGE_S * 1000);
  const until = expiresAt && expiresAt < latest && expiresAt > now ? expiresAt : latest;
  await EndedSession.findOrCreate({ where: { sid }, defaults: { sid, userId, expiresAt: until } });
  // Ended sessions whose cookies have lapsed need no record.
  await EndedSession.destroy({ where: { expiresAt: { [Op.lt]: now } } });
}
