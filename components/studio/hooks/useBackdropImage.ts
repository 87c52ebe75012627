'use client';
// Loads the backdrop's photo for the canvas, and tells the panel and the summary whether it could be
// drawn. A photo the server did not list for this user is never requested; one that fails to load
// (deleted, or access withdrawn since: the upload's route checks again) is "unavailable".
import { useEffect, useState } from 'react';
import type { StudioStore } from '../state/store';
import { useStudio } from './useStudio';

export function useBackdropImage(store: StudioStore): HTMLImageElement | null {
  const uploadId = useStudio(store, (s) => s.history.present.backdrop?.uploadId ?? null);
  const url = useStudio(store, (s) =>
    uploadId === null ? null : (s.session.photos?.items.find((p) => p.id === uploadId)?.url ?? null),
  );
  const [loaded, setLoaded] = useState<{ url: string; image: HTMLImageElement } | null>(null);

  useEffect(() => {
    if (uploadId === null) {
      store.setSession({ backdropImage: null });
      return;
    }
    if (url === null) {
      store.setSession({ backdropImage: { uploadId, state: 'unavailable' } });
      return;
    }
    let live = true;
    store.setSession({ backdropImage: { uploadId, state: 'loading' } });
    const image = new window.Image();
    image.onload = () => {
      if (!live) return;
      setLoaded({ url, image });
      store.setSession({ backdropImage: { uploadId, state: 'ready' } });
    };
    image.onerror = () => {
      if (live) store.setSession({ backdropImage: { uploadId, state: 'unavailable' } });
    };
    image.src = url;
    return () => {
      live = false;
    };
  }, [store, uploadId, url]);

  return loaded && loaded.url === url ? loaded.image : null;
}
