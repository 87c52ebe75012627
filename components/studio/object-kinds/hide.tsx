// A hide on the canvas: a rounded box with a shaded inside and an arched door.
import { Rect, Shape } from 'react-konva';
import { C } from '../canvas/colors';
import { BoxBody, stageBox } from './box';
import { BoxForm } from '../panels/ShapeForms';
import type { StudioKind } from './types';

export const hide: StudioKind<'hide'> = {
  Shape: ({ o, cam }) => {
    const { tl, w, h, outline } = stageBox(o, cam);
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
  },
  icon: (
    <>
      <path d="M3 20V9a3 3 0 013-3h12a3 3 0 013 3v11z" />
      <path d="M9 20v-4a3 3 0 016 0v4" />
    </>
  ),
  Form: ({ o }) => <BoxForm o={o} />,
};
