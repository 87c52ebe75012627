// Persistence in this browser only, for the scratch studio ("Try the studio" without an account).
import { z } from 'zod';
import { parseDesign } from '@/simulation';
import type { Design } from '../state/types';
import type { KeyValueStorage, Loaded, SaveResult, StudioPersistence } from './types';

const stored = z.object({ version: z.number().int().min(0), design: z.unknown() });

export function localPersistence(
  key: string,
  initial: () => Design,
  storage: KeyValueStorage = globalThis.localStorage,
): StudioPersistence {
  const storageKey = `baskwell.studio.local.${key}`;
  function read(): Loaded | null {
    try {
      const raw = storage.getItem(storageKey);
      if (!raw) return null;
      const s = stored.safeParse(JSON.parse(raw));
      if (!s.success) return null;
      const parsed = parseDesign(s.data.design);
      return parsed.ok ? { design: parsed.design, version: s.data.version } : null;
    } catch {
      return null;
    }
  }
  return {
    key: `local:${key}`,
    where: 'browser',
    async load() {
      return read() ?? { design: initial(), version: 0 };
    },
    async save(design, baseVersion): Promise<SaveResult> {
      const current = read();
      // Another tab saved in between: same rule as the server.
      if (current && current.version !== baseVersion) return { conflict: current };
      const version = baseVersion + 1;
      storage.setItem(storageKey, JSON.stringify({ version, design }));
      return { version };
    },
  };
}
