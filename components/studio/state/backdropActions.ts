// Studio operations on the photo backdrop (design.backdrop), shared by the commands, the Photo
// section of the Fields panel and the canvas. Placement, opacity and visibility are part of the
// design (the user's work, kept and undoable); which photos exist is session (from the server).
import { fitToEnclosure } from '../geometry/backdrop';
import { setBackdrop } from './document';
import type { StudioStore } from './store';
import type { Backdrop } from './types';

/** A studio with an enclosure, so with photos to choose from (none in the scratch studio). */
export function hasEnclosurePhotos(store: StudioStore): boolean {
  return store.session.photos !== null;
}

/** Whether this user may see the chosen photo: it is one of the photos the server listed for them. */
export function backdropPhotoListed(store: StudioStore, uploadId: number): boolean {
  return Boolean(store.session.photos?.items.some((p) => p.id === uploadId));
}

/** The backdrop can be drawn: listed for this user and its image has loaded. */
export function backdropShown(store: StudioStore): boolean {
  const b = store.design.backdrop;
  const img = store.session.backdropImage;
  return Boolean(
    b &&
    b.visible &&
    backdropPhotoListed(store, b.uploadId) &&
    img?.uploadId === b.uploadId &&
    img.state === 'ready',
  );
}

/** Chooses a photo: a new one is stretched over the enclosure (opacity and visibility kept). */
export function chooseBackdrop(store: StudioStore, uploadId: number | null) {
  if (uploadId === null) {
    store.edit((d) => setBackdrop(d, undefined));
    store.setSession({ backdropAdjust: false });
    return;
  }
  store.edit((d) => {
    if (d.backdrop?.uploadId === uploadId) return d;
    return setBackdrop(d, fitToEnclosure(d.enclosure, uploadId, d.backdrop));
  });
}

/** Changes some of the backdrop's settings (one undo step, or part of the running gesture). */
export function updateBackdrop(store: StudioStore, patch: Partial<Omit<Backdrop, 'uploadId'>>) {
  store.edit((d) => (d.backdrop ? setBackdrop(d, { ...d.backdrop, ...patch }) : d));
}

export function fitBackdrop(store: StudioStore) {
  store.edit((d) =>
    d.backdrop ? setBackdrop(d, fitToEnclosure(d.enclosure, d.backdrop.uploadId, d.backdrop)) : d,
  );
}

export function toggleBackdrop(store: StudioStore) {
  const b = store.design.backdrop;
  if (!b) return;
  updateBackdrop(store, { visible: !b.visible });
  if (b.visible) store.setSession({ backdropAdjust: false });
}

export function toggleBackdropAdjust(store: StudioStore) {
  const on = !store.session.backdropAdjust;
  store.setSession({ backdropAdjust: on, ...(on ? { tool: 'select', selection: [] } : {}) });
}
