import 'server-only';
import bcrypt from 'bcryptjs';
import { z } from 'zod';

// bcrypt only reads the first 72 bytes; longer passwords would silently lose their tail.
const MAX_PASSWORD_BYTES = 72;
export const MIN_PASSWORD_LENGTH = 12;

export const newPasswordSchema = z
  .string({ error: 'Enter a password.' })
  .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`)
  .refine((p) => new TextEncoder().encode(p).length <= MAX_PASSWORD_BYTES, {
    message: `Use at most ${MAX_PASSWORD_BYTES} characters.`,
  });

// Cost 12 in production (≈ a quarter second per check); 10 elsewhere keeps tests quick. Both meet OWASP's floor.
const rounds = () => (process.env.NODE_ENV === 'production' ? 12 : 10);

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, rounds());
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

// Compared against when the account does not exist, so a wrong e-mail takes as long as a wrong password.
let unknownAccountHash: Promise<string> | undefined;

export async function burnPasswordCheck(password: string): Promise<void> {
  unknownAccountHash ??= hashPassword('no account has this password');
  await bcrypt.compare(password, await unknownAccountHash);
}
