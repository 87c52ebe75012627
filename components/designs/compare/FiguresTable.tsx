'use client';

import { UnitToggle } from '@/components/ui/UnitToggle';
import { useTempUnit } from '@/components/ui/units';
import { cDeltaToDisplay, cToDisplay, type TempUnit } from '@/shared/units';
import type { KeyFigures } from '@/shared/designs/figures';

type Row = {
  label: string;
  unit: string;
  get: (f: KeyFigures) => number;
  digits: number;
  temperature?: boolean;
};

const ROWS: Row[] = [
  { label: 'Basking UV Index (highest on a surface)', unit: '', get: (f) => f.baskingUviMax, digits: 2 },
  { label: 'Basking UVB (highest on a surface)', unit: 'µW/cm²', get: (f) => f.baskingUvbMax, digits: 1 },
  { label: 'Hot spot (warmest surface)', unit: '°C', get: (f) => f.hotSpotC, digits: 1, temperature: true },
  { label: 'Cool end (coolest floor)', unit: '°C', get: (f) => f.coolEndC, digits: 1, temperature: true },
  { label: 'UV-free area of the cross-section', unit: 'cm²', get: (f) => f.uvFreeAreaCm2, digits: 0 },
  { label: 'UV-free share of the cross-section', unit: '%', get: (f) => f.uvFreeShare, digits: 0 },
];

const fmt = (v: number, digits: number) => Number(v.toFixed(digits)).toLocaleString('en-GB');

/** A row in the temperature unit the person chose (the design itself stays in °C). */
function inUnit(
  r: Row,
  t: TempUnit,
): { unit: string; value: (c: number) => number; delta: (c: number) => number } {
  if (!r.temperature) return { unit: r.unit, value: (v) => v, delta: (v) => v };
  return { unit: `°${t}`, value: (c) => cToDisplay(c, t), delta: (c) => cDeltaToDisplay(c, t) };
}

/** Key figures of both variants and B − A, all estimates. */
export function FiguresTable({ a, b }: { a: KeyFigures | null; b: KeyFigures | null }) {
  const [tempUnit] = useTempUnit();
  return (
    <section aria-labelledby="figures-heading" className="space-y-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="figures-heading" className="text-lead font-semibold text-basalt-900">
          Key figures (estimates)
        </h2>
        <UnitToggle quantity="temperature" />
      </div>
      <table className="w-full text-left text-body">
        <thead className="text-caption uppercase tracking-wide text-basalt-500">
          <tr>
            <th className="py-1 pr-3 font-medium">Figure</th>
            <th className="py-1 pr-3 text-right font-medium">A</th>
            <th className="py-1 pr-3 text-right font-medium">B</th>
            <th className="py-1 text-right font-medium">B − A</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-basalt-100">
          {ROWS.map((r) => {
            const u = inUnit(r, tempUnit);
            const va = a ? u.value(r.get(a)) : null;
            const vb = b ? u.value(r.get(b)) : null;
            const d = a && b ? u.delta(r.get(b) - r.get(a)) : null;
            const unit = u.unit ? ` ${u.unit}` : '';
            return (
              <tr key={r.label}>
                <td className="py-1.5 pr-3">{r.label}</td>
                <td className="py-1.5 pr-3 text-right tabular-nums">
                  {va === null ? '—' : `${fmt(va, r.digits)}${unit}`}
                </td>
                <td className="py-1.5 pr-3 text-right tabular-nums">
                  {vb === null ? '—' : `${fmt(vb, r.digits)}${unit}`}
                </td>
                <td className="py-1.5 text-right tabular-nums text-basalt-700">
                  {d === null
                    ? '—'
                    : `${d > 0 ? '+' : d < 0 ? '−' : '±'}${fmt(Math.abs(d), r.digits)}${unit}`}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </section>
  );
}
