'use client';
// Connects the store to Autosave: changes are saved after a pause, the local copy is offered back
// on load, the browser's online event retries at once, and leaving the page flushes.
import { useCallback, useEffect, useRef, useState } from 'react';
import { fitView } from '../state/actions';
import type { StudioStore } from '../state/store';
import type { Design } from '../state/types';
import { Autosave, type SaveState } from './autosave';
import { clearBackup, readBackup, sameDesign, type Backup } from './backup';
import type { KeyValueStorage, Loaded, StudioPersistence } from './types';

export function useAutosave(
  store: StudioStore,
  persistence: StudioPersistence,
  loaded: Loaded,
  storage: KeyValueStorage,
) {
  const [state, setState] = useState<SaveState>({ kind: 'saved', at: null });
  const ref = useRef<Autosave | null>(null);
  // The version the studio is on, kept across remounts (React may mount effects twice in development).
  const version = useRef(loaded.version);
  // A newer unsaved copy on this device (from a crash, a closed tab, an outage) is offered back.
  const [offer, setOffer] = useState<Backup | null>(() => {
    const b = readBackup(storage, persistence.key);
    return b && !sameDesign(b.design, loaded.design) ? b : null;
  });

  useEffect(() => {
    const autosave = new Autosave({
      persistence,
      storage,
      version: version.current,
      design: store.design,
      onState: (s) => {
        version.current = autosave.version;
        setState(s);
      },
    });
    ref.current = autosave;
    let last: Design = store.design;
    const unsubscribe = store.subscribe(() => {
      if (store.inGesture) return; // one save per finished drag
      const d = store.design;
      if (d !== last) {
        last = d;
        autosave.change(d);
      }
    });
    const online = () => autosave.online();
    const leave = () => void autosave.flush();
    window.addEventListener('online', online);
    window.addEventListener('pagehide', leave);
    return () => {
      unsubscribe();
      window.removeEventListener('online', online);
      window.removeEventListener('pagehide', leave);
      if (ref.current === autosave) ref.current = null;
      // Unsaved work stays in the local copy; try once more, then stop timers.
      void autosave.flush().finally(() => autosave.dispose());
    };
  }, [store, persistence, storage]);

  const restore = useCallback(() => {
    if (!offer || !ref.current) return;
    store.load(offer.design);
    fitView(store);
    ref.current.restore(offer.design, offer.baseVersion);
    setOffer(null);
  }, [offer, store]);

  const discard = useCallback(() => {
    clearBackup(storage, persistence.key);
    setOffer(null);
  }, [storage, persistence]);

  const keepMine = useCallback(() => void ref.current?.keepMine(), []);
  const takeTheirs = useCallback(() => {
    const d = ref.current?.takeTheirs();
    if (d) {
      store.load(d);
      fitView(store);
    }
  }, [store]);
  const saveNow = useCallback(() => {
    const a = ref.current;
    if (!a) return;
    if (a.state.kind === 'offline' || a.state.kind === 'error' || a.state.kind === 'refused') a.online();
    else void a.flush();
  }, []);

  return { state, offer, restore, discard, keepMine, takeTheirs, saveNow };
}
