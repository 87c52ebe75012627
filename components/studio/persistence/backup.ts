// The local safety copy of unsaved work: written on every change, removed once the server has the
// same design, offered back on the next load. Validated on read so a damaged copy is ignored, not fatal.
import { z } from 'zod';
import { parseDesign } from '@/simulation';
import type { Design } from '../state/types';
import type { KeyValueStorage } from './types';

export interface Backup {
  design: Design;
  /** The server version the unsaved changes were based on. */
  baseVersion: number;
  /** When the copy was written (ms since epoch). */
  savedAt: number;
}

const PREFIX = 'baskwell.studio.unsaved.';

const envelope = z.object({
  design: z.unknown(),
  baseVersion: z.number().int().min(0),
  savedAt: z.number(),
});

export function backupKey(key: string): string {
  return PREFIX + key;
}

export function writeBackup(storage: KeyValueStorage, key: string, backup: Backup): boolean {
  try {
    storage.setItem(backupKey(key), JSON.stringify(backup));
    return true;
  } catch {
    // Storage full or disabled (private mode): the server save still runs; nothing else to do here.
    return false;
  }
}

export function readBackup(storage: KeyValueStorage, key: string): Backup | null {
  let raw: string | null;
  try {
    raw = storage.getItem(backupKey(key));
  } catch {
    return null;
  }
  if (!raw) return null;
  try {
    const env = envelope.safeParse(JSON.parse(raw));
    if (!env.success) return null;
    const parsed = parseDesign(env.data.design);
    if (!parsed.ok) return null;
    return { design: parsed.design, baseVersion: env.data.baseVersion, savedAt: env.data.savedAt };
  } catch {
    return null;
  }
}

export function clearBackup(storage: KeyValueStorage, key: string) {
  try {
    storage.removeItem(backupKey(key));
  } catch {
    // ignore: see writeBackup
  }
}

/** JSON with object keys sorted, so documents that differ only in key order compare equal. */
function stableJson(v: unknown): string {
  return JSON.stringify(v, (_k, val: unknown) =>
    val && typeof val === 'object' && !Array.isArray(val)
      ? Object.fromEntries(
          Object.entries(val as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)),
        )
      : val,
  );
}

/** Structural equality of two designs (the JSON the server stores). */
export function sameDesign(a: Design, b: Design): boolean {
  return a === b || stableJson(a) === stableJson(b);
}
