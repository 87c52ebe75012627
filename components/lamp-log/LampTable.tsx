'use client';

import Link from '@/components/ui/Link';
import { LocalTime } from '@/components/ui/LocalTime';
import { link } from '@/components/ui/styles';
import { formatLengthRounded, type LengthUnit } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import type { LampRow } from '@/lib/lamp-log/queries';
import { STATUS_RANK } from '@/lib/lamp-log/status';
import { formatAge, formatDay, formatValue, readableDays } from './format';
import { StatusBadge } from './StatusBadge';
import { Table, type TableColumn } from '@/components/ui/Table';
import type { LampSortColumn } from '@/lib/lamp-log/list-view';

type Row = LampRow;

export function LampCell({ l }: { l: Row }) {
  return (
    <>
      <Link href={`/lamp-log/${l.id}`} className={link}>
        {l.label}
      </Link>
      <div className="cell-note">{l.lampType.name}</div>
    </>
  );
}

export function EnclosureCell({ l }: { l: Row }) {
  return (
    <>
      <Link href={`/enclosures/${l.enclosure.id}/lamps`} className={link}>
        {l.enclosure.name}
      </Link>
      {l.enclosure.speciesName && <div className="cell-note">{l.enclosure.speciesName}</div>}
    </>
  );
}

export function AgeCell({ l }: { l: Row }) {
  return (
    <>
      {formatAge(l.ageDays)}
      <div className="cell-note">{l.hoursPerDay} h a day</div>
    </>
  );
}

export function LastReadingCell({ l, unit }: { l: Row; unit: LengthUnit }) {
  return l.lastReading ? (
    <>
      {formatValue(l.lastReading.value, l.lastReading.unit)}
      <div className="cell-note">
        at {formatLengthRounded(l.lastReading.distanceCm, unit)},{' '}
        <LocalTime value={l.lastReading.takenAt} shown="day" />
      </div>
    </>
  ) : (
    <span className="text-basalt-500">None yet</span>
  );
}

export function RemainingCell({ l }: { l: Row }) {
  return (
    <>
      {l.status === 'heat-only' ? '—' : `${Math.round(l.remainingFraction * 100)} %`}
      <div className="cell-note">
        {l.fit.kind === 'none' ? 'usual curve' : l.fit.certainty === 'fitted' ? 'fitted' : 'uncertain'}
      </div>
    </>
  );
}

export function FallsBelowCell({ l }: { l: Row }) {
  return l.fallsBelowOn ? (
    <>
      <span className="tabular-nums">{formatDay(l.fallsBelowOn)}</span>
      {l.fallsBelowEarliestOn && l.fallsBelowEarliestOn < l.fallsBelowOn && (
        <div className="cell-note">as early as {formatDay(l.fallsBelowEarliestOn)}</div>
      )}
    </>
  ) : l.judged ? (
    <span className="text-basalt-500">Not within 5 years</span>
  ) : l.missing.length > 0 && l.status !== 'retired' && l.status !== 'heat-only' ? (
    <span className="cell-note">Needs {l.missing.join('; ')}</span>
  ) : (
    <span className="text-basalt-500">—</span>
  );
}

export function StatusCell({ l }: { l: Row }) {
  return (
    <>
      <StatusBadge status={l.status} label={l.statusLabel} />
      <div className="cell-note mt-1 max-w-56">{l.reason && readableDays(l.reason)}</div>
    </>
  );
}

/** The lamp tables' cell classes (app/globals.css): one short class each, as every row repeats them. */
export const LAMP_CELL = {
  text: 'cell-text',
  figure: 'cell-figure',
};

/** The lamp columns the lamp log and an enclosure's lamp page share; ids are the lamp log's sort keys. */
export function lampColumns(
  unit: LengthUnit,
  showEnclosure: boolean,
): ((TableColumn<Row> & { id: LampSortColumn }) | false)[] {
  return [
    { id: 'lamp', header: 'Lamp', cell: ({ row }) => <LampCell l={row.original} /> },
    showEnclosure && {
      id: 'enclosure',
      header: 'Enclosure',
      cell: ({ row }) => <EnclosureCell l={row.original} />,
    },
    {
      id: 'age',
      header: 'Age',
      className: LAMP_CELL.figure,
      cell: ({ row }) => <AgeCell l={row.original} />,
    },
    {
      id: 'lastReading',
      header: 'Last reading',
      className: LAMP_CELL.figure,
      cell: ({ row }) => <LastReadingCell l={row.original} unit={unit} />,
    },
    {
      id: 'remaining',
      header: 'Output left',
      title: 'Fitted output today as a share of the output when new',
      className: LAMP_CELL.figure,
      cell: ({ row }) => <RemainingCell l={row.original} />,
    },
    {
      id: 'due',
      header: 'Basking zone below need',
      className: LAMP_CELL.text,
      cell: ({ row }) => <FallsBelowCell l={row.original} />,
    },
    { id: 'urgency', header: 'Status', wide: true, cell: ({ row }) => <StatusCell l={row.original} /> },
  ];
}

/**
 * The lamp log table: one row per lamp with its age, last reading, fitted remaining output, the date the
 * basking zone falls below the species' need (or what is missing to say), and its status.
 */
export function LampTable({ lamps, showEnclosure }: { lamps: LampRow[]; showEnclosure: boolean }) {
  const [unit] = useLengthUnit();
  const rows = [...lamps].sort(
    (a, b) => STATUS_RANK[a.status] - STATUS_RANK[b.status] || a.label.localeCompare(b.label),
  );
  return (
    <Table
      data={rows}
      columns={lampColumns(unit, showEnclosure)}
      caption="Lamps, most urgent first"
      rowKey={(l) => l.id}
      rowClassName="align-top hover:bg-basalt-50"
      testId="lamp-table"
    />
  );
}
