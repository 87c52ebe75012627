'use client';
import { memo } from 'react';
// Filled contour bands of the shown field, in design coordinates mapped to the stage, clipped to
// the inside of the enclosure and drawn under the objects.
import { Group, Shape } from 'react-konva';
import { designToStage, type Camera } from '../geometry/camera';
import type { Enclosure } from '../state/types';

export interface ColouredBand {
  color: string;
  /** MultiPolygon in design cm: polygons → rings → [x, y]. */
  polygons: [number, number][][][];
}

export const FieldBands = memo(function FieldBands({
  cam,
  enclosure,
  bands,
  opacity,
}: {
  cam: Camera;
  enclosure: Enclosure;
  bands: ColouredBand[];
  opacity: number;
}) {
  const tl = designToStage(cam, { x: 0, y: enclosure.height });
  return (
    <Group
      listening={false}
      opacity={opacity}
      clipX={tl.x}
      clipY={tl.y}
      clipWidth={enclosure.width * cam.zoom}
      clipHeight={enclosure.height * cam.zoom}
    >
      {bands.map((band, k) => (
        <Shape
          key={k}
          fill={band.color}
          // Neighbouring bands share edges; a hairline of the same colour hides anti-aliasing seams.
          stroke={band.color}
          strokeWidth={0.75}
          perfectDrawEnabled={false}
          sceneFunc={(ctx, shape) => {
            ctx.beginPath();
            for (const polygon of band.polygons) {
              for (const ring of polygon) {
                ring.forEach(([x, y], i) => {
                  const sx = cam.originX + x * cam.zoom;
                  const sy = cam.originY - y * cam.zoom;
                  if (i === 0) ctx.moveTo(sx, sy);
                  else ctx.lineTo(sx, sy);
                });
                ctx.closePath();
              }
            }
            // Holes are separate rings of opposite winding (d3-contour), so even-odd fills them right.
            ctx.fillStrokeShape(shape);
          }}
          fillRule="evenodd"
        />
      ))}
    </Group>
  );
});
