'use client';
// Husbandry marks on the canvas: where the species' basking UV range is met, where its basking
// temperature is met, and where both are (the shared basking spot); and, for a climbing species, every
// mesh it can hang from. The split between a UV spot and a hot spot is then visible at a glance.
import { Group, Line, Text } from 'react-konva';
import { designToStage, type Camera } from '../geometry/camera';
import type { Design } from '../state/types';
import type { Finding, Segment } from '../fields/engineTypes';
import { C } from './colors';

const MARKS = {
  uv: { colour: C.sky600, lift: 7, label: 'UV range' },
  heat: { colour: C.ember500, lift: 13, label: 'Basking heat' },
  both: { colour: C.moss600, lift: 19, label: 'UV + heat' },
} as const;

function Run({
  cam,
  seg,
  kind,
  labelled,
}: {
  cam: Camera;
  seg: Segment;
  kind: keyof typeof MARKS;
  labelled: boolean;
}) {
  const m = MARKS[kind];
  const a = designToStage(cam, { x: seg.x1, y: seg.y1 });
  const b = designToStage(cam, { x: seg.x2, y: seg.y2 });
  return (
    <Group>
      <Line
        points={[a.x, a.y - m.lift, b.x, b.y - m.lift]}
        stroke={m.colour}
        strokeWidth={kind === 'both' ? 5 : 3}
        lineCap="round"
        opacity={0.9}
      />
      {labelled && (
        <Text
          x={Math.min(a.x, b.x)}
          y={Math.min(a.y, b.y) - m.lift - 14}
          text={m.label}
          fontSize={11}
          fontStyle="bold"
          fill={m.colour}
        />
      )}
    </Group>
  );
}

export function HusbandryLayer({
  cam,
  design,
  basking,
  climbs,
}: {
  cam: Camera;
  design: Design;
  basking: Finding | undefined;
  climbs: boolean;
}) {
  const zones = basking?.basking;
  const screens = climbs ? design.objects.filter((o) => o.type === 'screen') : [];
  return (
    <Group listening={false}>
      {zones &&
        (['uv', 'heat', 'both'] as const).map((kind) =>
          zones[kind].map((seg, i) => (
            <Run key={`${kind}${i}`} cam={cam} seg={seg} kind={kind} labelled={i === 0} />
          )),
        )}
      {screens.map((o) => {
        if (o.type !== 'screen') return null;
        const a = designToStage(cam, { x: o.x1, y: o.y1 });
        const b = designToStage(cam, { x: o.x2, y: o.y2 });
        return (
          <Group key={o.id}>
            <Line
              points={[a.x, a.y, b.x, b.y]}
              stroke={C.ember700}
              strokeWidth={4}
              dash={[3, 5]}
              opacity={0.9}
            />
            <Text
              x={(a.x + b.x) / 2 - 70}
              y={(a.y + b.y) / 2 + 6}
              width={140}
              align="center"
              text="Climbable mesh"
              fontSize={11}
              fontStyle="bold"
              fill={C.ember700}
            />
          </Group>
        );
      })}
    </Group>
  );
}
