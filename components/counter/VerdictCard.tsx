import type { CounterAnswerDto } from '@/lib/counter/queries';
import { formatLengthRounded, type LengthUnit } from '@/shared/units';
import { formatDay, readableDays } from '@/components/lamp-log/format';

const TONE: Record<string, string> = {
  keep: 'border-moss-300 bg-moss-50 text-moss-900',
  'test-again': 'border-sand-300 bg-sand-50 text-sand-900',
  replace: 'border-ember-300 bg-ember-50 text-ember-900',
  'no-verdict': 'border-basalt-300 bg-basalt-50 text-basalt-900',
};

const TITLE: Record<string, string> = {
  keep: 'Keep it',
  'test-again': 'Test again',
  replace: 'Replace it',
  'no-verdict': 'No UV verdict',
};

const round = (v: number) => (v >= 10 ? Math.round(v) : Math.round(v * 10) / 10);
const value = (v: number, unit: string) => (unit === 'uvb' ? `${round(v)} µW/cm²` : `UVI ${round(v)}`);
const pct = (v: number) => `${Math.round(v * 100)} %`;
const monthName = (ym: string) =>
  new Date(`${ym}-15T00:00:00Z`).toLocaleDateString('en-GB', {
    month: 'long',
    year: 'numeric',
    timeZone: 'UTC',
  });

/** The counter's answer: the verdict in plain words first, then the figures, what they rest on, and the cautions. */
export function VerdictCard({
  answer,
  unit,
  busy,
}: {
  answer: CounterAnswerDto;
  unit: LengthUnit;
  busy: boolean;
}) {
  const v = answer.verdict;
  return (
    <section
      aria-label="Verdict"
      className={`space-y-3 rounded-lg border-2 p-4 ${TONE[v.kind]}`}
      aria-busy={busy}
    >
      <div>
        <p className="text-caption font-semibold uppercase tracking-wide">Verdict (an estimate)</p>
        <h2 className="text-title font-semibold" data-verdict={v.kind}>
          {TITLE[v.kind]}
        </h2>
        <p className="mt-1 text-body">{readableDays(v.headline)}</p>
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-body">
        {v.output && (
          <>
            <dt className="font-medium">Output left</dt>
            <dd>
              {pct(v.output.share)} of a new lamp of this type ({pct(v.output.low)}–{pct(v.output.high)});{' '}
              {value(v.output.nowAt30, v.output.unit)} against {value(v.output.newAt30, v.output.unit)} at 30
              cm, bare
            </dd>
          </>
        )}
        {v.basking && (
          <>
            <dt className="font-medium">At home today</dt>
            <dd>
              about {value(v.basking.valueNow, v.basking.unit)} at the basking spot,{' '}
              {formatLengthRounded(v.basking.distanceCm, unit)} below the lamp; the need is{' '}
              {v.basking.needLabel}
            </dd>
          </>
        )}
        {v.fallsBelowMonth && (
          <>
            <dt className="font-medium">Below the need</dt>
            <dd>
              around {monthName(v.fallsBelowMonth)}
              {v.fallsBelowEarliestMonth && v.fallsBelowEarliestMonth < v.fallsBelowMonth
                ? `, as early as ${monthName(v.fallsBelowEarliestMonth)}`
                : ''}
            </dd>
          </>
        )}
        {v.testAgainOn && (
          <>
            <dt className="font-medium">Test again</dt>
            <dd>by {formatDay(v.testAgainOn)}</dd>
          </>
        )}
        <dt className="font-medium">Lamp</dt>
        <dd>
          {answer.lampTypeName}, about {round(answer.ageMonths)} months in use
          {answer.speciesName ? ` · for ${answer.speciesName}` : ''}
        </dd>
      </dl>
      <ul className="list-disc space-y-1 pl-5 text-body">
        {v.reasons.map((r) => (
          <li key={r}>{readableDays(r)}</li>
        ))}
        {answer.photoperiod && <li>{answer.photoperiod}</li>}
      </ul>
      <details>
        <summary className="cursor-pointer text-body font-medium">How sure is this?</summary>
        <ul className="mt-2 list-disc space-y-1 pl-5 text-caption">
          {[...v.uncertainty, ...answer.readingNotes].map((u) => (
            <li key={u}>{u}</li>
          ))}
        </ul>
      </details>
      <div className="rounded-md border border-current/20 bg-white/60 p-3 text-caption text-basalt-800">
        <p className="font-semibold">Cautions</p>
        <ul className="mt-1 list-disc space-y-1 pl-5">
          {v.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </div>
    </section>
  );
}
