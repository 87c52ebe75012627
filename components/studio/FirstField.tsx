'use client';
// The design's field as a picture, sent with the page: what the studio shows while its own code, Konva
// and the engine worker load. Laid out with CSS alone the way the canvas fits a design (the same padding
// and nudge as fitView), so it is in place in the very first paint, before any script runs, and the
// canvas later draws the same bands at the same spot.
import { useEffect, useRef } from 'react';
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

/**
 * Runs while the page is parsed, before the picture's first paint: hides it when this browser will show
 * something else (another field chosen here, fields hidden, or a scratch design of its own), so a wrong
 * field never flashes. Errors (storage disabled) leave the picture as it is.
 */
function hideScript(field: string, scratch: boolean): string {
  return (
    `(function(s){try{var p=JSON.parse(localStorage.getItem(${JSON.stringify(PREFS_KEY)})||'{}');` +
    `if(p.fieldsVisible===false||(p.field&&p.field!==${JSON.stringify(field)})` +
    (scratch ? `||localStorage.getItem(${JSON.stringify(SCRATCH_KEY)})` : '') +
    `)s.parentNode.setAttribute('data-stale','')}catch(e){}})(document.currentScript)`
  );
}

/** Runs right after the picture is parsed: the mark is set in the frame that first paints it. */
const MARK_SCRIPT =
  `(function(s){if(!s.parentNode.hasAttribute('data-stale'))requestAnimationFrame(function(){` +
  `if(!performance.getEntriesByName('${FIELD_VISIBLE_MARK}','mark').length)performance.mark('${FIELD_VISIBLE_MARK}')})})(document.currentScript)`;

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
  useEffect(() => {
    // A page reached by a link in the app renders this without running the inline scripts.
    if (wrap.current && !wrap.current.hasAttribute('data-stale')) markFieldVisible();
  }, []);
  const b = designBounds(design);
  const { width: w, height: h } = design.enclosure;
  const stroke = Math.max(w, drawingTop(design)) / 400;
  return (
    <div
      ref={wrap}
      data-testid="studio-first-field"
      data-field={picture.field}
      aria-hidden="true"
      suppressHydrationWarning
      className="pointer-events-none absolute inset-0 bg-basalt-100 data-[stale]:hidden"
      style={{
        // fitPadding in CSS: 9 % of the width between 28 and 72 px (a padding's % is of the box's width).
        padding: `calc(${FIT_PAD} + ${FIT_SHIFT_DOWN_PX}px) ${FIT_PAD} calc(${FIT_PAD} - ${FIT_SHIFT_DOWN_PX}px)`,
      }}
    >
      {inline && (
        <script
          nonce={inline.nonce}
          suppressHydrationWarning
          dangerouslySetInnerHTML={{ __html: hideScript(picture.field, inline.scratch) }}
        />
      )}
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
          dangerouslySetInnerHTML={{ __html: MARK_SCRIPT }}
        />
      )}
    </div>
  );
}
