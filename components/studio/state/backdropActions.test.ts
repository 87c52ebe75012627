import { describe, expect, it } from 'vitest';
import { designSchema } from '@/simulation';
import { CanvasInteraction, type Modifiers } from '../canvas/interaction';
import { COMMANDS, command, isAvailable, isEnabled, runCommand } from '../commands/registry';
import { exampleDesign } from '../examples/exampleDesign';
import { designToStage, type Point } from '../geometry/camera';
import { chooseBackdrop, updateBackdrop } from './backdropActions';
import { StudioStore } from './store';

const none: Modifiers = { shift: false, mod: false, alt: false };
const PHOTOS = {
  items: [{ id: 7, name: 'front.jpg', url: '/api/uploads/7' }],
  uploadHref: '/enclosures/3/lamps',
};

function setup(photos: typeof PHOTOS | null = PHOTOS) {
  const store = new StudioStore(exampleDesign(), {
    camera: { zoom: 5, originX: 50, originY: 400 },
    photos,
  });
  const ui = new CanvasInteraction(store);
  const at = (x: number, y: number): Point => designToStage(store.session.camera, { x, y });
  const drag = (from: Point, to: Point) => {
    ui.down(from, none);
    for (let i = 1; i <= 5; i++)
      ui.move({ x: from.x + ((to.x - from.x) * i) / 5, y: from.y + ((to.y - from.y) * i) / 5 }, none);
    ui.up(to, none);
  };
  const ctx = { store };
  return { store, ui, at, drag, ctx };
}

describe('photo backdrop in the studio', () => {
  it('choosing a photo stretches it over the enclosure as one undo step, saved with the design', () => {
    const { store } = setup();
    chooseBackdrop(store, 7);
    const { width, height } = store.design.enclosure;
    expect(store.design.backdrop).toEqual({
      uploadId: 7,
      x: 0,
      y: 0,
      width,
      height,
      opacity: 0.6,
      visible: true,
    });
    expect(designSchema.safeParse(store.design).success).toBe(true);
    store.undo();
    expect(store.design.backdrop).toBeUndefined();
    store.redo();
    chooseBackdrop(store, null);
    expect('backdrop' in store.design).toBe(false);
  });

  it('while adjusting, a drag of a corner and a drag of the photo are one undo step each; objects stay', () => {
    const { store, ctx, drag, at } = setup();
    chooseBackdrop(store, 7);
    store.setSession({ backdropImage: { uploadId: 7, state: 'ready' } });
    expect(runCommand(command('backdrop.adjust'), ctx)).toBe(true);
    const objects = store.design.objects;
    const { width: W, height: H } = store.design.enclosure;
    drag(at(W, H), at(W + 10, H + 5));
    expect(store.design.backdrop).toMatchObject({ x: 0, y: 0, width: W + 10, height: H + 5 });
    drag(at(30, 20), at(28, 19));
    expect(store.design.backdrop).toMatchObject({ x: -2, y: -1, width: W + 10, height: H + 5 });
    expect(store.design.objects).toBe(objects);
    expect(store.session.selection).toEqual([]);
    store.undo();
    expect(store.design.backdrop).toMatchObject({ x: 0, y: 0, width: W + 10 });
    store.undo();
    expect(store.design.backdrop).toMatchObject({ x: 0, y: 0, width: W, height: H });
    // Escape ends adjusting: the same drag selects and moves objects again.
    runCommand(command('edit.deselect'), ctx);
    expect(store.session.backdropAdjust).toBe(false);
  });

  it('a photo that is not drawn (not listed for this user, or not loaded) cannot be adjusted', () => {
    const { store, ctx } = setup();
    store.load({
      ...store.design,
      backdrop: { uploadId: 99, x: 0, y: 0, width: 10, height: 10, opacity: 1, visible: true },
    });
    store.setSession({ backdropImage: { uploadId: 99, state: 'unavailable' } });
    expect(isEnabled(command('backdrop.adjust'), ctx)).toBe(false);
    // Choosing, showing and fitting still work on the stored placement.
    expect(isEnabled(command('backdrop.fit'), ctx)).toBe(true);
    updateBackdrop(store, { visible: false });
    expect(store.design.backdrop?.visible).toBe(false);
  });

  it('show/hide and fit go through the command registry and are undoable', () => {
    const { store, ctx } = setup();
    chooseBackdrop(store, 7);
    updateBackdrop(store, { x: 5, width: 50 });
    runCommand(command('backdrop.toggle'), ctx);
    expect(store.design.backdrop?.visible).toBe(false);
    runCommand(command('backdrop.fit'), ctx);
    expect(store.design.backdrop).toMatchObject({
      x: 0,
      width: store.design.enclosure.width,
      visible: false,
    });
    store.undo();
    store.undo();
    expect(store.design.backdrop).toMatchObject({ x: 5, width: 50, visible: true });
  });

  it('does not exist in the scratch studio (no enclosure): no commands, nothing in help', () => {
    const { ctx } = setup(null);
    const photoCommands = COMMANDS.filter((c) => c.group === 'Photo');
    expect(photoCommands.length).toBe(3);
    expect(photoCommands.some((c) => isAvailable(c, ctx) || isEnabled(c, ctx))).toBe(false);
  });

  it('a view-only studio cannot change the backdrop', () => {
    const store = new StudioStore(exampleDesign(), { photos: PHOTOS }, { readOnly: true });
    chooseBackdrop(store, 7);
    expect(store.design.backdrop).toBeUndefined();
  });
});
