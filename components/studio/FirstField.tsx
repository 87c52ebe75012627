'use client';
// The design's field as a picture, sent with the page: what the studio shows while its own code, Konva
// and the engine worker load. Laid out with CSS alone the way the canvas fits a design (the same padding
// and nudge as fitView), so it is in place in the very first paint, before the page's own code runs (only
// its tiny inline script below), and the canvas later draws the same bands at the same spot.
import { useEffect, useRef, useSyncExternalStore } from 'react';
import { bandColors } from '@/shared/colour-ramps';
import { FIELD_RAMP } from '@/shared/field-scale';
import type { StudioPicture } from '@/shared/designs/studio-field';
import { DesignShapes, drawingTop, fieldLook } from '@/components/designs/DesignShapes';
import { FieldBands } from '@/components/designs/FieldBands';
import { C } from './canvas/colors';
import { FIELD_VISIBLE_MARK, markFieldVisible } from './fields/early';
import { designBounds, FIT_PADDING_PX, FIT_SHIFT_DOWN_PX } from './state/actions';

const FIT_PAD = `clamp(28px, 9%, ${FIT_PADDING_PX}px)`;
import type { Design } from './state/types';

const PREFS_KEY = 'baskwell.studio.prefs';
const SCRATCH_KEY = 'baskwell.studio.local.scratch';

const PICTURE_SELECTOR = '[data-testid="studio-first-field"]';

/**
 * The picture's one inline script, after it in the HTML. A classic inline script waits for the stylesheet
 * linked above it and holds the parser meanwhile, so the picture would be parsed only after the
 * stylesheet arrived and miss the first frame; an async module script blocks neither, and runs in the
 * task after the parser reaches it, before the stylesheet (which the first frame waits for) arrives.
 * The picture is sent hidden (`data-pending`) and only this script shows it, once it knows this browser
 * will not show something else (another field chosen here, fields hidden, or a scratch design of its
 * own): a wrong field never flashes, even if the first frame came first. Errors (storage disabled)
 * show the picture as it is.
 *
 * The mark is the moment the picture reached the screen, not when it was drawn: the first frame that
 * holds it is the one whose animation frame follows this script, and when that frame is the page's
 * first contentful paint (the usual case) the mark takes the paint's presentation time, which comes
 * after raster and compositing; when something was painted before (a frame without the picture), the
 * mark is set two frames after the picture's, by then presented.
 */
function pictureScript(field: string, scratch: boolean): string {
  const mark =
    `function mark(t){if(performance.getEntriesByName('${FIELD_VISIBLE_MARK}','mark').length)return;` +
    `try{performance.mark('${FIELD_VISIBLE_MARK}',{startTime:t})}catch(e){performance.mark('${FIELD_VISIBLE_MARK}')}}` +
    `function later(){requestAnimationFrame(function(){requestAnimationFrame(function(){mark(performance.now())})})}`;
  const onFrame =
    `requestAnimationFrame(function(){var drawn=performance.now();try{new PerformanceObserver(function(l){` +
    `l.getEntries().forEach(function(e){if(e.name==='first-contentful-paint'){if(e.startTime>=drawn)mark(e.startTime);else later()}})` +
    `}).observe({type:'paint',buffered:true})}catch(e){later()}})`;
  return (
    `var s=document.querySelector(${JSON.stringify(PICTURE_SELECTOR)});if(s){var stale=false;` +
    `try{var p=JSON.parse(localStorage.getItem(${JSON.stringify(PREFS_KEY)})||'{}');` +
    `stale=p.fieldsVisible===false||!!(p.field&&p.field!==${JSON.stringify(field)})` +
    (scratch ? `||!!localStorage.getItem(${JSON.stringify(SCRATCH_KEY)})` : '') +
    `}catch(e){}` +
    `if(stale)s.setAttribute('data-stale','');else{s.removeAttribute('data-pending');${mark}${onFrame}}}`
  );
}

const noSubscription = () => () => {};

export function FirstFieldPicture({
  design,
  picture,
  inline,
}: {
  design: Design;
  picture: StudioPicture;
  /** In the page's HTML: the response's CSP nonce, and whether this is the scratch studio. */
  inline?: { nonce: string | undefined; scratch: boolean };
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
      // Shown by the inline script below; React drops the attribute once the page has hydrated.
      data-pending={inline && fromHtml ? '' : undefined}
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
      {inline && (
        <script
          nonce={inline.nonce}
          suppressHydrationWarning
          type="module"
          async
          dangerouslySetInnerHTML={{ __html: pictureScript(picture.field, inline.scratch) }}
        />
      )}
    </div>
  );
}
