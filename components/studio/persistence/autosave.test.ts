import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { Autosave, BACKOFF_MS, DEBOUNCE_MS, type SaveState } from './autosave';
import { backupKey, readBackup, sameDesign } from './backup';
import {
  memoryStorage,
  OfflineError,
  SaveRejectedError,
  type SaveResult,
  type StudioPersistence,
} from './types';
import { exampleDesign } from '../examples/exampleDesign';
import { moveObjects } from '../state/document';
import type { Design } from '../state/types';

/** A fake server with a version counter; `mode` decides how the next save answers. */
function fakeServer() {
  const server = {
    version: 3,
    design: exampleDesign(),
    mode: 'ok' as 'ok' | 'offline' | 'reject' | 401 | 403 | 404,
    saves: [] as { design: Design; baseVersion: number }[],
  };
  const persistence: StudioPersistence = {
    key: 'v1',
    load: async () => ({ design: server.design, version: server.version }),
    save: async (design, baseVersion): Promise<SaveResult> => {
      server.saves.push({ design, baseVersion });
      if (server.mode === 'offline') throw new OfflineError();
      if (server.mode === 'reject') throw new SaveRejectedError('invalid design', 400);
      if (typeof server.mode === 'number') throw new SaveRejectedError('not yours', server.mode);
      if (baseVersion !== server.version)
        return { conflict: { version: server.version, design: server.design } };
      server.version++;
      server.design = design;
      return { version: server.version };
    },
  };
  return { server, persistence };
}

function setup() {
  const { server, persistence } = fakeServer();
  const storage = memoryStorage();
  const states: SaveState['kind'][] = [];
  const a = new Autosave({
    persistence,
    storage,
    version: 3,
    design: server.design,
    onState: (s) => states.push(s.kind),
  });
  return { a, server, storage, states };
}

/** The server answers again and the page is back online: the newest copy `d` is saved, the local one cleared. */
async function expectSavedWhenBack(
  { a, server, storage }: Pick<ReturnType<typeof setup>, 'a' | 'server' | 'storage'>,
  d: Design,
) {
  server.mode = 'ok';
  a.online();
  await vi.advanceTimersByTimeAsync(0);
  expect(a.state.kind).toBe('saved');
  expect(sameDesign(server.design, d)).toBe(true);
  expect(storage.data.size).toBe(0);
}

const moved = (d: Design, dx: number) => moveObjects(d, ['b1'], dx, 0);

beforeEach(() => vi.useFakeTimers());
afterEach(() => vi.useRealTimers());

describe('Autosave', () => {
  it('debounces: many changes within the delay make one save', async () => {
    const { a, server, states } = setup();
    let d = server.design;
    for (let i = 1; i <= 5; i++) {
      d = moved(d, 1);
      a.change(d);
      await vi.advanceTimersByTimeAsync(DEBOUNCE_MS / 2);
    }
    expect(server.saves).toHaveLength(0);
    expect(a.state.kind).toBe('pending');
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS);
    expect(server.saves).toHaveLength(1);
    expect(server.saves[0]?.baseVersion).toBe(3);
    expect(a.state.kind).toBe('saved');
    expect(a.version).toBe(4);
    expect(states).toEqual(['pending', 'saving', 'saved']);
  });

  it('keeps a local copy until the server has it', async () => {
    const { a, server, storage } = setup();
    const d = moved(server.design, 2);
    a.change(d);
    const copy = readBackup(storage, 'v1');
    expect(copy && sameDesign(copy.design, d)).toBe(true);
    expect(copy?.baseVersion).toBe(3);
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS);
    expect(storage.data.has(backupKey('v1'))).toBe(false);
  });

  it('goes offline, retries with backoff, and saves the newest copy when back', async () => {
    const { a, server, storage } = setup();
    server.mode = 'offline';
    let d = moved(server.design, 1);
    a.change(d);
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS);
    expect(a.state.kind).toBe('offline');
    await vi.advanceTimersByTimeAsync(BACKOFF_MS[0]!);
    expect(server.saves).toHaveLength(2);
    await vi.advanceTimersByTimeAsync(BACKOFF_MS[1]! - 1);
    expect(server.saves).toHaveLength(2); // waits longer the second time
    d = moved(d, 1);
    a.change(d); // edits while offline stay local
    expect(readBackup(storage, 'v1')?.design).toEqual(d);
    await expectSavedWhenBack({ a, server, storage }, d);
  });

  it('stops on a conflict until the user chooses, then keeps mine', async () => {
    const { a, server } = setup();
    server.version = 7; // someone else saved
    const mine = moved(server.design, 3);
    a.change(mine);
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS);
    expect(a.state.kind).toBe('conflict');
    a.change(moved(mine, 1));
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS * 3);
    expect(server.saves).toHaveLength(1); // nothing overwritten while undecided
    await a.keepMine();
    expect(a.state.kind).toBe('saved');
    expect(server.version).toBe(8);
    expect(sameDesign(server.design, moved(mine, 1))).toBe(true);
  });

  it('takes a stale answer that holds exactly the design sent as saved: its own save whose answer was lost', async () => {
    const { a, server, storage } = setup();
    const mine = moved(server.design, 3);
    // The same edit already reached the server (from this studio, before a reload) at a newer version.
    server.version = 8;
    server.design = mine;
    a.change(mine);
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS);
    expect(a.state.kind).toBe('saved');
    expect(a.version).toBe(8);
    expect(storage.data.size).toBe(0);
    // The next edit is based on that version and saves without a conflict.
    a.change(moved(mine, 1));
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS);
    expect(a.state.kind).toBe('saved');
    expect(server.version).toBe(9);
    expect(server.saves.at(-1)?.baseVersion).toBe(8);
  });

  it('or takes theirs, dropping the local copy', async () => {
    const { a, server, storage } = setup();
    server.version = 9;
    a.change(moved(server.design, 3));
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS);
    const theirs = a.takeTheirs();
    expect(theirs && sameDesign(theirs, server.design)).toBe(true);
    expect(a.version).toBe(9);
    expect(storage.data.size).toBe(0);
    expect(a.hasUnsaved).toBe(false);
  });

  it('shows an error, without retrying forever, when the server rejects the design', async () => {
    const { a, server, storage } = setup();
    server.mode = 'reject';
    a.change(moved(server.design, 3));
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS + 60_000);
    expect(a.state).toEqual({ kind: 'error', message: 'invalid design' });
    expect(server.saves).toHaveLength(1);
    expect(storage.data.size).toBe(1); // the work is still kept locally
  });

  it.each([
    [401, 'signed-out'],
    [403, 'no-access'],
    [404, 'no-access'],
  ] as const)(
    'a save refused with %i is "refused" (%s): no retry, the work kept locally, a retry on request',
    async (status, reason) => {
      const { a, server, storage } = setup();
      server.mode = status;
      const d = moved(server.design, 3);
      a.change(d);
      await vi.advanceTimersByTimeAsync(DEBOUNCE_MS + 60_000);
      expect(a.state).toEqual({ kind: 'refused', reason, message: 'not yours' });
      expect(server.saves).toHaveLength(1);
      expect(sameDesign(readBackup(storage, 'v1')!.design, d)).toBe(true);
      // Later edits are kept locally too, and not sent.
      const d2 = moved(d, 1);
      a.change(d2);
      await vi.advanceTimersByTimeAsync(DEBOUNCE_MS * 2);
      expect(server.saves).toHaveLength(1);
      expect(sameDesign(readBackup(storage, 'v1')!.design, d2)).toBe(true);
      // Signed in again elsewhere: "try again" saves the newest copy.
      await expectSavedWhenBack({ a, server, storage }, d2);
    },
  );

  it('saves changes made while a save was running', async () => {
    const { a, server } = setup();
    const d1 = moved(server.design, 1);
    a.change(d1);
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS - 1);
    const flushing = a.flush();
    const d2 = moved(d1, 1);
    a.change(d2);
    await flushing;
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS);
    expect(server.saves.map((s) => s.baseVersion)).toEqual([3, 4]);
    expect(sameDesign(server.design, d2)).toBe(true);
  });

  it('returning to the saved design needs no save', async () => {
    const { a, server } = setup();
    const original = server.design;
    a.change(moved(original, 1));
    a.change(original);
    await vi.advanceTimersByTimeAsync(DEBOUNCE_MS * 2);
    expect(server.saves).toHaveLength(0);
    expect(a.state.kind).toBe('saved');
  });

  it('restores a local copy and saves it against its base version', async () => {
    const { a, server } = setup();
    const copy = moved(server.design, 4);
    a.restore(copy, 3);
    await vi.advanceTimersByTimeAsync(0);
    expect(server.saves[0]?.baseVersion).toBe(3);
    expect(a.state.kind).toBe('saved');
  });
});

describe('backup', () => {
  it('ignores damaged copies', () => {
    const s = memoryStorage();
    s.setItem(backupKey('x'), '{not json');
    expect(readBackup(s, 'x')).toBeNull();
    s.setItem(backupKey('x'), JSON.stringify({ design: { format: 'nope' }, baseVersion: 1, savedAt: 0 }));
    expect(readBackup(s, 'x')).toBeNull();
  });

  it('compares designs regardless of key order', () => {
    const d = exampleDesign();
    const reordered = {
      objects: d.objects,
      enclosure: d.enclosure,
      version: d.version,
      format: d.format,
    } as Design;
    expect(sameDesign(d, reordered)).toBe(true);
    expect(sameDesign(d, moved(d, 1))).toBe(false);
  });
});
