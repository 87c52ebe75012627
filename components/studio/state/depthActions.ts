// Studio operations on depth, shared by the commands (keyboard), the top-view strip and the inspector.
// Each key press or typed value is one undo step; a drag on the strip is one gesture, so one step too.
import * as D from './depth';
import { gridStepCm } from './session';
import type { StudioStore } from './store';

/** One keyboard step in depth: the grid step (1 cm, or ½ in when working in inches). */
export function depthStepCm(store: StudioStore): number {
  return gridStepCm(store.session.lengthUnit);
}

/** The selected lamps (depth commands act on them). */
export function selectedLamps(store: StudioStore) {
  return D.lampsOf(store.design, store.session.selection);
}

/** Moves the side view's plane by `steps` grid steps (+ towards the back). */
export function moveSection(store: StudioStore, steps: number) {
  store.edit((d) => D.setSectionZ(d, D.sectionDepth(d) + steps * depthStepCm(store)));
}

export function setSection(store: StudioStore, z: number) {
  store.edit((d) => D.setSectionZ(d, z));
}

/** Moves the selected lamps by `steps` grid steps in depth (+ towards the back). */
export function moveSelectedLampsDepth(store: StudioStore, steps: number) {
  const ids = selectedLamps(store).map((l) => l.id);
  if (ids.length === 0) return;
  store.edit((d) => D.moveLampsZ(d, ids, steps * depthStepCm(store)));
}

export function setLampDepth(store: StudioStore, id: string, z: number) {
  store.edit((d) => D.setLampsZ(d, [id], z));
}

/** Puts the side view through a lamp: the plane its surfaces are best checked in. */
export function sectionThroughLamp(store: StudioStore, id: string) {
  const lamp = D.lampsOf(store.design, [id])[0];
  if (lamp) setSection(store, D.lampDepth(store.design, lamp));
}
