'use client';

import { card } from '@/components/ui/styles';
import { formatLengthRounded } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import { BURN_IN_HOURS } from '@/lib/lamp-log/burn-in';
import type { LampSummary } from '@/lib/lamp-log/queries';
import { formatAge, formatDay, formatValue, readableDays } from './format';

const DAYS_PER_MONTH = 365.25 / 12;

function Row({ term, children }: { term: string; children: React.ReactNode }) {
  return (
    <div className="flex justify-between gap-3 py-1.5">
      <dt className="text-basalt-600">{term}</dt>
      <dd className="text-right tabular-nums text-basalt-900">{children}</dd>
    </div>
  );
}

/** The numbers behind the status, with the fit's uncertainty said plainly. */
export function LampFacts({ lamp: l }: { lamp: LampSummary }) {
  const [unit] = useLengthUnit();
  const f = l.fit;
  const halfLife = f.tauDays ? (f.tauDays * Math.LN2) / DAYS_PER_MONTH : null;
  const halfLifeSe = f.tauSe ? (f.tauSe * Math.LN2) / DAYS_PER_MONTH : null;
  return (
    <aside className={`${card} p-4 text-body`} aria-labelledby="facts">
      <h2 id="facts" className="mb-2 text-lead font-semibold">
        Outlook
      </h2>
      <dl className="divide-y divide-basalt-100">
        <Row term="Age">
          {formatAge(l.ageDays)}{' '}
          <span className="text-caption text-basalt-500">({l.hoursPerDay} h a day)</span>
        </Row>
        <Row term="First switched on">{formatDay(l.firstUsedOn)}</Row>
        <Row term="Output left (fitted)">
          {l.status === 'heat-only' ? '—' : `${Math.round(l.remainingFraction * 100)} %`}
        </Row>
        {l.nowAt30 !== null && <Row term="Today at 30 cm">{formatValue(l.nowAt30, l.unit)}</Row>}
        {f.e0 !== null && (
          <Row term="When new, at 30 cm">
            {formatValue(f.e0, l.unit)}
            {f.e0Se ? ` ± ${formatValue(f.e0Se, null)}` : ''}
          </Row>
        )}
        {halfLife !== null && (
          <Row term="Half-life">
            {halfLife.toFixed(1)}
            {halfLifeSe ? ` ± ${halfLifeSe.toFixed(1)}` : ''} months
          </Row>
        )}
        {l.basking && (
          <>
            <Row term={`Basking spot (${formatLengthRounded(l.basking.distanceCm, unit)})`}>
              {formatValue(l.basking.valueNow, l.unit)}
            </Row>
            <Row term="Species' need">{formatValue(l.basking.threshold, l.unit)}</Row>
          </>
        )}
        <Row term="Below the need">
          {l.fallsBelowOn
            ? `${formatDay(l.fallsBelowOn)}${l.fallsBelowEarliestOn && l.fallsBelowEarliestOn < l.fallsBelowOn ? ` (as early as ${formatDay(l.fallsBelowEarliestOn)})` : ''}`
            : l.basking
              ? 'not within 5 years'
              : '—'}
        </Row>
        {l.status !== 'heat-only' && l.status !== 'retired' && l.burnIn && (
          <Row term="Baseline reading">
            {l.burnIn.baselineTaken ? (
              'taken'
            ) : (
              <>
                {l.burnIn.inBurnIn ? 'due ' : 'due since '}
                {formatDay(l.burnIn.baselineOn)}
                <span className="block text-caption text-basalt-500">
                  after {BURN_IN_HOURS} hours of burn-in
                </span>
              </>
            )}
          </Row>
        )}
        <Row term="Next test">{formatDay(l.testDueOn)}</Row>
        <Row term="Replace by">
          {formatDay(l.replaceDueOn)}
          {l.replaceBasis === 'typical interval' && (
            <span className="block text-caption text-basalt-500">usual life of the type</span>
          )}
        </Row>
      </dl>
      <div className="mt-3 space-y-1 text-caption text-basalt-600">
        <p>
          <strong className="font-semibold text-basalt-800">Fit:</strong> {f.note}
          {f.certainty === 'fitted' &&
            f.rmsLog !== null &&
            ` Readings scatter about ${Math.round(f.rmsLog * 100)} % around the curve.`}
        </p>
        {l.reasons.map((r) => (
          <p key={r}>{readableDays(r)}</p>
        ))}
        {l.ageing && <p data-testid="ageing-source">{l.ageing}</p>}
        {(l.readingNotes ?? []).map((r) => (
          <p key={r} data-testid="reading-note">
            {r}
          </p>
        ))}
        {l.missing.length > 0 && l.status !== 'retired' && l.status !== 'heat-only' && (
          <p>
            <strong className="font-semibold text-basalt-800">To date the basking zone, add:</strong>{' '}
            {l.missing.join('; ')}.
          </p>
        )}
        {l.basking && (
          <p>
            Basking value: every reading is first brought to the bare lamp at 30 cm (taking out what was
            between lamp and meter), then the fitted output is brought to the basking distance
            {l.basking.transmission < 1
              ? ` and through what lets ${Math.round(l.basking.transmission * 100)} % pass, once`
              : ''}
            . Need: {l.basking.needLabel}.
          </p>
        )}
        {l.basking?.judgedBy && (
          <p data-testid="judged-by">
            <strong className="font-semibold text-basalt-800">Judged by:</strong> {l.basking.judgedBy}.
          </p>
        )}
        {l.basking?.ruleOfThumb && <p>{l.basking.ruleOfThumb}</p>}
        {l.basking?.cautions?.map((c) => (
          <p key={c}>{c}</p>
        ))}
        {l.photoperiod && (
          <p data-testid="photoperiod">
            <strong className="font-semibold text-basalt-800">Hours a day:</strong> {l.photoperiod}
          </p>
        )}
        <p>
          Estimates: verify with a meter at the basking spot. Switch lamps off and let them cool before
          handling.
        </p>
      </div>
    </aside>
  );
}
