'use client';

import { Table, type TableColumn } from '@/components/ui/Table';
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

const cell = 'py-1.5 pr-3 text-right tabular-nums';
const head = 'py-1 pr-3 text-right font-medium';

/** The figure's value in one variant, with its unit; a dash where that variant has no figures yet. */
function valueColumn(id: 'a' | 'b', figures: KeyFigures | null, t: TempUnit): TableColumn<Row> {
  return {
    id,
    header: id.toUpperCase(),
    headerClassName: head,
    className: cell,
    cell: ({ row: { original: r } }) => {
      if (!figures) return '—';
      const u = inUnit(r, t);
      return `${fmt(u.value(r.get(figures)), r.digits)}${u.unit ? ` ${u.unit}` : ''}`;
    },
  };
}

/** Key figures of both variants and B − A, all estimates. */
export function FiguresTable({ a, b }: { a: KeyFigures | null; b: KeyFigures | null }) {
  const [tempUnit] = useTempUnit();
  const columns: TableColumn<Row>[] = [
    {
      id: 'figure',
      header: 'Figure',
      headerClassName: 'py-1 pr-3 font-medium',
      className: 'py-1.5 pr-3 text-left font-normal',
      rowHeader: true,
      cell: ({ row }) => row.original.label,
    },
    valueColumn('a', a, tempUnit),
    valueColumn('b', b, tempUnit),
    {
      id: 'difference',
      header: 'B − A',
      headerClassName: 'py-1 text-right font-medium',
      className: 'py-1.5 text-right tabular-nums text-basalt-700',
      cell: ({ row: { original: r } }) => {
        if (!a || !b) return '—';
        const u = inUnit(r, tempUnit);
        const d = u.delta(r.get(b) - r.get(a));
        const sign = d > 0 ? '+' : d < 0 ? '−' : '±';
        return `${sign}${fmt(Math.abs(d), r.digits)}${u.unit ? ` ${u.unit}` : ''}`;
      },
    },
  ];
  return (
    <section aria-labelledby="figures-heading" className="space-y-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="figures-heading" className="text-lead font-semibold text-basalt-900">
          Key figures (estimates)
        </h2>
        <UnitToggle quantity="temperature" />
      </div>
      <Table
        data={ROWS}
        columns={columns}
        caption="Key figures of A and B, and B − A"
        rowKey={(r) => r.label}
        inline
      />
    </section>
  );
}
