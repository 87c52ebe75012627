'use client';

import { Table, type TableColumn } from '@/components/ui/Table';
import { LocalTime } from '@/components/ui/LocalTime';

/** Rows as the jobs page hands them over: plain text and moments, worked out on the server. */
export type FailingRow = {
  key: string;
  what: string;
  detail: string;
  error: string;
  attempts: number;
  lastAt: string;
  /** When it is tried again; null once given up (`givenUp` says why). */
  nextAt: string | null;
  givenUp?: string;
};

export type RunRow = {
  id: number;
  title: string;
  startedAt: string;
  took: string;
  outcome: { label: string; className: string };
  counts: string;
};

const td = 'px-3 py-2 align-top';
const th = 'px-3 py-2 font-semibold';
const when = `${td} whitespace-nowrap`;

/** The jobs page's tables are denser than the lists: smaller padding unless a column says otherwise. */
function compact<T>(columns: TableColumn<T>[]): TableColumn<T>[] {
  return columns.map((c) => ({ className: td, headerClassName: th, ...c }));
}

const failingColumns = compact<FailingRow>([
  {
    id: 'what',
    header: 'What',
    cell: ({ row: { original: f } }) => (
      <>
        {f.what}
        <span className="block text-caption text-basalt-500">{f.detail}</span>
      </>
    ),
  },
  {
    id: 'error',
    header: 'Error',
    className: `${td} max-w-md break-words text-basalt-700`,
    cell: ({ row }) => row.original.error,
  },
  { id: 'attempts', header: 'Attempts', cell: ({ row }) => row.original.attempts },
  {
    id: 'last',
    header: 'Last failed',
    className: when,
    cell: ({ row }) => <LocalTime value={row.original.lastAt} />,
  },
  {
    id: 'next',
    header: 'Next attempt',
    className: when,
    cell: ({ row: { original: f } }) => (f.nextAt ? <LocalTime value={f.nextAt} /> : f.givenUp),
  },
]);

const runColumns = compact<RunRow>([
  {
    id: 'run',
    header: 'Run',
    cell: ({ row: { original: r } }) => (
      <>
        {r.title}
        <span className="block text-caption text-basalt-500">#{r.id}</span>
      </>
    ),
  },
  {
    id: 'started',
    header: 'Started',
    className: when,
    cell: ({ row }) => <LocalTime value={row.original.startedAt} />,
  },
  { id: 'took', header: 'Took', className: when, cell: ({ row }) => row.original.took },
  {
    id: 'outcome',
    header: 'Outcome',
    cell: ({ row: { original: r } }) => (
      <span className={`rounded px-2 py-0.5 text-caption font-medium ${r.outcome.className}`}>
        {r.outcome.label}
      </span>
    ),
  },
  {
    id: 'counts',
    header: 'For your organisation',
    className: `${td} text-basalt-700`,
    cell: ({ row }) => row.original.counts,
  },
]);

export function FailingTable({ rows }: { rows: FailingRow[] }) {
  return (
    <Table
      data={rows}
      columns={failingColumns}
      caption="Work that failed and is waiting to be retried"
      rowKey={(f) => f.key}
      rowClassName=""
    />
  );
}

export function RunsTable({ rows }: { rows: RunRow[] }) {
  return (
    <Table
      data={rows}
      columns={runColumns}
      caption="Recent runs of the background jobs, newest first"
      rowKey={(r) => r.id}
      rowClassName=""
    />
  );
}
