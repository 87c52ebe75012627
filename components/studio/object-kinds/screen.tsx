// A mesh screen on the canvas: two rails with cross-hatching.
import { Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import { C } from '../canvas/colors';
import { stageEnds } from './segment';
import { SegmentForm, UvbPassedSection } from '../panels/ShapeForms';
import type { StudioKind } from './types';

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

export const screen: StudioKind<'screen'> = {
  Shape: ({ o, cam }) => {
    const [a, b] = stageEnds(o, cam);
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
  },
  icon: <path d="M3 8h18M3 12h18M6 6v8M10 6v8M14 6v8M18 6v8" />,
  Form: ({ o }) => (
    <SegmentForm o={o}>
      <UvbPassedSection o={o} title="Material" label="UVB passed" hint="About the open area of the mesh" />
    </SegmentForm>
  ),
};
