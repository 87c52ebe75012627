'use client';
// A compact legend over the canvas, so the colours can be read whichever panel is open. A single
// colour bar in the bottom-right corner, short enough to sit in the room the fitted view leaves under
// the enclosure instead of over the design, and a key to the basking marks when they are drawn.
import { fieldHeading } from '@/shared/field-scale';
import type { LegendEntry } from '../fields/legend';
import type { TempUnit } from '@/shared/units';
import type { FieldView } from '../state/session';
import { BASKING_MARKS, type BaskingMarkKind } from '../canvas/colors';

export function CanvasLegend({
  field,
  temp,
  legend,
  marks = [],
}: {
  field: FieldView;
  temp: TempUnit;
  legend: LegendEntry[];
  /** The basking marks drawn on the canvas: named here by colour, as their own labels may not fit. */
  marks?: readonly BaskingMarkKind[];
}) {
  if (legend.length === 0) return null;
  return (
    <div
      className="pointer-events-none absolute right-3 bottom-3 max-w-[calc(100%-1.5rem)] rounded-md border border-basalt-200 bg-white/90 px-2 py-1.5 text-caption text-basalt-800 shadow-sm"
      data-testid="canvas-legend"
      aria-hidden="true"
    >
      <p className="mb-0.5 font-semibold leading-tight">{fieldHeading(field, temp)} — estimates</p>
      <ol className="flex">
        {legend.map((e) => (
          <li key={e.label} className="flex min-w-11 flex-1 flex-col items-stretch tabular-nums">
            <span className="block h-2.5" style={{ background: e.color }} />
            {/* Each band is named by where it starts (a colour bar's ticks), so labels never run together. */}
            <span className="overflow-hidden px-0.5 text-left text-[0.65rem] leading-tight whitespace-nowrap">
              {e.label.split(' – ')[0]}
            </span>
          </li>
        ))}
      </ol>
      {marks.length > 0 && (
        <ul
          className="mt-1 flex flex-wrap gap-x-2.5 gap-y-0.5 text-[0.65rem] leading-tight"
          data-testid="mark-key"
        >
          {marks.map((k) => (
            <li key={k} className="flex items-center gap-1 whitespace-nowrap">
              <span
                className="inline-block h-1 w-3.5 rounded-full"
                style={{ background: BASKING_MARKS[k].colour }}
              />
              {BASKING_MARKS[k].label}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
