'use client';

import { useRouter } from 'next/navigation';
import { useState, type ChangeEvent, type ReactNode } from 'react';
import { ApiClientError } from '@/components/ui/api-client';
import { Notice } from '@/components/ui/Notice';
import { button, input } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';

/** A problem of one row of a file (the header is row 1), and the column it concerns. */
export type CsvRowIssue = { row: number; field: string; message: string };

type Preview<R> = { ok: boolean; rows: R[]; errors: CsvRowIssue[]; total: number };

const MAX_BYTES = 1024 * 1024;

/**
 * A CSV import in two steps, the same wherever a file of rows comes in (the lamp log's readings, the
 * counter's past tests): choosing the file sends it for a preview (nothing saved) that lists every row
 * and every problem by row and column; the import then saves every row or none. The route takes
 * `{ ...target, csv, fileName, tzOffsetMinutes, commit }`.
 */
export function CsvImportPanel<R extends { row: number }>(props: {
  url: string;
  target: Record<string, unknown>;
  fileLabel: string;
  /** "reading"/"readings", "test"/"tests". */
  noun: [string, string];
  help: ReactNode;
  columns: { header: string; cell: (r: R) => ReactNode }[];
  /** A line under the preview's verdict (who the import would add). */
  note?: (preview: Preview<R> & { [more: string]: unknown }) => ReactNode;
  done: (answer: Record<string, number>, fileName: string) => string;
}) {
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [preview, setPreview] = useState<Preview<R> | null>(null);
  const [message, setMessage] = useState<{ tone: 'error' | 'success'; text: string } | null>(null);
  const [one, many] = props.noun;
  const send = useApiMutation<
    { text: string; name: string; commit: boolean },
    Preview<R> & Record<string, number>
  >(
    ({ text, name, commit }) => ({
      method: 'POST',
      url: props.url,
      body: {
        ...props.target,
        csv: text,
        fileName: name,
        tzOffsetMinutes: new Date().getTimezoneOffset(),
        commit,
      },
    }),
    // A preview changes nothing: the page's server parts are refreshed after an import only.
    { refresh: false },
  );
  const router = useRouter();
  const busy = send.isPending;
  const failed = (err: unknown, fallback: string) =>
    setMessage({ tone: 'error', text: err instanceof ApiClientError ? err.message : fallback });

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
    try {
      setPreview(await send.mutateAsync({ text, name: f.name, commit: false }));
    } catch (err) {
      failed(err, 'The file could not be checked.');
    }
  }

  async function commit() {
    if (!file) return;
    setMessage(null);
    try {
      const r = await send.mutateAsync({ text: file.text, name: file.name, commit: true });
      setMessage({ tone: 'success', text: props.done(r, file.name) });
      setPreview(null);
      setFile(null);
      router.refresh();
    } catch (err) {
      failed(err, 'Nothing was imported.');
    }
  }

  const errorsByRow = new Map<number, CsvRowIssue[]>();
  for (const e of preview?.errors ?? []) errorsByRow.set(e.row, [...(errorsByRow.get(e.row) ?? []), e]);
  const count = (n: number) => `${n} ${n === 1 ? one : many}`;

  return (
    <div className="space-y-3">
      <label className="block text-body font-medium text-basalt-800">
        {props.fileLabel}
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
        {props.help}
      </details>
      {busy && <p className="text-caption text-basalt-500">Checking…</p>}
      {preview && (
        <div className="space-y-2" data-testid="csv-preview">
          <Notice tone={preview.ok ? 'success' : 'error'}>
            {preview.ok
              ? `${count(preview.rows.length)} ${preview.rows.length === 1 ? 'is' : 'are'} ready to import. Nothing is saved until you import them.`
              : `${preview.errors.length} problem${preview.errors.length > 1 ? 's' : ''} found. Fix the file and choose it again — nothing is imported while any row has a problem.`}
          </Notice>
          {preview.ok && props.note?.(preview)}
          <div className="max-h-72 overflow-auto rounded border border-basalt-200">
            <table className="min-w-full text-left text-caption">
              <thead className="sticky top-0 bg-basalt-50 text-basalt-600">
                <tr>
                  <th className="px-2 py-1">Row</th>
                  {props.columns.map((c) => (
                    <th key={c.header} className="px-2 py-1">
                      {c.header}
                    </th>
                  ))}
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
                      {props.columns.map((c) => (
                        <td key={c.header} className="px-2 py-1">
                          {r ? c.cell(r) : ''}
                        </td>
                      ))}
                      <td className="px-2 py-1">
                        {(errorsByRow.get(row) ?? []).map((e) => `${e.field}: ${e.message}`).join(' ')}
                      </td>
                    </tr>
                  ))}
              </tbody>
            </table>
          </div>
          <button type="button" className={button.primary} onClick={commit} disabled={!preview.ok || busy}>
            Import {count(preview.rows.length)}
          </button>
        </div>
      )}
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
    </div>
  );
}
