'use client';
import { memo } from 'react';
// The enclosure drawn to scale on a faint grid, its size label, and the photo traced over.
import { Group, Image as KonvaImage, Rect, Shape, Text } from 'react-konva';
import { backdropStageRect } from '../geometry/backdrop';
import {
  designToStage,
  niceStepCm,
  visibleDesignRect,
  type Camera,
  type ViewLayerProps,
} from '../geometry/camera';
import { displayToCm, formatLength, type LengthUnit } from '@/shared/units';
import type { Backdrop, Enclosure } from '../state/types';
import { C } from './colors';

export const GridShape = memo(function GridShape({ cam, viewport, unit }: ViewLayerProps) {
  const cmPerUnit = displayToCm(1, unit);
  const step = niceStepCm(cam.zoom, 14, cmPerUnit);
  const vis = visibleDesignRect(cam, viewport);
  return (
    <Shape
      listening={false}
      sceneFunc={(ctx, shape) => {
        ctx.beginPath();
        const x0 = Math.floor(vis.x / step) * step;
        for (let x = x0; x <= vis.x + vis.width; x += step) {
          const sx = Math.round(designToStage(cam, { x, y: 0 }).x) + 0.5;
          ctx.moveTo(sx, 0);
          ctx.lineTo(sx, viewport.height);
        }
        const y0 = Math.floor(vis.y / step) * step;
        for (let y = y0; y <= vis.y + vis.height; y += step) {
          const sy = Math.round(designToStage(cam, { x: 0, y }).y) + 0.5;
          ctx.moveTo(0, sy);
          ctx.lineTo(viewport.width, sy);
        }
        ctx.strokeShape(shape);
      }}
      stroke={C.basalt300}
      strokeWidth={1}
      opacity={0.35}
    />
  );
});

export const EnclosureBack = memo(function EnclosureBack({
  cam,
  enclosure,
}: {
  cam: Camera;
  enclosure: Enclosure;
}) {
  const tl = designToStage(cam, { x: 0, y: enclosure.height });
  return (
    <Rect
      listening={false}
      x={tl.x}
      y={tl.y}
      width={enclosure.width * cam.zoom}
      height={enclosure.height * cam.zoom}
      fill={C.paper}
      opacity={0.9}
    />
  );
});

export const EnclosureWalls = memo(function EnclosureWalls({
  cam,
  enclosure,
  unit,
}: {
  cam: Camera;
  enclosure: Enclosure;
  unit: LengthUnit;
}) {
  const tl = designToStage(cam, { x: 0, y: enclosure.height });
  const w = enclosure.width * cam.zoom;
  const h = enclosure.height * cam.zoom;
  const label = `${formatLength(enclosure.width, unit)} wide × ${formatLength(enclosure.height, unit)} high · ${formatLength(enclosure.depth, unit)} deep`;
  return (
    <Group listening={false}>
      <Rect x={tl.x} y={tl.y} width={w} height={h} stroke={C.basalt700} strokeWidth={2} />
      <Rect x={tl.x - 4} y={tl.y + h} width={w + 8} height={5} fill={C.basalt700} />
      <Text
        x={tl.x}
        y={tl.y + h + 12}
        width={w}
        align="center"
        text={label}
        fontSize={12}
        fill={C.basalt600}
      />
    </Group>
  );
});

/** The photo of the real enclosure, under the fields and the objects, where the user placed it. */
export const BackdropPhoto = memo(function BackdropPhoto({
  cam,
  backdrop,
  image,
}: {
  cam: Camera;
  backdrop: Backdrop;
  image: HTMLImageElement;
}) {
  const r = backdropStageRect(cam, backdrop);
  return (
    <KonvaImage
      listening={false}
      image={image}
      x={r.x}
      y={r.y}
      width={r.width}
      height={r.height}
      opacity={backdrop.opacity}
    />
  );
});
