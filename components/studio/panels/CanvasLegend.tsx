'use client';
// A compact legend over the canvas, so the colours can be read whichever panel is open.
import { FIELD_TITLE, fieldUnit, type LegendEntry } from '../fields/legend';
import type { TempUnit } from '../geometry/units';
import type { FieldView } from '../state/session';

export function CanvasLegend({
  field,
  temp,
  legend,
}: {
  field: FieldView;
  temp: TempUnit;
  legend: LegendEntry[];
}) {
  if (legend.length === 0) return null;
  const unit = fieldUnit(field, temp);
  return (
    <div
      className="pointer-events-none absolute right-3 bottom-3 rounded-md border border-basalt-200 bg-white/90 px-2.5 py-2 text-caption text-basalt-800 shadow-sm"
      data-testid="canvas-legend"
    >
      <p className="mb-1 font-semibold">
        {FIELD_TITLE[field]} ({unit}) — estimates
      </p>
      <ol className="flex flex-col-reverse gap-px">
        {legend.map((e) => (
          <li key={e.label} className="flex items-center gap-1.5 tabular-nums">
            <span
              className="inline-block h-3 w-5 rounded-sm"
              style={{ background: e.color }}
              aria-hidden="true"
            />
            {e.label}
          </li>
        ))}
      </ol>
    </div>
  );
}
