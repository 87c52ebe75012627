// What the box kinds' canvas shapes share: the box's outline in stage pixels, which each kind dresses
// in its own look.
import type { ReactNode } from 'react';
import { Group, Rect } from 'react-konva';
import type { RectConfig } from 'konva/lib/shapes/Rect';
import type { BoxObject } from '@/shared/object-kinds';
import { designToStage, type Camera } from '../geometry/camera';

/** The box's top-left corner, width and height on the stage, with the outline's line width. */
export function stageBox(o: BoxObject, cam: Camera) {
  const tl = designToStage(cam, { x: o.x, y: o.y + o.height });
  const w = o.width * cam.zoom;
  const h = o.height * cam.zoom;
  return { tl, w, h, outline: { x: tl.x, y: tl.y, width: w, height: h, strokeWidth: 1.5 } };
}

/** A solid box kind: its filled outline with the kind's details drawn over it. */
export function BoxBody({ body, children }: { body: RectConfig; children: ReactNode }) {
  return (
    <Group listening={false}>
      <Rect {...body} />
      {children}
    </Group>
  );
}
