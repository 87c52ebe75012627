'use client';

import { Table, type TableColumn } from '@/components/ui/Table';
import { chartMonths, pct, type PopulationView } from './PopulationChart';

/** The rows of the table beside the chart: every three months up to the chart's end. */
export function tableRows(view: PopulationView) {
  const end = chartMonths(view);
  const at = (list: { months: number; share: number }[], m: number) => {
    // The sampled curves are on even grids that include these months; interpolate to be safe.
    const i = list.findIndex((c) => c.months >= m);
    if (i <= 0) return list[0];
    const a = list[i - 1]!;
    const b = list[i]!;
    const k = (m - a.months) / (b.months - a.months);
    return { ...b, months: m, share: a.share + (b.share - a.share) * k };
  };
  const rows = [];
  for (let m = 0; m <= end; m += end > 24 ? 6 : 3) {
    const c = view.ok ? (at(view.curve, m) as (typeof view.curve)[number] | undefined) : undefined;
    rows.push({
      months: m,
      measured: c ? c.share : null,
      lo: c && 'lo' in c ? c.lo : null,
      hi: c && 'hi' in c ? c.hi : null,
      catalogue: at(view.catalogue, m)?.share ?? null,
    });
  }
  return rows;
}

type TableRow = ReturnType<typeof tableRows>[number];

const shareOrDash = (v: number | null) => (v === null ? '—' : pct(v));
const cell = 'py-1 pr-2';
const head = `${cell} font-medium`;

const COLUMNS: TableColumn<TableRow>[] = [
  {
    id: 'months',
    header: 'Months',
    cell: ({ row }) => row.original.months,
    rowHeader: true,
    className: `${cell} font-normal`,
    headerClassName: head,
  },
  {
    id: 'measured',
    header: 'Measured',
    cell: ({ row }) => shareOrDash(row.original.measured),
    className: cell,
    headerClassName: head,
  },
  {
    id: 'band',
    header: '95 % band',
    cell: ({ row }) => {
      const { lo, hi } = row.original;
      return lo === null || hi === null ? '—' : `${pct(lo)}–${pct(hi)}`;
    },
    className: cell,
    headerClassName: head,
  },
  {
    id: 'catalogue',
    header: 'Catalogue',
    cell: ({ row }) => shareOrDash(row.original.catalogue),
    className: 'py-1',
    headerClassName: 'py-1 font-medium',
  },
];

/** The chart's figures as a table (a client component: its columns' cells are functions). */
export function PopulationTable({ view }: { view: PopulationView }) {
  return (
    <Table
      data={tableRows(view)}
      columns={COLUMNS}
      caption="Share of a new lamp’s output (catalogue figure, bare, 30 cm) by months of use"
      showCaption
      rowKey={(r) => r.months}
      head="plain"
      inline
      testId="population-table"
    />
  );
}
