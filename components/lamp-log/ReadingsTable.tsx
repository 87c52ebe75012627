'use client';

import { useState } from 'react';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { useViewerZone } from '@/components/ui/LocalTime';
import { Notice } from '@/components/ui/Notice';
import { formatMoment } from '@/lib/time/format';
import { button, link } from '@/components/ui/styles';
import { formatLengthRounded } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import type { LampDetail } from '@/lib/lamp-log/queries';
import { THROUGH_SHORT } from '@/shared/reading-setup';
import { formatValue } from './format';
import { ReadingSetupEdit } from './ReadingSetupEdit';
import { Table, type TableColumn } from '@/components/ui/Table';
import Link from '@/components/ui/Link';

type Reading = LampDetail['readings'][number];

function TrashIcon() {
  return (
    <svg viewBox="0 0 20 20" width="18" height="18" aria-hidden="true" focusable="false" fill="currentColor">
      <path d="M8 2h4a1 1 0 0 1 1 1v1h4a1 1 0 1 1 0 2h-.1l-.8 10.2A2 2 0 0 1 14.1 18H5.9a2 2 0 0 1-2-1.8L3.1 6H3a1 1 0 0 1 0-2h4V3a1 1 0 0 1 1-1Zm-2.9 4 .8 10h8.2l.8-10H5.1ZM8 8a1 1 0 0 1 1 1v5a1 1 0 1 1-2 0V9a1 1 0 0 1 1-1Zm4 0a1 1 0 0 1 1 1v5a1 1 0 1 1-2 0V9a1 1 0 0 1 1-1Z" />
    </svg>
  );
}

/** How the reading was taken, in a few words: "through the lid (60 %), warmed up". */
function setupText(r: Reading): string {
  const share =
    r.throughTransmission !== null && r.through !== 'nothing'
      ? ` (${Math.round(r.throughTransmission * 100)} %)`
      : '';
  const warm = r.warmedUp === 'yes' ? ', warmed up' : r.warmedUp === 'no' ? ', not warmed up' : '';
  return `${THROUGH_SHORT[r.through]}${share}${warm}`;
}

/**
 * The lamp's readings, newest first, with delete and an undo for the last delete. The page sends the
 * newest few unless the address asks for all (`more`: how many it left out, and the two addresses).
 */
export function ReadingsTable({
  readings,
  canEdit,
  more,
}: {
  readings: Reading[];
  canEdit: boolean;
  more?: { total: number; shown: number; allHref: string; fewerHref: string };
}) {
  const [unit] = useLengthUnit();
  const zone = useViewerZone();
  const day = (iso: string) => formatMoment(iso, zone, 'day');
  const time = (iso: string) => formatMoment(iso, zone, 'time');
  const when = (iso: string) => `${day(iso)} ${time(iso)}`;
  const [deleted, setDeleted] = useState<Reading | null>(null);
  const rows = [...readings].sort((a, b) => b.takenAt.localeCompare(a.takenAt));
  const del = useApiMutation((r: Reading) => ({ method: 'DELETE', url: `/api/readings/${r.id}` }), {
    onSuccess: (_, r) => setDeleted(r),
  });
  // Puts the deleted reading back as it was: the same moment, distance, value, set-up, meter and note.
  const restore = useApiMutation(
    (r: Reading) => ({
      method: 'POST',
      url: `/api/lamps/${r.lampId}/readings`,
      body: {
        takenAt: r.takenAt,
        distance: r.distanceCm,
        distanceUnit: 'cm',
        value: r.value,
        unit: r.unit,
        through: r.through,
        throughTransmission: r.throughTransmission,
        warmedUp: r.warmedUp,
        meter: r.meter,
        note: r.note,
      },
    }),
    { onSuccess: () => setDeleted(null) },
  );
  const error = del.error
    ? del.error.message || 'The reading could not be deleted.'
    : restore.error
      ? restore.error.message || 'The reading could not be restored.'
      : null;

  function remove(r: Reading) {
    if (!window.confirm(`Delete the reading of ${when(r.takenAt)} (${formatValue(r.value, r.unit)})?`))
      return;
    restore.reset();
    del.mutate(r);
  }

  function undo() {
    if (!deleted) return;
    del.reset();
    restore.mutate(deleted);
  }

  const columns: (TableColumn<Reading> | false)[] = [
    {
      id: 'taken',
      header: 'Taken',
      headerClassName: 'px-3 py-2',
      className: 'px-3 py-2 text-basalt-700',
      cell: ({ row: { original: r } }) => (
        <time dateTime={r.takenAt}>
          <span className="block whitespace-nowrap">{day(r.takenAt)}</span>
          <span className="block whitespace-nowrap text-caption text-basalt-500">{time(r.takenAt)}</span>
        </time>
      ),
    },
    {
      id: 'reading',
      header: 'Reading',
      headerClassName: 'px-3 py-2',
      className: 'px-3 py-2',
      cell: ({ row: { original: r } }) => (
        <>
          <span className="block whitespace-nowrap font-medium tabular-nums">
            {formatValue(r.value, r.unit)}
          </span>
          <span className="block whitespace-nowrap text-caption tabular-nums text-basalt-500">
            at {formatLengthRounded(r.distanceCm, unit)}
          </span>
          <span className="block text-caption text-basalt-500" data-testid="reading-setup">
            {setupText(r)}
          </span>
          {canEdit && <ReadingSetupEdit reading={r} label={`the reading of ${when(r.takenAt)}`} />}
        </>
      ),
    },
    {
      id: 'meter',
      header: 'Meter and note',
      headerClassName: 'px-3 py-2',
      className: 'px-3 py-2 text-basalt-600',
      cell: ({ row: { original: r } }) => (
        <>
          <span className="block">{r.meter ?? '—'}</span>
          {(r.note || r.uploadId) && (
            <span className="block text-caption text-basalt-500">
              {r.note ?? ''}
              {r.uploadId && <span className={r.note ? 'ml-1' : undefined}>(imported)</span>}
            </span>
          )}
        </>
      ),
    },
    canEdit && {
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      headerClassName: 'w-10 px-1 py-2',
      className: 'px-1 py-1.5 text-right',
      cell: ({ row: { original: r } }) => (
        <button
          type="button"
          className={`${button.quietDanger} p-1.5`}
          onClick={() => remove(r)}
          aria-label={`Delete the reading of ${when(r.takenAt)}`}
          title="Delete this reading"
        >
          <TrashIcon />
        </button>
      ),
    },
  ];

  if (rows.length === 0 && !deleted) {
    return (
      <p className="text-body text-basalt-500">
        No readings yet. Add the first one below, or import a CSV file.
      </p>
    );
  }
  return (
    <div className="space-y-2">
      {deleted && (
        <Notice tone="info">
          Reading deleted.{' '}
          <button type="button" className={button.quiet} onClick={undo}>
            Undo
          </button>
        </Notice>
      )}
      {error && <Notice tone="error">{error}</Notice>}
      {/* Four compact columns, so the table fits its half of the page at laptop width (1280 px)
          without a sideways scroll: date over time, value over distance, meter over note, and
          the delete action as a small labelled icon button. */}
      <Table
        data={rows}
        columns={columns}
        caption="Readings, newest first"
        rowKey={(r) => r.id}
        stickyHead
        fullWidth
        frameClassName="max-h-96 overflow-y-auto rounded-lg border border-basalt-200 bg-white"
        rowClassName="align-top"
        testId="readings-table"
      />
      {more && more.total > more.shown && (
        <p className="text-caption text-basalt-600">
          {readings.length < more.total ? (
            <>
              The newest {readings.length} of {more.total} readings.{' '}
              <Link href={more.allHref} scroll={false} className={link}>
                Show all {more.total}
              </Link>
            </>
          ) : (
            <>
              All {more.total} readings.{' '}
              <Link href={more.fewerHref} scroll={false} className={link}>
                Show only the newest {more.shown}
              </Link>
            </>
          )}
        </p>
      )}
    </div>
  );
}
