'use client';

import { Table, type TableColumn } from '@/components/ui/Table';
import type { DesignDiff, ObjectChange } from '@/shared/designs/diff';
import { changeText, offsetText } from './change-words';

const KIND: Record<ObjectChange['kind'], { label: string; className: string }> = {
  added: { label: 'Added', className: 'bg-moss-100 text-moss-800' },
  removed: { label: 'Removed', className: 'bg-ember-100 text-ember-800' },
  moved: { label: 'Moved', className: 'bg-sky-100 text-sky-800' },
  changed: { label: 'Changed', className: 'bg-sand-100 text-sand-900' },
};

const TYPE_LABEL: Record<string, string> = {
  lamp: 'Lamp',
  screen: 'Mesh screen',
  glass: 'Glass',
  perch: 'Perch',
  ledge: 'Ledge',
  hide: 'Hide',
  foliage: 'Foliage',
};

function nameOf(o: ObjectChange): string {
  const name = 'object' in o ? (typeof o.object.name === 'string' ? o.object.name : undefined) : o.name;
  return `${TYPE_LABEL[o.type] ?? o.type} “${name ?? o.id}”`;
}

/** What an object's row says beside its name. */
function detailsOf(o: ObjectChange): string {
  if (o.kind === 'added') return 'only in B';
  if (o.kind === 'removed') return 'only in A';
  const offset = offsetText(o.dx, o.dy);
  if (o.kind === 'moved') return offset || o.changes.map(changeText).join('; ');
  return [
    offset && `moved ${offset}`,
    ...o.changes.filter((c) => !['x', 'y', 'x1', 'y1', 'x2', 'y2'].includes(c.field)).map(changeText),
  ]
    .filter(Boolean)
    .join('; ');
}

/** A row of the table: the enclosure's own changes, or one object's. */
type DiffRow = { key: string; kind: ObjectChange['kind']; what: string; details: string; object: boolean };

const columns: TableColumn<DiffRow>[] = [
  {
    id: 'kind',
    header: 'Change',
    headerClassName: 'py-1 pr-3 font-medium',
    className: 'py-1.5 pr-3',
    cell: ({ row: { original: r } }) => (
      <span className={`rounded px-1.5 py-0.5 text-caption font-medium ${KIND[r.kind].className}`}>
        {KIND[r.kind].label}
      </span>
    ),
  },
  {
    id: 'object',
    header: 'Object',
    headerClassName: 'py-1 pr-3 font-medium',
    className: 'py-1.5 pr-3 text-left font-normal',
    rowHeader: true,
    cell: ({ row }) => row.original.what,
  },
  {
    id: 'details',
    header: 'Details',
    headerClassName: 'py-1 font-medium',
    className: 'py-1.5 text-basalt-700',
    cell: ({ row }) => row.original.details,
  },
];

/** What differs from A to B, one object a row. */
export function DiffTable({ diff }: { diff: DesignDiff }) {
  const rows: DiffRow[] = [
    ...(diff.enclosure.length > 0
      ? [
          {
            key: 'enclosure',
            kind: 'changed' as const,
            what: 'Enclosure',
            details: diff.enclosure.map(changeText).join('; '),
            object: false,
          },
        ]
      : []),
    ...diff.objects.map((o) => ({
      key: `${o.kind}-${o.type}-${o.id}`,
      kind: o.kind,
      what: nameOf(o),
      details: detailsOf(o),
      object: true,
    })),
  ];
  return (
    <section aria-labelledby="diff-heading" className="space-y-2">
      <h2 id="diff-heading" className="text-lead font-semibold text-basalt-900">
        What differs (A → B)
      </h2>
      {rows.length === 0 ? (
        <p className="text-body text-basalt-600">The two variants are the same design.</p>
      ) : (
        <Table
          data={rows}
          columns={columns}
          caption="What differs from A to B"
          rowKey={(r) => r.key}
          rowTestId={(r) => (r.object ? 'diff-row' : undefined)}
          inline
        />
      )}
      <p className="text-caption text-basalt-500">
        {diff.counts.unchanged} object{diff.counts.unchanged === 1 ? '' : 's'} unchanged.
      </p>
    </section>
  );
}
