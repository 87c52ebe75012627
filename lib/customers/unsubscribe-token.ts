import 'server-only';
import { createHmac, timingSafeEqual } from 'node:crypto';
import { authSecret } from '@/lib/auth/secret';

/**
 * The link in a customer's e-mail that stops reminder e-mails, without signing in. The token names one
 * customer and one purpose ("stop reminders") and is signed with the app's secret: it cannot be guessed,
 * and it does nothing else — it shows no data and changes nothing but that customer's consent.
 */
const PURPOSE = 'counter-reminders-unsubscribe';

const sign = (customerId: number) =>
  createHmac('sha256', authSecret()).update(`${PURPOSE}:${customerId}`).digest('base64url');

export function unsubscribeToken(customerId: number): string {
  return `${customerId}.${sign(customerId)}`;
}

/** The customer id a token was made for, or null for anything else (a forged, cut or altered token). */
export function customerOfToken(token: string): number | null {
  const m = /^([1-9]\d{0,9})\.([A-Za-z0-9_-]{43})$/.exec(token);
  if (!m) return null;
  const id = Number(m[1]);
  if (id > 4_294_967_295) return null;
  const want = Buffer.from(sign(id));
  const got = Buffer.from(m[2]!);
  return want.length === got.length && timingSafeEqual(want, got) ? id : null;
}
