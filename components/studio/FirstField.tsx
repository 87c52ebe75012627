'use client';
// The design's field as a picture, sent with the page: what the studio shows while its own code, Konva
// and the engine worker load. Laid out with CSS alone the way the canvas fits a design (the same padding
// and nudge as fitView), so it is in place in the very first paint, before the page's own code runs (only
// the inline script in the page's <head>, first-field-script.ts), and the canvas later draws the same
// bands at the same spot.
import { useEffect, useRef, useSyncExternalStore } from 'react';
import { bandColors } from '@/shared/colour-ramps';
import { FIELD_RAMP } from '@/shared/field-scale';
import type { StudioPicture } from '@/shared/designs/studio-field';
import { DesignShapes, drawingTop, fieldLook } from '@/components/designs/DesignShapes';
import { FieldBands } from '@/components/designs/FieldBands';
import { C } from './canvas/colors';
import { markFieldVisible } from './fields/early';
import { FIRST_FIELD_END_ATTR, FIRST_FIELD_END_ID } from './first-field-script';
import { designBounds, FIT_PADDING_PX, FIT_SHIFT_DOWN_PX } from './state/actions';

const FIT_PAD = `clamp(28px, 9%, ${FIT_PADDING_PX}px)`;
import type { Design } from './state/types';

const noSubscription = () => () => {};

export function FirstFieldPicture({
  design,
  picture,
  inline,
}: {
  design: Design;
  picture: StudioPicture;
  /** In the page's HTML (shown by the <head>'s script), and whether this is the scratch studio. */
  inline?: { scratch: boolean };
}) {
  const wrap = useRef<HTMLDivElement>(null);
  // True while this renders on the server and hydrates what it sent; false once hydrated and when it is
  // first rendered on the client (a page reached by a link in the app, whose inline script never runs).
  const fromHtml = useSyncExternalStore(
    noSubscription,
    () => false,
    () => true,
  );
  useEffect(() => {
    // A page reached by a link in the app renders this without running the inline script; one that
    // hydrates the HTML leaves the mark to that script (set when the picture was presented).
    if (!fromHtml && wrap.current && !wrap.current.hasAttribute('data-stale')) markFieldVisible();
    // The first render's value only: whether this was in the page's HTML.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
  const b = designBounds(design);
  const { width: w, height: h } = design.enclosure;
  const stroke = Math.max(w, drawingTop(design)) / 400;
  return (
    <div
      ref={wrap}
      data-testid="studio-first-field"
      data-field={picture.field}
      // Shown by the <head>'s inline script; React drops the attribute once the page has hydrated.
      data-pending={inline && fromHtml ? '' : undefined}
      data-scratch={inline?.scratch ? '' : undefined}
      aria-hidden="true"
      suppressHydrationWarning
      className="pointer-events-none absolute inset-0 bg-basalt-100 data-[pending]:invisible data-[stale]:hidden"
      style={{
        // fitPadding in CSS: 9 % of the width between 28 and 72 px (a padding's % is of the box's width).
        padding: `calc(${FIT_PAD} + ${FIT_SHIFT_DOWN_PX}px) ${FIT_PAD} calc(${FIT_PAD} - ${FIT_SHIFT_DOWN_PX}px)`,
      }}
    >
      <svg
        viewBox={`${b.x} ${-(b.y + b.height)} ${b.width} ${b.height}`}
        preserveAspectRatio="xMidYMid meet"
        className="h-full w-full overflow-visible"
      >
        <g transform="scale(1,-1)">
          <rect x={0} y={0} width={w} height={h} fill={C.paper} opacity={0.9} />
          <g opacity={picture.opacity}>
            <FieldBands
              bands={picture.bands}
              thresholds={picture.thresholds}
              colors={bandColors(FIELD_RAMP[picture.field], picture.thresholds.length)}
              strokeWidth={0.75}
              scalingStroke={false}
            />
          </g>
          <DesignShapes objects={design.objects} look={fieldLook(stroke)} />
          <rect
            x={0}
            y={0}
            width={w}
            height={h}
            fill="none"
            stroke={C.basalt700}
            strokeWidth={2}
            vectorEffect="non-scaling-stroke"
          />
        </g>
      </svg>
      {/* Parsed last: the <head>'s script shows the picture only once all of it is in the page. */}
      {inline && <span id={FIRST_FIELD_END_ID} {...{ [FIRST_FIELD_END_ATTR]: '' }} hidden />}
      {/* React puts this in the <head>: no frame is painted before the element above is parsed. */}
      {inline && <link rel="expect" href={`#${FIRST_FIELD_END_ID}`} blocking="render" />}
    </div>
  );
}
