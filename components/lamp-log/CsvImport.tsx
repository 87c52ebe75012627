'use client';

import { useRouter } from 'next/navigation';
import { useState, type ChangeEvent } from 'react';
import { ApiClientError, sendJson } from '@/components/ui/api-client';
import { LocalTime } from '@/components/ui/LocalTime';
import { Notice } from '@/components/ui/Notice';
import { button, input } from '@/components/ui/styles';
import type { CsvIssue, CsvRow } from '@/lib/lamp-log/csv';
import { formatValue } from './format';

type Preview = { ok: boolean; rows: CsvRow[]; errors: CsvIssue[]; total: number };

const MAX_BYTES = 1024 * 1024;
const EXAMPLE = `lamp,taken_at,distance,distance_unit,value,unit,through,through_transmission,warmed_up,meter,note
Basking tube,2025-03-01 10:30,30,cm,41.5,uvb,nothing,,yes,broadband meter,
Basking tube,2025-03-01 10:32,30,cm,1.7,uvi,nothing,,yes,UV index meter,same spot
Basking tube,2025-03-01 10:35,30,cm,25.1,uvb,lid,0.6,yes,broadband meter,through the lid`;

/**
 * Readings from a CSV file: first a preview with every problem named by row, nothing saved; then one
 * import of all rows, or none.
 */
export function CsvImport({ enclosureId }: { enclosureId: number }) {
  const router = useRouter();
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: 'error' | 'success'; text: string } | null>(null);

  const body = (text: string, commit: boolean, name?: string) => ({
    enclosureId,
    csv: text,
    fileName: name ?? null,
    tzOffsetMinutes: new Date().getTimezoneOffset(),
    commit,
  });

  async function choose(e: ChangeEvent<HTMLInputElement>) {
    setMessage(null);
    setPreview(null);
    const f = e.target.files?.[0];
    if (!f) return setFile(null);
    if (f.size > MAX_BYTES) {
      setFile(null);
      return setMessage({
        tone: 'error',
        text: 'That file is larger than 1 MB. Split it into smaller files.',
      });
    }
    const text = await f.text();
    setFile({ name: f.name, text });
    setBusy(true);
    try {
      setPreview(await sendJson<Preview>('POST', '/api/readings/import', body(text, false, f.name)));
    } catch (err) {
      setMessage({
        tone: 'error',
        text: err instanceof ApiClientError ? err.message : 'The file could not be checked.',
      });
    } finally {
      setBusy(false);
    }
  }

  async function commit() {
    if (!file) return;
    setBusy(true);
    setMessage(null);
    try {
      const r = await sendJson<{ imported: number }>(
        'POST',
        '/api/readings/import',
        body(file.text, true, file.name),
      );
      setMessage({
        tone: 'success',
        text: `Imported ${r.imported} reading${r.imported === 1 ? '' : 's'} from ${file.name}.`,
      });
      setPreview(null);
      setFile(null);
      router.refresh();
    } catch (err) {
      setMessage({
        tone: 'error',
        text: err instanceof ApiClientError ? err.message : 'Nothing was imported.',
      });
    } finally {
      setBusy(false);
    }
  }

  const errorsByRow = new Map<number, CsvIssue[]>();
  for (const e of preview?.errors ?? []) errorsByRow.set(e.row, [...(errorsByRow.get(e.row) ?? []), e]);

  return (
    <div className="space-y-3">
      <label className="block text-body font-medium text-basalt-800">
        CSV file of readings
        <input
          type="file"
          accept=".csv,text/csv"
          onChange={choose}
          className={`${input} mt-1`}
          disabled={busy}
        />
      </label>
      <details className="text-caption text-basalt-600">
        <summary className="cursor-pointer">Columns and an example</summary>
        <p className="mt-1">
          One reading per row: <code>lamp</code> (its name here), <code>taken_at</code> (2025-03-01 or
          2025-03-01 10:30, your local time), <code>distance</code> with <code>distance_unit</code> cm or in,{' '}
          <code>value</code>, <code>unit</code> uvb (µW/cm²) or uvi, and optional <code>meter</code> and{' '}
          <code>note</code>.
        </p>
        <p className="mt-1">
          How each reading was taken (optional columns): <code>through</code> — what was between lamp and
          meter: nothing, lid, screen or glass; <code>through_transmission</code> — the share of UVB it
          passes, 0–1 (for the lid, the lamp&apos;s own setting when empty; a screen must give it);{' '}
          <code>warmed_up</code> — yes or no. Left out or empty, they read &ldquo;not recorded&rdquo;, and the
          lamp log takes such a reading as the bare lamp and says so. Readings through glass of unknown share
          or of a lamp not yet warmed up are kept but not used for the decay.
        </p>
        <pre className="mt-1 overflow-x-auto rounded bg-basalt-50 p-2">{EXAMPLE}</pre>
      </details>
      {busy && <p className="text-caption text-basalt-500">Checking…</p>}
      {preview && (
        <div className="space-y-2" data-testid="csv-preview">
          <Notice tone={preview.ok ? 'success' : 'error'}>
            {preview.ok
              ? `${preview.rows.length} reading${preview.rows.length === 1 ? ' is' : 's are'} ready to import. Nothing is saved until you import them.`
              : `${preview.errors.length} problem${preview.errors.length > 1 ? 's' : ''} found. Fix the file and choose it again — nothing is imported while any row has a problem.`}
          </Notice>
          <div className="max-h-72 overflow-auto rounded border border-basalt-200">
            <table className="min-w-full text-left text-caption">
              <thead className="sticky top-0 bg-basalt-50 text-basalt-600">
                <tr>
                  <th className="px-2 py-1">Row</th>
                  <th className="px-2 py-1">Lamp</th>
                  <th className="px-2 py-1">Taken</th>
                  <th className="px-2 py-1">Distance</th>
                  <th className="px-2 py-1">Value</th>
                  <th className="px-2 py-1">Problem</th>
                </tr>
              </thead>
              <tbody>
                {[
                  ...preview.rows.map((r) => ({ row: r.row, r })),
                  ...[...errorsByRow.keys()].map((row) => ({ row, r: null })),
                ]
                  .sort((a, b) => a.row - b.row)
                  .map(({ row, r }) => (
                    <tr key={row} className={r ? '' : 'bg-ember-50 text-ember-900'}>
                      <td className="px-2 py-1 tabular-nums">{row}</td>
                      <td className="px-2 py-1">{r?.lampLabel ?? ''}</td>
                      <td className="px-2 py-1">{r ? <LocalTime value={r.takenAt} shown="day" /> : ''}</td>
                      <td className="px-2 py-1 tabular-nums">{r ? `${r.distanceCm} cm` : ''}</td>
                      <td className="px-2 py-1 tabular-nums">{r ? formatValue(r.value, r.unit) : ''}</td>
                      <td className="px-2 py-1">
                        {(errorsByRow.get(row) ?? []).map((e) => `${e.field}: ${e.message}`).join(' ')}
                      </td>
                    </tr>
                  ))}
              </tbody>
            </table>
          </div>
          <button type="button" className={button.primary} onClick={commit} disabled={!preview.ok || busy}>
            Import {preview.rows.length} reading{preview.rows.length === 1 ? '' : 's'}
          </button>
        </div>
      )}
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
    </div>
  );
}
