'use client';

import Link from '@/components/ui/Link';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { apiFetch } from '@/components/ui/api-client';
import { Notice } from '@/components/ui/Notice';
import { button, link } from '@/components/ui/styles';
import { Table, type TableColumn } from '@/components/ui/Table';
import { useApiMutation } from '@/components/ui/useApiMutation';
import type { CalibrationTarget } from '@/lib/lamp-log/queries';

type Proposal = { designObjectId: string | null; hint: string | null; targets: CalibrationTarget[] };

const FIELD: Record<string, string> = {
  uvbAt30: 'UVB at 30 cm, new (µW/cm²)',
  uviPerUvb: 'UVI per µW/cm²',
  decay: 'Decay curve',
  ageMonths: 'Age (months)',
};

function show(v: unknown): string {
  if (v === null || v === undefined) return 'catalogue default';
  if (typeof v === 'number') return String(v);
  if (typeof v === 'object' && v && 'points' in v)
    return `table of ${(v as { points: unknown[] }).points.length} months`;
  if (typeof v === 'object' && v && 'halfLifeMonths' in v)
    return `half-life ${(v as { halfLifeMonths: number }).halfLifeMonths} months`;
  return JSON.stringify(v);
}

type Change = Extract<CalibrationTarget['calibration'], { ok: true }>['changes'][number];

// A small table inside a card: tight cells, plain headings.
const head = 'py-1 pr-4 font-normal';
const columns: TableColumn<Change>[] = [
  {
    id: 'field',
    header: 'Field',
    headerClassName: head,
    className: 'py-1 pr-4',
    cell: ({ row }) => FIELD[row.original.field] ?? row.original.field,
  },
  {
    id: 'from',
    header: 'In the design',
    headerClassName: head,
    className: 'py-1 pr-4 tabular-nums',
    cell: ({ row }) => show(row.original.from),
  },
  {
    id: 'to',
    header: 'From the readings',
    headerClassName: head,
    className: 'py-1 tabular-nums font-medium',
    cell: ({ row }) => show(row.original.to),
  },
];

/** What the readings would change in the design, per variant, and a button to write it there. */
export function CalibrationPanel({ lampId, canApply }: { lampId: number; canApply: boolean }) {
  const url = `/api/lamps/${lampId}/calibration`;
  const load = useQuery({ queryKey: [url], queryFn: ({ signal }) => apiFetch<Proposal>(url, { signal }) });
  const [done, setDone] = useState<{ variantId: number; version: number } | null>(null);
  const apply = useApiMutation<CalibrationTarget, { variant: { id: number; version: number } }>(
    (t) => ({ method: 'POST', url, body: { variantId: t.variant.id, baseVersion: t.variant.version } }),
    {
      // The variant has a new version now: the proposal is asked for again against it.
      refresh: false,
      onSuccess: ({ variant }) => {
        setDone({ variantId: variant.id, version: variant.version });
        void load.refetch();
      },
    },
  );
  const busy = apply.isPending ? apply.variables.variant.id : null;

  const error = load.error ?? apply.error;
  if (error) return <Notice tone="error">{error.message}</Notice>;
  const proposal = load.data;
  if (!proposal) return <p className="text-body text-basalt-500">Loading…</p>;
  if (proposal.hint) return <p className="text-body text-basalt-600">{proposal.hint}</p>;
  return (
    <div className="space-y-4">
      {done && (
        <Notice tone="success">
          Calibrated. The studio now shows this lamp as measured (version {done.version}).{' '}
          <Link href={`/studio/${done.variantId}`} className={link}>
            Open the studio
          </Link>
        </Notice>
      )}
      {proposal.targets.map((t) => (
        <div key={t.variant.id} className="rounded-md border border-basalt-200 p-3">
          <p className="font-medium text-basalt-900">
            {t.variant.designName} · {t.variant.name}{' '}
            <span className="text-caption text-basalt-500">
              (lamp “{t.object.name ?? t.object.id}”, version {t.variant.version})
            </span>
          </p>
          {t.calibration.ok ? (
            <>
              <Table
                data={t.calibration.changes}
                columns={columns}
                caption={`What the readings change in ${t.variant.designName} · ${t.variant.name}`}
                rowKey={(c) => c.field}
                head="plain"
                inline
                frameClassName="mt-2 overflow-x-auto"
              />
              <ul className="mt-2 list-disc pl-5 text-caption text-basalt-600">
                {t.calibration.notes.map((n) => (
                  <li key={n}>{n}</li>
                ))}
                <li>
                  From {t.calibration.calibrated.from} readings, the latest on {t.calibration.calibrated.at}.
                  An estimate: check the studio&apos;s figures with a meter at the basking spot.
                </li>
              </ul>
              {canApply && (
                <button
                  type="button"
                  className={`${button.secondary} mt-3`}
                  onClick={() => apply.mutate(t)}
                  disabled={busy !== null}
                >
                  {busy === t.variant.id ? 'Applying…' : 'Apply to this variant'}
                </button>
              )}
            </>
          ) : (
            <p className="mt-1 text-body text-basalt-600">{t.calibration.reason}</p>
          )}
        </div>
      ))}
    </div>
  );
}
