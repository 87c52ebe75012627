'use client';
// Everything drawn over the objects: selection, handles, snap guides, marquee, ruler,
// pinned probes with their readings, and a finding's location.
import { useMemo } from 'react';
import { Circle, Group, Label, Line, Rect, Tag, Text } from 'react-konva';
import {
  designToStage,
  type Camera,
  type Point,
  type Rect as DRect,
  type Viewport,
} from '../geometry/camera';
import { objectBounds, objectHandles } from '../geometry/objects';
import type { Guide } from '../geometry/snap';
import { formatNumber, formatTemp, rulerText, type LengthUnit, type TempUnit } from '@/shared/units';
import type { Reading } from '../fields/sample';
import type { Design, DesignObject, ProbePoint } from '../state/types';
import { C, HIGHLIGHT, SELECT } from './colors';
import { measureText } from './measure-text';

export interface HighlightShape {
  segments: { x1: number; y1: number; x2: number; y2: number }[];
  objectIds: string[];
}

function boundsToStage(cam: Camera, r: DRect) {
  const tl = designToStage(cam, { x: r.x, y: r.y + r.height });
  return { x: tl.x, y: tl.y, width: r.width * cam.zoom, height: r.height * cam.zoom };
}

/** An object's bounds on the stage, `pad` px larger on every side: a frame drawn around it. */
function outlineOf(cam: Camera, o: DesignObject, pad: number) {
  const b = boundsToStage(cam, objectBounds(o));
  return { x: b.x - pad, y: b.y - pad, width: b.width + 2 * pad, height: b.height + 2 * pad };
}

export function SelectionLayer({
  cam,
  objects,
  showHandles,
}: {
  cam: Camera;
  objects: DesignObject[];
  showHandles: boolean;
}) {
  return (
    <Group listening={false}>
      {objects.map((o) => (
        <Rect key={o.id} {...outlineOf(cam, o, 3)} stroke={SELECT} strokeWidth={1.5} dash={[5, 3]} />
      ))}
      {showHandles &&
        objects.length === 1 &&
        objectHandles(objects[0]!).map((h) => {
          const s = designToStage(cam, h);
          if (h.id === 'rotate') {
            const o = objects[0]!;
            const mid = 'x1' in o ? designToStage(cam, { x: (o.x1 + o.x2) / 2, y: (o.y1 + o.y2) / 2 }) : s;
            return (
              <Group key={h.id}>
                <Line points={[mid.x, mid.y, s.x, s.y]} stroke={SELECT} strokeWidth={1} />
                <Circle x={s.x} y={s.y} radius={5.5} fill={C.white} stroke={SELECT} strokeWidth={1.5} />
              </Group>
            );
          }
          return (
            <Rect
              key={h.id}
              x={s.x - 4.5}
              y={s.y - 4.5}
              width={9}
              height={9}
              fill={C.white}
              stroke={SELECT}
              strokeWidth={1.5}
            />
          );
        })}
    </Group>
  );
}

export function GuidesLayer({ cam, guides, viewport }: { cam: Camera; guides: Guide[]; viewport: Viewport }) {
  return (
    <Group listening={false}>
      {guides.map((g, i) => {
        const s = designToStage(cam, { x: g.at, y: g.at });
        const pts = g.axis === 'x' ? [s.x, 0, s.x, viewport.height] : [0, s.y, viewport.width, s.y];
        return (
          <Group key={i}>
            <Line points={pts} stroke={C.ember500} strokeWidth={1} dash={[6, 4]} />
            <Text
              x={g.axis === 'x' ? s.x + 4 : viewport.width - 160}
              y={g.axis === 'x' ? 28 : s.y - 14}
              text={`snap: ${g.label}`}
              fontSize={10}
              fill={C.ember700}
            />
          </Group>
        );
      })}
    </Group>
  );
}

export function MarqueeLayer({ cam, rect }: { cam: Camera; rect: DRect | null }) {
  if (!rect) return null;
  const b = boundsToStage(cam, rect);
  return (
    <Rect
      listening={false}
      {...b}
      fill={SELECT}
      opacity={0.08}
      stroke={SELECT}
      strokeWidth={1}
      dash={[4, 3]}
    />
  );
}

/** How a readout's text is set (measured with the same style, to keep it inside the view). */
const TIP_STYLE = { fontSize: 11, padding: 5, lineHeight: 1.3 } as const;

function Tip({ x, y, text, tone = 'dark' }: { x: number; y: number; text: string; tone?: 'dark' | 'light' }) {
  return (
    <Label x={x} y={y} listening={false}>
      <Tag
        fill={tone === 'dark' ? C.ink : C.white}
        opacity={0.9}
        cornerRadius={4}
        stroke={tone === 'dark' ? undefined : C.basalt300}
      />
      <Text text={text} {...TIP_STYLE} fill={tone === 'dark' ? C.white : C.ink} />
    </Label>
  );
}

export function RulerLayer({
  cam,
  ruler,
  unit,
}: {
  cam: Camera;
  ruler: { a: Point; b: Point } | null;
  unit: LengthUnit;
}) {
  if (!ruler) return null;
  const a = designToStage(cam, ruler.a);
  const b = designToStage(cam, ruler.b);
  return (
    <Group listening={false}>
      <Line points={[a.x, a.y, b.x, b.y]} stroke={C.ink} strokeWidth={1.5} />
      <Circle x={a.x} y={a.y} radius={3} fill={C.ink} />
      <Circle x={b.x} y={b.y} radius={3} fill={C.ink} />
      <Tip x={(a.x + b.x) / 2 + 8} y={(a.y + b.y) / 2 + 8} text={rulerText(ruler, unit)} />
    </Group>
  );
}

export function readingText(r: Reading, temp: TempUnit): string {
  return `UVI ${formatNumber(r.uvi, 2)} · UVB ${formatNumber(r.uvb, 0)} µW/cm² · ${formatTemp(r.tempC, temp)}`;
}

/** A probe's pin and readout as drawn (stage px): the readout is kept clear of by the marks' labels. */
export interface PlacedProbeTip {
  id: string;
  pin: Point;
  text: string;
  rect: DRect;
}

/**
 * Every probe's readout placed, once a frame: to the right of its pin, or to the left near the view's
 * right edge. Drawn by ProbePins, and kept clear of by the basking marks' labels (HusbandryLayer).
 */
export function useProbeTips(
  cam: Camera,
  probes: readonly ProbePoint[],
  readings: Map<string, Reading>,
  temp: TempUnit,
  viewport: Viewport,
): PlacedProbeTip[] {
  return useMemo(
    () =>
      probes.map((p, i) => {
        const pin = designToStage(cam, p);
        const r = readings.get(p.id);
        const text = `${p.label ?? `Probe ${i + 1}`}${r ? `\n${readingText(r, temp)}` : '\ncomputing…'}`;
        const size = measureText(text, TIP_STYLE);
        const x = pin.x + 10 + size.width > viewport.width ? pin.x - 10 - size.width : pin.x + 10;
        return { id: p.id, pin, text, rect: { x, y: pin.y - 24, ...size } };
      }),
    [cam, probes, readings, temp, viewport],
  );
}

export function ProbePins({ tips, selection }: { tips: readonly PlacedProbeTip[]; selection: string[] }) {
  return (
    <Group listening={false}>
      {tips.map((t) => {
        const selected = selection.includes(t.id);
        return (
          <Group key={t.id}>
            <Rect
              x={t.pin.x}
              y={t.pin.y - 6}
              width={8.5}
              height={8.5}
              rotation={45}
              fill={selected ? SELECT : C.white}
              stroke={C.ink}
              strokeWidth={1.5}
            />
            <Tip x={t.rect.x} y={t.rect.y} tone="light" text={t.text} />
          </Group>
        );
      })}
    </Group>
  );
}

export function PointerReadout({
  at,
  reading,
  temp,
  viewport,
}: {
  at: Point;
  reading: Reading | null;
  temp: TempUnit;
  viewport: Viewport;
}) {
  if (!reading) return null;
  const text = `Estimate at pointer\n${readingText(reading, temp)}`;
  const w = measureText(text, TIP_STYLE).width;
  const x = at.x + 14 + w > viewport.width ? at.x - 14 - w : at.x + 14;
  const y = Math.max(at.y - 44, 26);
  return <Tip x={x} y={y} text={text} />;
}

export function HighlightLayer({
  cam,
  design,
  shape,
}: {
  cam: Camera;
  design: Design;
  shape: HighlightShape | null;
}) {
  if (!shape) return null;
  return (
    <Group listening={false}>
      {shape.segments.map((sg, i) => {
        const a = designToStage(cam, { x: sg.x1, y: sg.y1 });
        const b = designToStage(cam, { x: sg.x2, y: sg.y2 });
        return (
          <Group key={`s${i}`}>
            <Line
              points={[a.x, a.y, b.x, b.y]}
              stroke={HIGHLIGHT}
              strokeWidth={12}
              opacity={0.45}
              lineCap="round"
            />
            <Line
              points={[a.x, a.y, b.x, b.y]}
              stroke={C.ink}
              strokeWidth={2}
              dash={[6, 4]}
              lineCap="round"
            />
          </Group>
        );
      })}
      {shape.objectIds.map((id) => {
        const o = design.objects.find((x) => x.id === id);
        if (!o) return null;
        return (
          <Rect
            key={id}
            {...outlineOf(cam, o, 6)}
            stroke={HIGHLIGHT}
            strokeWidth={4}
            cornerRadius={6}
            opacity={0.9}
          />
        );
      })}
    </Group>
  );
}
