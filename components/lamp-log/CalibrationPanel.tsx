'use client';

import Link from '@/components/ui/Link';
import { useEffect, useState } from 'react';
import { ApiClientError, sendJson } from '@/components/ui/api-client';
import { Notice } from '@/components/ui/Notice';
import { button, link } from '@/components/ui/styles';
import type { CalibrationTarget } from '@/lib/lamp-log/calibration-service';

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

/** What the readings would change in the design, per variant, and a button to write it there. */
export function CalibrationPanel({ lampId, canApply }: { lampId: number; canApply: boolean }) {
  const [proposal, setProposal] = useState<Proposal | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<{ variantId: number; version: number } | null>(null);
  const [busy, setBusy] = useState<number | null>(null);

  useEffect(() => {
    let live = true;
    sendJson<Proposal>('GET', `/api/lamps/${lampId}/calibration`)
      .then((p) => live && setProposal(p))
      .catch(
        (e) => live && setError(e instanceof ApiClientError ? e.message : 'Could not load the calibration.'),
      );
    return () => {
      live = false;
    };
  }, [lampId, done]);

  async function apply(t: CalibrationTarget) {
    setBusy(t.variant.id);
    setError(null);
    try {
      const r = await sendJson<{ variant: { id: number; version: number } }>(
        'POST',
        `/api/lamps/${lampId}/calibration`,
        {
          variantId: t.variant.id,
          baseVersion: t.variant.version,
        },
      );
      setDone({ variantId: r.variant.id, version: r.variant.version });
    } catch (e) {
      setError(e instanceof ApiClientError ? e.message : 'The calibration was not applied.');
    } finally {
      setBusy(null);
    }
  }

  if (error) return <Notice tone="error">{error}</Notice>;
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
              <table className="mt-2 text-left text-caption">
                <thead className="text-basalt-500">
                  <tr>
                    <th className="pr-4">Field</th>
                    <th className="pr-4">In the design</th>
                    <th>From the readings</th>
                  </tr>
                </thead>
                <tbody>
                  {t.calibration.changes.map((c) => (
                    <tr key={c.field}>
                      <td className="pr-4">{FIELD[c.field] ?? c.field}</td>
                      <td className="pr-4 tabular-nums">{show(c.from)}</td>
                      <td className="tabular-nums font-medium">{show(c.to)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
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
                  onClick={() => apply(t)}
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
