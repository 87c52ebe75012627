'use client';
import { memo, type ReactNode } from 'react';
// How each design object is drawn: our own visual language. Shapes are drawn in stage pixels
// from the camera; nothing here listens to events (hit testing is in interaction.ts).
import { Circle, Group, Line, Rect, Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import type { RectConfig } from 'konva/lib/shapes/Rect';
import { designToStage, type Camera, type Rect as Rect2 } from '../geometry/camera';
import { BULB_RADIUS_CM, lampExtent, TUBE_THICKNESS_CM } from '@/shared/object-kinds/lamp';
import { LAMP_TECHS } from '@/simulation';
import { calibrationLabel } from '../state/calibration';
import type { DesignObject, LampObject } from '../state/types';
import { lampLook } from '@/shared/lamp-look';
import { C } from './colors';

const TECH_SHORT: Record<LampObject['tech'], string> = {
  t5: 'T5',
  t8: 'T8',
  compact: 'Compact UVB',
  'mercury-vapour': 'Mercury vapour',
  'metal-halide': 'Metal halide',
  'led-uvb': 'UVB LED',
  halogen: 'Halogen',
  incandescent: 'Incandescent',
  ceramic: 'Ceramic',
};

/** A lamp's label on the canvas; a calibrated lamp says so on a second line (its figures are the real lamp's). */
export function lampLabel(o: LampObject): { text: string; calibrated: boolean } {
  const watts = o.watts ?? LAMP_TECHS[o.tech].watts;
  const calibrated = calibrationLabel(o);
  return {
    text: `${o.name ?? TECH_SHORT[o.tech]} · ${watts} W${calibrated ? `\n✓ ${calibrated}` : ''}`,
    calibrated: calibrated !== null,
  };
}

/** The lamp as drawn (stage px), bulb cap included: its label goes around this (LampLabels). */
export function lampBody(o: LampObject, cam: Camera): Rect2 {
  const c = designToStage(cam, o);
  if (o.form === 'tube') {
    const { x1, x2 } = lampExtent(o);
    const h = Math.max(6, TUBE_THICKNESS_CM * cam.zoom);
    return {
      x: designToStage(cam, { x: x1, y: o.y }).x,
      y: c.y - h / 2,
      width: (x2 - x1) * cam.zoom,
      height: h,
    };
  }
  const r = Math.max(6, BULB_RADIUS_CM * cam.zoom);
  return { x: c.x - r, y: c.y - r * 1.55, width: 2 * r, height: r * 2.55 };
}

function Lamp({ o, cam }: { o: LampObject; cam: Camera }) {
  const col = lampLook(o);
  const c = designToStage(cam, o);
  if (o.form === 'tube') {
    const { x1, x2 } = lampExtent(o);
    const a = designToStage(cam, { x: x1, y: o.y });
    const w = (x2 - x1) * cam.zoom;
    const h = Math.max(6, TUBE_THICKNESS_CM * cam.zoom);
    const cap = Math.min(w / 6, Math.max(4, 1.5 * cam.zoom));
    return (
      <Group listening={false}>
        <Rect
          x={a.x}
          y={c.y - h / 2}
          width={w}
          height={h}
          cornerRadius={h / 2}
          fill={col.fill}
          stroke={col.stroke}
          strokeWidth={1.5}
        />
        <Line
          points={[a.x + cap, c.y, a.x + w - cap, c.y]}
          stroke={col.core}
          strokeWidth={Math.max(2, h / 3)}
          lineCap="round"
        />
        <Rect
          x={a.x}
          y={c.y - h / 2}
          width={cap}
          height={h}
          fill={C.basalt500}
          cornerRadius={[h / 2, 0, 0, h / 2]}
        />
        <Rect
          x={a.x + w - cap}
          y={c.y - h / 2}
          width={cap}
          height={h}
          fill={C.basalt500}
          cornerRadius={[0, h / 2, h / 2, 0]}
        />
      </Group>
    );
  }
  const r = Math.max(6, BULB_RADIUS_CM * cam.zoom);
  const beam = o.beamDeg ?? LAMP_TECHS[o.tech].beamDeg;
  const reach = 14 * cam.zoom;
  const half = (Math.min(beam, 359) / 2) * (Math.PI / 180);
  return (
    <Group listening={false}>
      {beam < 300 && (
        <Line
          points={[
            c.x - Math.sin(half) * reach,
            c.y + Math.cos(half) * reach,
            c.x,
            c.y,
            c.x + Math.sin(half) * reach,
            c.y + Math.cos(half) * reach,
          ]}
          stroke={col.stroke}
          strokeWidth={1}
          dash={[4, 4]}
          opacity={0.7}
        />
      )}
      <Rect
        x={c.x - r * 0.45}
        y={c.y - r * 1.55}
        width={r * 0.9}
        height={r * 0.7}
        fill={C.basalt500}
        cornerRadius={2}
      />
      <Circle x={c.x} y={c.y} radius={r} fill={col.fill} stroke={col.stroke} strokeWidth={1.5} />
      <Circle x={c.x} y={c.y} radius={r * 0.45} fill={col.core} />
    </Group>
  );
}

function meshScene(ctx: Context, pts: number[]) {
  const [x1, y1, x2, y2] = pts as [number, number, number, number];
  const len = Math.hypot(x2 - x1, y2 - y1);
  const ux = (x2 - x1) / (len || 1);
  const uy = (y2 - y1) / (len || 1);
  ctx.beginPath();
  ctx.moveTo(x1 - uy * 2.5, y1 + ux * 2.5);
  ctx.lineTo(x2 - uy * 2.5, y2 + ux * 2.5);
  ctx.moveTo(x1 + uy * 2.5, y1 - ux * 2.5);
  ctx.lineTo(x2 + uy * 2.5, y2 - ux * 2.5);
  // Cross-hatching suggests a woven mesh at any zoom.
  for (let d = 0; d <= len; d += 5) {
    const px = x1 + ux * d;
    const py = y1 + uy * d;
    ctx.moveTo(px - uy * 2.5 - ux * 2, py + ux * 2.5 - uy * 2);
    ctx.lineTo(px + uy * 2.5 + ux * 2, py - ux * 2.5 + uy * 2);
  }
}

function leavesScene(ctx: Context, x: number, y: number, w: number, h: number) {
  // A canopy of scallops on top of a body; the lobes' size follows the width.
  const n = Math.max(2, Math.round(w / 16));
  const r = w / n / 2;
  ctx.beginPath();
  ctx.moveTo(x, y + h);
  ctx.lineTo(x, y + r);
  for (let k = 0; k < n; k++) ctx.arc(x + r + 2 * r * k, y + r, r, Math.PI, 0, false);
  ctx.lineTo(x + w, y + h);
  ctx.closePath();
}

/** A solid box kind: its filled outline with the kind's details drawn over it. */
function BoxBody({ body, children }: { body: RectConfig; children: ReactNode }) {
  return (
    <Group listening={false}>
      <Rect {...body} />
      {children}
    </Group>
  );
}

export const ObjectShape = memo(function ObjectShape({ o, cam }: { o: DesignObject; cam: Camera }) {
  switch (o.type) {
    case 'lamp':
      return <Lamp o={o} cam={cam} />;
    case 'screen': {
      const a = designToStage(cam, { x: o.x1, y: o.y1 });
      const b = designToStage(cam, { x: o.x2, y: o.y2 });
      return (
        <Shape
          listening={false}
          sceneFunc={(ctx, shape) => {
            meshScene(ctx, [a.x, a.y, b.x, b.y]);
            ctx.strokeShape(shape);
          }}
          stroke={C.basalt500}
          strokeWidth={1}
        />
      );
    }
    case 'glass': {
      const a = designToStage(cam, { x: o.x1, y: o.y1 });
      const b = designToStage(cam, { x: o.x2, y: o.y2 });
      return (
        <Group listening={false}>
          <Line
            points={[a.x, a.y, b.x, b.y]}
            stroke={C.sky300}
            strokeWidth={5}
            lineCap="butt"
            opacity={0.9}
          />
          <Line points={[a.x, a.y, b.x, b.y]} stroke={C.white} strokeWidth={1} opacity={0.9} />
        </Group>
      );
    }
    case 'perch': {
      const a = designToStage(cam, { x: o.x1, y: o.y1 });
      const b = designToStage(cam, { x: o.x2, y: o.y2 });
      const w = Math.max(3, o.thickness * cam.zoom);
      return (
        <Group listening={false}>
          <Line points={[a.x, a.y, b.x, b.y]} stroke={C.sand800} strokeWidth={w + 2} lineCap="round" />
          <Line points={[a.x, a.y, b.x, b.y]} stroke={C.sand700} strokeWidth={w} lineCap="round" />
          <Line
            points={[a.x, a.y, b.x, b.y]}
            stroke={C.sand500}
            strokeWidth={Math.max(1, w / 5)}
            lineCap="round"
            opacity={0.6}
            dash={[w, w / 2]}
          />
        </Group>
      );
    }
    case 'ledge':
    case 'hide':
    case 'foliage': {
      // The box's outline in stage px; each kind dresses it in its own look.
      const tl = designToStage(cam, { x: o.x, y: o.y + o.height });
      const w = o.width * cam.zoom;
      const h = o.height * cam.zoom;
      const outline = { x: tl.x, y: tl.y, width: w, height: h, strokeWidth: 1.5 };
      if (o.type === 'ledge') {
        return (
          <BoxBody
            body={{ ...outline, fill: C.basalt300, stroke: C.basalt600, cornerRadius: Math.min(6, h / 4) }}
          >
            <Line
              points={[tl.x + 3, tl.y + 2.5, tl.x + w - 3, tl.y + 2.5]}
              stroke={C.basalt200}
              strokeWidth={2}
              lineCap="round"
            />
          </BoxBody>
        );
      }
      if (o.type === 'hide') {
        const door = Math.min(w * 0.3, h * 0.55);
        return (
          <BoxBody body={{ ...outline, fill: C.sand200, stroke: C.sand800, cornerRadius: [6, 6, 0, 0] }}>
            <Rect
              x={tl.x + 4}
              y={tl.y + 4}
              width={Math.max(0, w - 8)}
              height={Math.max(0, h - 4)}
              fill={C.sand800}
              opacity={0.18}
            />
            <Shape
              sceneFunc={(ctx, shape) => {
                const cx = tl.x + w / 2;
                const by = tl.y + h;
                ctx.beginPath();
                ctx.moveTo(cx - door / 2, by);
                ctx.arc(cx, by - door / 2, door / 2, Math.PI, 0, false);
                ctx.lineTo(cx + door / 2, by);
                ctx.closePath();
                ctx.fillStrokeShape(shape);
              }}
              fill={C.sand800}
              opacity={0.7}
            />
          </BoxBody>
        );
      }
      return (
        <Shape
          listening={false}
          sceneFunc={(ctx, shape) => {
            leavesScene(ctx, tl.x, tl.y, w, h);
            ctx.fillStrokeShape(shape);
          }}
          fill={C.moss400}
          opacity={0.7}
          stroke={C.moss700}
          strokeWidth={1.5}
        />
      );
    }
  }
});
