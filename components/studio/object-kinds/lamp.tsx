// A lamp on the canvas: a tube (a rounded bar with end caps and a core line) or a bulb (a disc under a
// cap, with its beam's edges dashed when it is a spot); its label and the body the label goes around.
import { Circle, Group, Line, Rect } from 'react-konva';
import { BULB_RADIUS_CM, lampExtent, nameWithWatts, TUBE_THICKNESS_CM } from '@/shared/object-kinds/lamp';
import { lampLook } from '@/shared/lamp-look';
import { LAMP_TECHS } from '@/simulation';
import { designToStage, type Camera, type Rect as Rect2 } from '../geometry/camera';
import { calibrationLabel } from '../state/calibration';
import type { LampObject } from '../state/types';
import { C } from '../canvas/colors';
import { LampForm } from '../panels/LampForm';
import type { StudioKind } from './types';

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
    text: `${nameWithWatts(o.name ?? TECH_SHORT[o.tech], watts)}${calibrated ? `\n✓ ${calibrated}` : ''}`,
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

function LampShape({ o, cam }: { o: LampObject; cam: Camera }) {
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

export const lamp: StudioKind<'lamp'> = {
  Shape: LampShape,
  icon: (
    <>
      <rect x="3" y="5" width="18" height="5" rx="2.5" />
      <path d="M7 14l-2 5M12 14v5M17 14l2 5" />
    </>
  ),
  Form: ({ o }) => <LampForm lamp={o} />,
};
