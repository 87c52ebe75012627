// A ledge on the canvas: a grey slab with a light top edge.
import { Line } from 'react-konva';
import { C } from '../canvas/colors';
import { BoxBody, stageBox } from './box';
import { BoxForm } from '../panels/ShapeForms';
import type { StudioKind } from './types';

export const ledge: StudioKind<'ledge'> = {
  Shape: ({ o, cam }) => {
    const { tl, w, h, outline } = stageBox(o, cam);
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
  },
  icon: <path d="M3 20h18v-6l-4-3H7l-4 3z" />,
  Form: ({ o }) => <BoxForm o={o} />,
};
