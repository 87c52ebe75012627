import type { Assessment, FindingStatus } from '@/simulation';
import type { SpeciesSource } from '@/lib/species/schema';
import { FINDING_STATUS, worstFirst } from '@/shared/finding-status';
import { numberLines, sourcesFor } from './finding-numbers';

const BADGE: Record<FindingStatus, string> = {
  pass: 'bg-moss-100 text-moss-800 border-moss-300',
  attention: 'bg-sand-100 text-sand-900 border-sand-300',
  fail: 'bg-ember-100 text-ember-800 border-ember-300',
};

/**
 * An assessment, one finding a row: status, the plain-language explanation, the numbers behind it, and
 * where the species sheet's figure it was checked against comes from. Server- and client-safe.
 */
export function FindingList({
  assessment,
  sources = [],
  speciesName,
  title = `Species check${speciesName ? `: ${speciesName}` : ''}`,
  lead,
}: {
  assessment: Pick<Assessment, 'findings' | 'overall'>;
  sources?: SpeciesSource[];
  speciesName?: string;
  title?: string;
  /** A sentence under the heading (what was checked against what). */
  lead?: string;
}) {
  return (
    <section aria-label={title} className="space-y-3">
      <div className="flex flex-wrap items-center gap-2">
        <h2 className="text-lead font-semibold text-basalt-900">{title}</h2>
        <StatusBadge status={assessment.overall} />
      </div>
      {lead && <p className="text-body text-basalt-700">{lead}</p>}
      <ul className="space-y-2">
        {worstFirst(assessment.findings).map((f) => {
          const from = sourcesFor(f.id, sources);
          return (
            <li key={f.id} className="rounded-md border border-basalt-200 bg-white px-4 py-3">
              <div className="flex flex-wrap items-center gap-2">
                <StatusBadge status={f.status} />
                <h3 className="font-semibold text-basalt-900">{f.title}</h3>
              </div>
              <p className="mt-1 text-body text-basalt-800">{f.message}</p>
              <details className="mt-1 text-caption text-basalt-600">
                <summary className="cursor-pointer select-none">The numbers behind this</summary>
                <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5">
                  {numberLines(f).map((l) => (
                    <div key={l.key} className="contents">
                      <dt>{l.label}</dt>
                      <dd className="tabular-nums text-basalt-800">{l.value}</dd>
                    </div>
                  ))}
                </dl>
                {from.length > 0 && (
                  <p className="mt-1">
                    Species figure from: {from.map((s) => `${s.citation} (${s.confidence})`).join('; ')}
                  </p>
                )}
              </details>
            </li>
          );
        })}
      </ul>
      <p className="text-caption text-basalt-500">
        Every figure is an estimate from a model: verify it with a UV meter and a thermometer in the real
        enclosure.
      </p>
    </section>
  );
}

export function StatusBadge({ status }: { status: FindingStatus }) {
  const s = FINDING_STATUS[status];
  return (
    <span
      className={`inline-flex items-center gap-1 rounded border px-1.5 text-caption font-semibold ${BADGE[status]}`}
    >
      <span aria-hidden="true">{s.mark}</span>
      {s.word}
    </span>
  );
}
