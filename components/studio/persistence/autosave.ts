// Autosave: debounced saves with a visible state, a local safety copy of anything unsaved,
// retries with backoff while offline, and a conflict state when someone else saved first.
// Framework-free (timers and storage are injected) so the whole flow is unit-tested.
import { clearBackup, sameDesign, writeBackup } from './backup';
import { OfflineError, SaveRejectedError, type KeyValueStorage, type StudioPersistence } from './types';
import type { Design } from '../state/types';

export type SaveState =
  | { kind: 'saved'; at: number | null }
  | { kind: 'pending' }
  | { kind: 'saving' }
  | { kind: 'offline'; retryAt: number }
  | { kind: 'conflict'; theirs: { version: number; design: Design } }
  | { kind: 'error'; message: string }
  /**
   * The server refuses this person's saves: signed out (401), or no longer allowed to change the design
   * (403; 404 once they may not even see it, e.g. the enclosure went to another keeper). Retrying alone
   * cannot fix it: the studio turns view-only and the unsaved work stays in the local copy.
   */
  | { kind: 'refused'; reason: RefusedReason; message: string };

export type RefusedReason = 'signed-out' | 'no-access';

/** The answers that mean "you may not save this", as opposed to "this design is not valid". */
export function refusedReason(status: number): RefusedReason | null {
  if (status === 401) return 'signed-out';
  if (status === 403 || status === 404) return 'no-access';
  return null;
}

export interface AutosaveOptions {
  persistence: StudioPersistence;
  storage: KeyValueStorage;
  /** Version the current document is based on. */
  version: number;
  /** The document as loaded (so an unchanged document is not saved). */
  design: Design;
  debounceMs?: number;
  now?: () => number;
  onState?: (s: SaveState) => void;
}

export const DEBOUNCE_MS = 800;
export const BACKOFF_MS = [1000, 2000, 4000, 8000, 15000, 30000];

export class Autosave {
  private readonly p: StudioPersistence;
  private readonly storage: KeyValueStorage;
  private readonly debounceMs: number;
  private readonly now: () => number;
  private readonly onState: (s: SaveState) => void;

  private baseVersion: number;
  /** Latest document the user has. */
  private latest: Design;
  /** Latest document the server is known to have. */
  private saved: Design;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private inFlight: Promise<void> | null = null;
  private attempt = 0;
  private disposed = false;
  private _state: SaveState = { kind: 'saved', at: null };

  constructor(o: AutosaveOptions) {
    this.p = o.persistence;
    this.storage = o.storage;
    this.baseVersion = o.version;
    this.latest = o.design;
    this.saved = o.design;
    this.debounceMs = o.debounceMs ?? DEBOUNCE_MS;
    this.now = o.now ?? Date.now;
    this.onState = o.onState ?? (() => {});
  }

  get state(): SaveState {
    return this._state;
  }

  get version(): number {
    return this.baseVersion;
  }

  get hasUnsaved(): boolean {
    return !sameDesign(this.latest, this.saved);
  }

  private setState(s: SaveState) {
    this._state = s;
    if (!this.disposed) this.onState(s);
  }

  private schedule(ms: number) {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.flush();
    }, ms);
  }

  /** The user changed the document. */
  change(design: Design) {
    if (design === this.latest) return;
    this.latest = design;
    if (!this.hasUnsaved) {
      clearBackup(this.storage, this.p.key);
      if (this.timer) clearTimeout(this.timer);
      this.timer = null;
      if (this._state.kind === 'pending') this.setState({ kind: 'saved', at: this.now() });
      return;
    }
    writeBackup(this.storage, this.p.key, { design, baseVersion: this.baseVersion, savedAt: this.now() });
    if (this._state.kind === 'conflict') return; // wait for the user's decision
    if (this._state.kind === 'offline') return; // the retry timer saves the newest copy
    if (this._state.kind === 'refused') return; // kept locally; sent only when asked to try again
    if (this._state.kind !== 'saving' && this._state.kind !== 'pending') this.setState({ kind: 'pending' });
    this.schedule(this.debounceMs);
  }

  /** Saves now (Ctrl+S, going offline → online, leaving the page). */
  async flush(): Promise<void> {
    if (this.timer) {
      clearTimeout(this.timer);
      this.timer = null;
    }
    if (this.disposed || this._state.kind === 'conflict') return;
    if (this.inFlight) {
      await this.inFlight;
      // Read the state afresh: the save that just finished may have changed it.
      const kind = this.state.kind as SaveState['kind'];
      if (this.hasUnsaved && kind !== 'conflict' && kind !== 'offline') {
        return this.flush();
      }
      return;
    }
    if (!this.hasUnsaved) {
      if (this._state.kind !== 'saved') this.setState({ kind: 'saved', at: this.now() });
      return;
    }
    this.inFlight = this.saveOnce().finally(() => {
      this.inFlight = null;
    });
    await this.inFlight;
    if (this.hasUnsaved && (this.state.kind as SaveState['kind']) === 'saved') {
      // Changes made while the request was running.
      this.setState({ kind: 'pending' });
      this.schedule(this.debounceMs);
    }
  }

  private async saveOnce(): Promise<void> {
    const sending = this.latest;
    this.setState({ kind: 'saving' });
    try {
      const r = await this.p.save(sending, this.baseVersion);
      if ('conflict' in r && !sameDesign(r.conflict.design, sending)) {
        this.setState({ kind: 'conflict', theirs: r.conflict });
        return;
      }
      // A stale version whose stored design is exactly the one sent is this studio's own earlier save
      // that reached the server while its answer did not (a dropped connection, a save sent as the page
      // was left): nothing of anyone's is lost, so it counts as saved at the server's version.
      const version = 'conflict' in r ? r.conflict.version : r.version;
      this.attempt = 0;
      this.baseVersion = version;
      this.saved = sending;
      if (!this.hasUnsaved) clearBackup(this.storage, this.p.key);
      else
        writeBackup(this.storage, this.p.key, {
          design: this.latest,
          baseVersion: version,
          savedAt: this.now(),
        });
      this.setState({ kind: 'saved', at: this.now() });
    } catch (err) {
      if (err instanceof SaveRejectedError) {
        const reason = refusedReason(err.status);
        this.setState(
          reason
            ? { kind: 'refused', reason, message: err.message }
            : { kind: 'error', message: err.message },
        );
        return;
      }
      const wait = BACKOFF_MS[Math.min(this.attempt, BACKOFF_MS.length - 1)] as number;
      this.attempt++;
      this.setState({ kind: 'offline', retryAt: this.now() + wait });
      this.schedule(wait);
      if (!(err instanceof OfflineError)) console.warn('Autosave failed; will retry', err);
    }
  }

  /** The browser is back online (or the person asks to try again): retry at once. */
  online() {
    if (this._state.kind === 'offline' || this._state.kind === 'error' || this._state.kind === 'refused') {
      this.attempt = 0;
      void this.flush();
    }
  }

  /** Conflict: keep my version, overwriting theirs (based on their version now). */
  async keepMine(): Promise<void> {
    if (this._state.kind !== 'conflict') return;
    this.baseVersion = this._state.theirs.version;
    this.setState({ kind: 'pending' });
    await this.flush();
  }

  /** Conflict: take their version; returns it for the studio to load. */
  takeTheirs(): Design | null {
    if (this._state.kind !== 'conflict') return null;
    const { version, design } = this._state.theirs;
    this.baseVersion = version;
    this.saved = design;
    this.latest = design;
    clearBackup(this.storage, this.p.key);
    this.setState({ kind: 'saved', at: this.now() });
    return design;
  }

  /** Restoring a local copy: the document is based on an older version and not yet saved. */
  restore(design: Design, baseVersion: number) {
    this.baseVersion = baseVersion;
    this.latest = design;
    writeBackup(this.storage, this.p.key, { design, baseVersion, savedAt: this.now() });
    this.setState({ kind: 'pending' });
    this.schedule(0);
  }

  dispose() {
    this.disposed = true;
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
  }
}
