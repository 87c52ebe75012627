'use client';
// While the photo is being adjusted: its outline and the four corner handles (overlay layer).
import { Group, Rect } from 'react-konva';
import { BACKDROP_CORNERS, backdropCornerPoint, backdropStageRect } from '../geometry/backdrop';
import { designToStage, type Camera } from '../geometry/camera';
import type { Backdrop } from '../state/types';
import { C, HIGHLIGHT } from './colors';

export function BackdropFrame({ cam, backdrop }: { cam: Camera; backdrop: Backdrop }) {
  const r = backdropStageRect(cam, backdrop);
  return (
    <Group listening={false}>
      <Rect x={r.x} y={r.y} width={r.width} height={r.height} stroke={C.ink} strokeWidth={1.5} />
      <Rect
        x={r.x}
        y={r.y}
        width={r.width}
        height={r.height}
        stroke={HIGHLIGHT}
        strokeWidth={1.5}
        dash={[6, 4]}
      />
      {BACKDROP_CORNERS.map((c) => {
        const s = designToStage(cam, backdropCornerPoint(backdrop, c));
        return (
          <Rect
            key={c}
            x={s.x - 5.5}
            y={s.y - 5.5}
            width={11}
            height={11}
            fill={C.white}
            stroke={C.ink}
            strokeWidth={1.5}
          />
        );
      })}
    </Group>
  );
}
