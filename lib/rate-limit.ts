import 'server-only';
import { createHash } from 'node:crypto';
import { Op, QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { SignInAttempt } from '@/models';

/**
 * Fixed-window failure counters in the database, so every web process sees the same counts.
 * A window opens at the first failure and lasts `windowMs`; once a key reaches its limit inside the
 * window, attempts are refused until the window ends.
 */

export type LimitRule = { key: string; limit: number };
export type LimitVerdict = { allowed: true } | { allowed: false; retryAfterMs: number; key: string };

/** Keys are hashed so the table never holds e-mail addresses or IP addresses in the clear. */
export function limitKey(kind: string, value: string): string {
  return `${kind}:${createHash('sha256').update(value.trim().toLowerCase()).digest('hex')}`;
}

export async function checkLimits(
  rules: LimitRule[],
  windowMs: number,
  now = new Date(),
): Promise<LimitVerdict> {
  const rows = await SignInAttempt.findAll({
    where: { key: rules.map((r) => r.key), windowStart: { [Op.gt]: new Date(now.getTime() - windowMs) } },
  });
  let worst: LimitVerdict = { allowed: true };
  for (const rule of rules) {
    const row = rows.find((r) => r.key === rule.key);
    if (!row || row.count < rule.limit) continue;
    const retryAfterMs = row.windowStart.getTime() + windowMs - now.getTime();
    if (worst.allowed || retryAfterMs > worst.retryAfterMs)
      worst = { allowed: false, retryAfterMs, key: rule.key };
  }
  return worst;
}

/** Counts one attempt (a failure, for sign-in) against every key, atomically: concurrent ones all count. */
export async function countAttempt(keys: string[], windowMs: number, now = new Date()): Promise<void> {
  const sequelize = getSequelize();
  const expired = new Date(now.getTime() - windowMs);
  for (const key of keys) {
    // MariaDB applies the assignments left to right, so `count` still sees the old window_start.
    await sequelize.query(
      `INSERT INTO sign_in_attempts (\`key\`, window_start, count, created_at, updated_at)
       VALUES (:key, :now, 1, :now, :now)
       ON DUPLICATE KEY UPDATE
         count = IF(window_start <= :expired, 1, count + 1),
         window_start = IF(window_start <= :expired, :now, window_start),
         updated_at = :now`,
      { replacements: { key, now, expired }, type: QueryTypes.INSERT },
    );
  }
  // Old windows are useless; drop them so the table stays small (remembered addresses live longer).
  await SignInAttempt.destroy({
    where: {
      [Op.or]: [
        {
          key: { [Op.notLike]: 'known:%' },
          windowStart: { [Op.lt]: new Date(now.getTime() - 24 * 3600_000) },
        },
        { key: { [Op.like]: 'known:%' }, windowStart: { [Op.lt]: new Date(now.getTime() - KNOWN_MS) } },
      ],
    },
  });
}

export async function clearFailures(key: string): Promise<void> {
  await SignInAttempt.destroy({ where: { key } });
}

export type Counter = { count: number; lastAt: Date };

/** The live counters of these keys (window not yet over): how many, and when the last was counted. */
export async function readCounters(
  keys: string[],
  windowMs: number,
  now = new Date(),
): Promise<Map<string, Counter>> {
  const rows = await SignInAttempt.findAll({
    where: { key: keys, windowStart: { [Op.gt]: new Date(now.getTime() - windowMs) } },
  });
  return new Map(rows.map((r) => [r.key, { count: r.count, lastAt: r.updatedAt }]));
}

/** How long an address that signed in to an account is remembered as its owner's. */
export const KNOWN_MS = 30 * 24 * 3600_000;

/** Remembers a key (an account and address that signed in together) for KNOWN_MS from now. */
export async function markKnown(key: string, now = new Date()): Promise<void> {
  await getSequelize().query(
    `INSERT INTO sign_in_attempts (\`key\`, window_start, count, created_at, updated_at)
     VALUES (:key, :now, 0, :now, :now)
     ON DUPLICATE KEY UPDATE window_start = :now, updated_at = :now`,
    { replacements: { key, now }, type: QueryTypes.INSERT },
  );
}

export async function isKnown(key: string, now = new Date()): Promise<boolean> {
  const row = await SignInAttempt.findOne({
    where: { key, windowStart: { [Op.gt]: new Date(now.getTime() - KNOWN_MS) } },
    attributes: ['id'],
  });
  return row !== null;
}
