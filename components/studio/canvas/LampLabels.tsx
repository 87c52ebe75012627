'use client';
// Every lamp's label, placed together so that no two collide (geometry/labels.ts). A label pushed away
// from its usual spot above the lamp gets a thin leader line back to its lamp. Each sits on a light tag.
import { memo, useMemo } from 'react';
import { Group, Line, Rect as KonvaRect, Text } from 'react-konva';
import type { Camera, Point, Rect, Viewport } from '../geometry/camera';
import { type LabelPlacement, placeLabels } from '../geometry/labels';
import type { DesignObject, LampObject } from '../state/types';
import { C } from './colors';
import { measureText } from './measure-text';
import { lampBody, lampLabel } from '../object-kinds/lamp';

const FONT_SIZE = 11;
const LINE_HEIGHT = 1.15;

/** A label's size as Konva will draw it. */
const measure = (text: string) => measureText(text, { fontSize: FONT_SIZE, lineHeight: LINE_HEIGHT });

const nearest = (r: Rect, p: Point): Point => ({
  x: Math.max(r.x, Math.min(p.x, r.x + r.width)),
  y: Math.max(r.y, Math.min(p.y, r.y + r.height)),
});
const centre = (r: Rect): Point => ({ x: r.x + r.width / 2, y: r.y + r.height / 2 });

/** A lamp's label as placed: its box, its text, and the lamp it belongs to (stage px). */
export type PlacedLampLabel = LabelPlacement & ReturnType<typeof lampLabel> & { body: Rect };

/**
 * Every lamp's label placed (geometry/labels.ts), once a frame: drawn by LampLabels, and kept clear of by
 * the basking marks' labels (HusbandryLayer).
 */
export function useLampLabels(objects: readonly DesignObject[], cam: Camera, viewport: Viewport) {
  return useMemo((): PlacedLampLabel[] => {
    const lamps = objects.filter((o): o is LampObject => o.type === 'lamp');
    const texts = lamps.map(lampLabel);
    const bodies = lamps.map((l) => lampBody(l, cam));
    const places = placeLabels(
      lamps.map((l, i) => ({ id: l.id, body: bodies[i]!, ...measure(texts[i]!.text) })),
      viewport,
    );
    return places.map((p, i) => ({ ...p, ...texts[i]!, body: bodies[i]! }));
  }, [objects, cam, viewport]);
}

export const LampLabels = memo(function LampLabels({ labels }: { labels: readonly PlacedLampLabel[] }) {
  return (
    <Group listening={false}>
      {labels.map((l) => {
        const from = nearest(l.rect, centre(l.body));
        const to = nearest(l.body, centre(l.rect));
        return (
          <Group key={l.id}>
            {l.moved && Math.hypot(from.x - to.x, from.y - to.y) > 4 && (
              <Line points={[from.x, from.y, to.x, to.y]} stroke={C.basalt500} strokeWidth={1} />
            )}
            {/* A light tag under the text: the label often sits on a lamp's fitting or the field's colours. */}
            <KonvaRect
              x={l.rect.x - 2}
              y={l.rect.y - 1}
              width={l.rect.width + 4}
              height={l.rect.height + 2}
              fill={C.white}
              opacity={0.75}
              cornerRadius={2}
            />
            <Text
              x={l.rect.x}
              y={l.rect.y}
              width={l.rect.width}
              align="center"
              text={l.text}
              fontSize={FONT_SIZE}
              lineHeight={LINE_HEIGHT}
              fill={l.calibrated ? C.moss700 : C.basalt700}
            />
          </Group>
        );
      })}
    </Group>
  );
});
