import type { Design } from '../state/types';

export interface Loaded {
  design: Design;
  version: number;
}

export type SaveResult = { version: number } | { conflict: { version: number; design: Design } };

/** Where the studio loads and saves its design. The studio never talks to a server directly. */
export interface StudioPersistence {
  /** Names the local safety copy (a variant id, or "scratch"). */
  readonly key: string;
  /** Where a save goes: the server (default) or this browser only (the scratch studio). */
  readonly where?: 'server' | 'browser';
  load(): Promise<Loaded>;
  save(design: Design, baseVersion: number): Promise<SaveResult>;
}

/** The server could not be reached or is unavailable (network error, 503): keep the copy and retry. */
export class OfflineError extends Error {
  constructor(message = 'The server cannot be reached') {
    super(message);
    this.name = 'OfflineError';
  }
}

/** The server refused the save for a reason retrying will not fix (not allowed, invalid design). */
export class SaveRejectedError extends Error {
  constructor(
    message: string,
    readonly status: number,
  ) {
    super(message);
    this.name = 'SaveRejectedError';
  }
}

/** Minimal storage surface (window.localStorage in the browser, a Map in tests). */
export interface KeyValueStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export function memoryStorage(): KeyValueStorage & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return {
    data,
    getItem: (k) => data.get(k) ?? null,
    setItem: (k, v) => void data.set(k, v),
    removeItem: (k) => void data.delete(k),
  };
}
