// The studio's state container: the undoable document (a History of Designs) and the session,
// framework-free so that commands and tests drive it without React.
import * as H from './history';
import { initialSession, type Session } from './session';
import type { Design } from './types';

export interface StudioState {
  history: H.History<Design>;
  session: Session;
  /**
   * View only: document edits are ignored. Set from the start for someone who may read but not change
   * the design, or later when the server refuses a save (signed out, access withdrawn).
   */
  readOnly: boolean;
}

export class StudioStore {
  private state: StudioState;
  private readonly listeners = new Set<() => void>();

  constructor(design: Design, session: Partial<Session> = {}, options: { readOnly?: boolean } = {}) {
    this.state = {
      history: H.createHistory(design),
      session: { ...initialSession(), ...session },
      readOnly: options.readOnly ?? false,
    };
  }

  /** View-only studio: document edits are ignored (see StudioState.readOnly). */
  get readOnly(): boolean {
    return this.state.readOnly;
  }

  /** Switches editing off (a running drag is abandoned, a placing tool put down) or back on. */
  setReadOnly(readOnly: boolean) {
    if (readOnly === this.state.readOnly) return;
    if (readOnly && this.inGesture) this.applyHistory(H.cancelGesture(this.state.history));
    const s = this.state.session;
    const session: Session =
      readOnly && s.tool !== 'select' && s.tool !== 'pan' && s.tool !== 'probe' && s.tool !== 'ruler'
        ? { ...s, tool: 'select', guides: [] }
        : s;
    this.set({ ...this.state, session, readOnly });
  }

  getState = (): StudioState => this.state;

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  get design(): Design {
    return this.state.history.present;
  }

  get session(): Session {
    return this.state.session;
  }

  private set(next: StudioState) {
    if (next === this.state) return;
    this.state = next;
    for (const l of [...this.listeners]) l();
  }

  setSession(patch: Partial<Session> | ((s: Session) => Partial<Session>)) {
    const p = typeof patch === 'function' ? patch(this.state.session) : patch;
    const keys = Object.keys(p) as (keyof Session)[];
    if (keys.every((k) => Object.is(p[k], this.state.session[k]))) return;
    this.set({ ...this.state, session: { ...this.state.session, ...p } });
  }

  /** Applies a document change: one undo step, or part of the running gesture. */
  edit(fn: (d: Design) => Design) {
    if (this.readOnly) return;
    const history = H.commit(this.state.history, fn(this.state.history.present));
    this.applyHistory(history);
  }

  beginGesture() {
    if (this.readOnly) return;
    this.applyHistory(H.beginGesture(this.state.history));
  }

  endGesture() {
    this.applyHistory(H.endGesture(this.state.history));
    if (this.state.session.guides.length) this.setSession({ guides: [] });
  }

  cancelGesture() {
    this.applyHistory(H.cancelGesture(this.state.history));
    if (this.state.session.guides.length) this.setSession({ guides: [] });
  }

  get inGesture(): boolean {
    return this.state.history.gestureBase !== null;
  }

  canUndo(): boolean {
    return H.canUndo(this.state.history);
  }

  canRedo(): boolean {
    return H.canRedo(this.state.history);
  }

  undo() {
    this.applyHistory(H.undo(this.state.history));
  }

  redo() {
    this.applyHistory(H.redo(this.state.history));
  }

  /** Replaces the document and forgets undo history (a load, a restored copy, a conflict resolution). */
  load(design: Design) {
    this.applyHistory(H.reset(design));
  }

  private applyHistory(history: H.History<Design>) {
    if (history === this.state.history) return;
    // Keep the selection to things that still exist (after undo, delete, load).
    const d = history.present;
    const alive = new Set([...d.objects.map((o) => o.id), ...(d.probes ?? []).map((p) => p.id)]);
    const sel = this.state.session.selection;
    const selection = sel.every((id) => alive.has(id)) ? sel : sel.filter((id) => alive.has(id));
    const session = selection === sel ? this.state.session : { ...this.state.session, selection };
    this.set({ ...this.state, history, session });
  }
}
