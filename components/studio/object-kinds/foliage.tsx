// Foliage on the canvas: a canopy of scallops over a body, see-through like the planting.
import { Shape } from 'react-konva';
import type { Context } from 'konva/lib/Context';
import { C } from '../canvas/colors';
import { stageBox } from './box';
import { BoxForm, UvbPassedSection } from '../panels/ShapeForms';
import type { StudioKind } from './types';

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

export const foliage: StudioKind<'foliage'> = {
  Shape: ({ o, cam }) => {
    const { tl, w, h } = stageBox(o, cam);
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
  },
  icon: <path d="M12 21V9M12 13c-4 0-6-3-6-6 3 0 6 2 6 6zM12 11c0-4 3-6 6-6 0 3-2 6-6 6zM8 21h8" />,
  Form: ({ o }) => (
    <BoxForm o={o}>
      <UvbPassedSection o={o} title="Planting" label="Light passed" />
    </BoxForm>
  ),
};
