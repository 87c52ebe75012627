'use client';
// Husbandry marks on the canvas: where the species' basking UV range is met, where its basking
// temperature is met, and where both are (the shared basking spot); and, for a climbing species, every
// mesh it can hang from. The split between a UV spot and a hot spot is then visible at a glance.
import { Group, Label, Line, Tag, Text } from 'react-konva';
import { designToStage, type Camera, type Rect, type Viewport } from '../geometry/camera';
import type { Design } from '../state/types';
import type { Finding, Segment } from '../fields/engineTypes';
import { BASKING_MARKS, C } from './colors';
import { measureText } from './measure-text';
import { meshLabel, stackMarkLabels } from '../geometry/husbandry';
import type { LengthUnit } from '@/shared/units';
import type { MeshRisk } from '@/simulation';

const MARKS = BASKING_MARKS;

const LABEL_STYLE = { fontSize: 11, fontStyle: 'bold', padding: 2 } as const;

function Run({ cam, seg, kind }: { cam: Camera; seg: Segment; kind: keyof typeof MARKS }) {
  const m = MARKS[kind];
  const a = designToStage(cam, { x: seg.x1, y: seg.y1 });
  const b = designToStage(cam, { x: seg.x2, y: seg.y2 });
  return (
    <Line
      points={[a.x, a.y - m.lift, b.x, b.y - m.lift]}
      stroke={m.colour}
      strokeWidth={kind === 'both' ? 5 : 3}
      lineCap="round"
      opacity={0.9}
    />
  );
}

/**
 * One label for each kind of mark, at the start of its first run, stacked so that none covers another
 * (the three marks lie a few pixels apart over the same surface), a lamp's label or a probe's readout,
 * each on a light tag so it reads over the field's colours.
 */
function RunLabels({
  cam,
  zones,
  avoid,
  viewport,
}: {
  cam: Camera;
  zones: NonNullable<Finding['basking']>;
  avoid: readonly { rect: Rect }[];
  viewport: Viewport;
}) {
  const kinds = (['uv', 'heat', 'both'] as const).filter((k) => zones[k].length > 0);
  // The canvas legend (CanvasLegend) keys the same kinds, in the same order.
  const boxes = kinds.map((kind) => {
    const seg = zones[kind][0]!;
    const a = designToStage(cam, { x: seg.x1, y: seg.y1 });
    const b = designToStage(cam, { x: seg.x2, y: seg.y2 });
    const size = measureText(MARKS[kind].label, LABEL_STYLE);
    const y = Math.min(a.y, b.y) - MARKS[kind].lift - size.height - 2;
    const [left, right] = a.x <= b.x ? [a, b] : [b, a];
    // Level with the mark's own line, just past either end of its run.
    const besideY = (p: { y: number }) => p.y - MARKS[kind].lift - size.height / 2;
    const beside = [
      { x: right.x + 4, y: besideY(right) },
      { x: left.x - size.width - 4, y: besideY(left) },
    ];
    return { x: left.x, y, belowY: Math.max(a.y, b.y) + 4, beside, ...size };
  });
  const at = stackMarkLabels(
    boxes,
    avoid.map((l) => l.rect),
    viewport,
  );
  return (
    <>
      {kinds.map((kind, i) => {
        const p = at[i];
        return p ? (
          <Label key={kind} x={p.x} y={p.y}>
            <Tag fill={C.white} opacity={0.8} cornerRadius={2} />
            <Text text={MARKS[kind].label} {...LABEL_STYLE} fill={MARKS[kind].colour} />
          </Label>
        ) : null;
      })}
    </>
  );
}

/** A dashed link between the UV spot and the hot spot when they do not meet, in stage coordinates. */
function splitLink(cam: Camera, uv: Segment[], heat: Segment[]) {
  const centre = (segs: Segment[]) => {
    const s = segs.reduce((best, x) =>
      Math.hypot(x.x2 - x.x1, x.y2 - x.y1) > Math.hypot(best.x2 - best.x1, best.y2 - best.y1) ? x : best,
    );
    return designToStage(cam, { x: (s.x1 + s.x2) / 2, y: (s.y1 + s.y2) / 2 });
  };
  if (uv.length === 0 || heat.length === 0) return null;
  const a = centre(uv);
  const b = centre(heat);
  const lift = MARKS.heat.lift + 18;
  return {
    points: [a.x, a.y - lift, b.x, b.y - lift],
    mid: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 - lift },
  };
}

export function HusbandryLayer({
  cam,
  design,
  basking,
  meshRisks,
  unit,
  avoid,
  viewport,
}: {
  cam: Camera;
  design: Design;
  basking: Finding | undefined;
  /** The lamps' labels and the probes' readouts as placed: the marks' labels keep clear of them. */
  avoid: readonly { rect: Rect }[];
  viewport: Viewport;
  /** For a climbing species: each mesh it can hang from and the lamps near it; null otherwise. */
  meshRisks: MeshRisk[] | null;
  unit: LengthUnit;
}) {
  const zones = basking?.basking;
  const screens = meshRisks ? design.objects.filter((o) => o.type === 'screen') : [];
  const apart = zones && zones.both.length === 0 ? splitLink(cam, zones.uv, zones.heat) : null;
  return (
    <Group listening={false}>
      {zones &&
        (['uv', 'heat', 'both'] as const).map((kind) =>
          zones[kind].map((seg, i) => <Run key={`${kind}${i}`} cam={cam} seg={seg} kind={kind} />),
        )}
      {zones && <RunLabels cam={cam} zones={zones} avoid={avoid} viewport={viewport} />}
      {apart && (
        <Group>
          <Line points={apart.points} stroke={C.ember700} strokeWidth={2} dash={[8, 6]} />
          <Label x={apart.mid.x} y={apart.mid.y - 12}>
            <Tag
              fill={C.white}
              opacity={0.9}
              cornerRadius={3}
              pointerDirection="down"
              pointerWidth={8}
              pointerHeight={5}
            />
            <Text
              text="UV and heat apart: no spot gets both"
              fontSize={12}
              fontStyle="bold"
              fill={C.ember700}
              padding={4}
            />
          </Label>
        </Group>
      )}
      {screens.map((o) => {
        if (o.type !== 'screen') return null;
        const a = designToStage(cam, { x: o.x1, y: o.y1 });
        const b = designToStage(cam, { x: o.x2, y: o.y2 });
        const risk = meshRisks?.find((r) => r.screenId === o.id);
        const risky = Boolean(risk && (risk.burn.length || risk.uv.length));
        return (
          <Group key={o.id}>
            <Line
              points={[a.x, a.y, b.x, b.y]}
              stroke={C.ember700}
              strokeWidth={4}
              dash={[3, 5]}
              opacity={0.9}
            />
            <Label x={(a.x + b.x) / 2} y={(a.y + b.y) / 2 + 6}>
              <Tag
                fill={risky ? C.ember700 : C.white}
                opacity={risky ? 0.95 : 0.85}
                cornerRadius={3}
                pointerDirection="up"
                pointerWidth={8}
                pointerHeight={4}
              />
              <Text
                text={risk ? meshLabel(risk, unit) : 'Climbable mesh'}
                fontSize={11}
                fontStyle="bold"
                fill={risky ? C.white : C.ember700}
                padding={3}
              />
            </Label>
          </Group>
        );
      })}
    </Group>
  );
}
