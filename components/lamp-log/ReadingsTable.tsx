'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { ApiClientError, sendJson } from '@/components/ui/api-client';
import { Notice } from '@/components/ui/Notice';
import { button } from '@/components/ui/styles';
import { formatLength, useLengthUnit } from '@/components/ui/units';
import type { LampDetail } from '@/lib/lamp-log/store';
import { formatValue } from './format';

type Reading = LampDetail['readings'][number];

function when(iso: string) {
  const d = new Date(iso);
  return `${d.toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' })} ${d.toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit' })}`;
}

/** The lamp's readings, newest first, with delete and an undo for the last delete. */
export function ReadingsTable({ readings, canEdit }: { readings: Reading[]; canEdit: boolean }) {
  const router = useRouter();
  const [unit] = useLengthUnit();
  const [deleted, setDeleted] = useState<Reading | null>(null);
  const [error, setError] = useState<string | null>(null);
  const rows = [...readings].sort((a, b) => b.takenAt.localeCompare(a.takenAt));

  async function remove(r: Reading) {
    if (!window.confirm(`Delete the reading of ${when(r.takenAt)} (${formatValue(r.value, r.unit)})?`))
      return;
    setError(null);
    try {
      await sendJson('DELETE', `/api/readings/${r.id}`);
      setDeleted(r);
      router.refresh();
    } catch (e) {
      setError(e instanceof ApiClientError ? e.message : 'The reading could not be deleted.');
    }
  }

  async function undo() {
    if (!deleted) return;
    try {
      await sendJson('POST', `/api/lamps/${deleted.lampId}/readings`, {
        takenAt: deleted.takenAt,
        distance: deleted.distanceCm,
        distanceUnit: 'cm',
        value: deleted.value,
        unit: deleted.unit,
        meter: deleted.meter,
        note: deleted.note,
      });
      setDeleted(null);
      router.refresh();
    } catch (e) {
      setError(e instanceof ApiClientError ? e.message : 'The reading could not be restored.');
    }
  }

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
      <div className="max-h-96 overflow-auto rounded-lg border border-basalt-200 bg-white">
        <table
          className="min-w-full divide-y divide-basalt-200 text-left text-body"
          data-testid="readings-table"
        >
          <caption className="sr-only">Readings, newest first</caption>
          <thead className="sticky top-0 bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
            <tr>
              <th scope="col" className="px-3 py-2">
                Taken
              </th>
              <th scope="col" className="px-3 py-2">
                Value
              </th>
              <th scope="col" className="px-3 py-2">
                Distance
              </th>
              <th scope="col" className="px-3 py-2">
                Meter
              </th>
              <th scope="col" className="px-3 py-2">
                Note
              </th>
              {canEdit && (
                <th scope="col" className="px-3 py-2">
                  <span className="sr-only">Actions</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody className="divide-y divide-basalt-100">
            {rows.map((r) => (
              <tr key={r.id}>
                <td className="whitespace-nowrap px-3 py-2 text-basalt-700">{when(r.takenAt)}</td>
                <td className="whitespace-nowrap px-3 py-2 tabular-nums">{formatValue(r.value, r.unit)}</td>
                <td className="whitespace-nowrap px-3 py-2 tabular-nums">
                  {formatLength(r.distanceCm, unit)} {unit}
                </td>
                <td className="px-3 py-2 text-basalt-600">{r.meter ?? '—'}</td>
                <td className="px-3 py-2 text-basalt-600">
                  {r.note ?? ''}
                  {r.uploadId && <span className="ml-1 text-caption text-basalt-500">(imported)</span>}
                </td>
                {canEdit && (
                  <td className="px-3 py-2 text-right">
                    <button type="button" className={button.quietDanger} onClick={() => remove(r)}>
                      Delete
                    </button>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
