'use client';
import { memo } from 'react';
// Rulers along the top and left edges of the view, in the chosen unit, measured from the
// enclosure's inside bottom-left corner (the design origin).
import { Group, Rect, Shape, Text } from 'react-konva';
import { designToStage, niceStepCm, visibleDesignRect, type ViewLayerProps } from '../geometry/camera';
import { displayToCm, formatNumber } from '@/shared/units';
import { C } from './colors';

export const RULER_PX = 22;

export const Rulers = memo(function Rulers({ cam, viewport, unit }: ViewLayerProps) {
  const cmPerUnit = displayToCm(1, unit);
  const major = niceStepCm(cam.zoom, 60, cmPerUnit);
  const minor = major / (Math.round(major / cmPerUnit) % 2 === 0 || major / cmPerUnit < 1 ? 4 : 5);
  const vis = visibleDesignRect(cam, viewport);
  const labels: { x: number; y: number; text: string; vertical: boolean }[] = [];
  for (let x = Math.ceil(vis.x / major) * major; x <= vis.x + vis.width; x += major) {
    const sx = designToStage(cam, { x, y: 0 }).x;
    if (sx > RULER_PX + 4)
      labels.push({ x: sx + 3, y: 3, text: formatNumber(x / cmPerUnit, 2), vertical: false });
  }
  for (let y = Math.ceil(vis.y / major) * major; y <= vis.y + vis.height; y += major) {
    const sy = designToStage(cam, { x: 0, y }).y;
    if (sy > RULER_PX + 4)
      labels.push({ x: 3, y: sy - 3, text: formatNumber(y / cmPerUnit, 2), vertical: true });
  }
  return (
    <Group listening={false}>
      <Rect x={0} y={0} width={viewport.width} height={RULER_PX} fill={C.outside} />
      <Rect x={0} y={0} width={RULER_PX} height={viewport.height} fill={C.outside} />
      <Shape
        sceneFunc={(ctx, shape) => {
          ctx.beginPath();
          ctx.moveTo(0, RULER_PX + 0.5);
          ctx.lineTo(viewport.width, RULER_PX + 0.5);
          ctx.moveTo(RULER_PX + 0.5, 0);
          ctx.lineTo(RULER_PX + 0.5, viewport.height);
          for (let x = Math.floor(vis.x / minor) * minor; x <= vis.x + vis.width; x += minor) {
            const sx = Math.round(designToStage(cam, { x, y: 0 }).x) + 0.5;
            if (sx < RULER_PX) continue;
            const isMajor = Math.abs(x / major - Math.round(x / major)) < 1e-6;
            ctx.moveTo(sx, RULER_PX);
            ctx.lineTo(sx, isMajor ? 0 : RULER_PX - 6);
          }
          for (let y = Math.floor(vis.y / minor) * minor; y <= vis.y + vis.height; y += minor) {
            const sy = Math.round(designToStage(cam, { x: 0, y }).y) + 0.5;
            if (sy < RULER_PX) continue;
            const isMajor = Math.abs(y / major - Math.round(y / major)) < 1e-6;
            ctx.moveTo(RULER_PX, sy);
            ctx.lineTo(isMajor ? 0 : RULER_PX - 6, sy);
          }
          ctx.strokeShape(shape);
        }}
        stroke={C.basalt500}
        strokeWidth={1}
      />
      {labels.map((l, i) => (
        <Text
          key={i}
          x={l.x}
          y={l.y}
          text={l.text}
          fontSize={10}
          fill={C.basalt700}
          rotation={l.vertical ? -90 : 0}
        />
      ))}
      <Rect x={0} y={0} width={RULER_PX} height={RULER_PX} fill={C.outside} />
      <Text x={2} y={6} width={RULER_PX - 4} align="center" text={unit} fontSize={9} fill={C.basalt600} />
    </Group>
  );
});
