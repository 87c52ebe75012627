'use client';
// The species check: choose a sheet, read the findings (pass / attention / fail with the numbers),
// click one to see where it applies, and the cautions that always go with the figures.
import { FINDING_STATUS, worstFirst } from '@/shared/finding-status';
import Link from '@/components/ui/Link';
import { controlSummary } from '@/simulation';
import type { Finding, FindingStatus } from '../fields/engineTypes';
import type { SimView } from '../fields/simTypes';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import type { StudioSpecies } from '../state/types';
import { focusRing } from './CommandButton';
import { findingNumberLines, localiseFindingText, unmetText } from './findingFormat';
import { Section, SelectField } from './FormFields';
import { useUnits } from './useObjectEdit';

export const AGEING_HORIZON_MONTHS = 24;

// The words and marks are the same everywhere (shared/finding-status.ts); the colours are the app's.
const STATUS: Record<FindingStatus, { mark: string; text: string; cls: string }> = {
  pass: { ...words('pass'), cls: 'bg-moss-100 text-moss-800 border-moss-300' },
  attention: { ...words('attention'), cls: 'bg-sand-100 text-sand-900 border-sand-300' },
  fail: { ...words('fail'), cls: 'bg-ember-100 text-ember-800 border-ember-300' },
};
function words(status: FindingStatus) {
  return { mark: FINDING_STATUS[status].mark, text: FINDING_STATUS[status].word };
}

export function StatusBadge({ status }: { status: FindingStatus }) {
  const s = STATUS[status];
  return (
    <span
      className={`inline-flex shrink-0 items-center gap-1 rounded border px-1.5 text-caption font-semibold ${s.cls}`}
    >
      <span aria-hidden="true">{s.mark}</span>
      {s.text}
    </span>
  );
}

function FindingItem({ f }: { f: Finding }) {
  const { store } = useCommandContext();
  const highlight = useStudio(store, (s) => s.session.highlight);
  const units = useUnits();
  const on = highlight === f.id;
  const numbers = findingNumberLines(f.id, f.numbers, units);
  const body = (
    <>
      <span className="flex items-start justify-between gap-2">
        <span className="font-medium text-basalt-900">{f.title}</span>
        <StatusBadge status={f.status} />
      </span>
      <span className="mt-0.5 block text-sm text-basalt-700" data-testid="finding-message">
        {localiseFindingText(f.message, units)}
      </span>
      {numbers.length > 0 && (
        <span className="mt-1 grid grid-cols-[auto_auto] justify-start gap-x-3 text-caption tabular-nums text-basalt-600">
          {numbers.map((n) => (
            <span key={n.label} className="contents">
              <span>{n.label}</span>
              <span className="text-basalt-800">{n.value}</span>
            </span>
          ))}
        </span>
      )}
      {f.where && (
        <span className="mt-1 block text-caption text-sky-700">
          {on ? 'Shown on the canvas' : 'Show where'}
        </span>
      )}
    </>
  );
  return (
    <li data-testid={`finding-${f.id}`} data-status={f.status}>
      {f.where ? (
        <button
          type="button"
          aria-pressed={on}
          onClick={() => store.setSession({ highlight: on ? null : f.id })}
          className={`block w-full rounded-md border px-2 py-2 text-left ${on ? 'border-sand-500 bg-sand-50' : 'border-basalt-200 bg-white hover:bg-basalt-50'} ${focusRing}`}
        >
          {body}
        </button>
      ) : (
        <div className="rounded-md border border-basalt-200 bg-white px-2 py-2">{body}</div>
      )}
    </li>
  );
}

export function Cautions() {
  return (
    <Section title="Cautions">
      <ul className="list-disc space-y-1 pl-4 text-caption text-basalt-700" data-testid="cautions">
        <li>
          UV lamps can damage eyes and skin — of the animal and of people. Never look into a lamp; keep the
          basking spot within the species’ range and give shade with no UV.
        </li>
        <li>
          Lamps and heaters within reach can burn: guard them so the animal cannot touch the lamp or its
          fitting.
        </li>
        <li>
          Heat lamps can start fires: keep them clear of wood, plants and fabric, use fittings rated for the
          lamp, and follow local electrical and fire codes.
        </li>
        <li>
          Control each lamp the way its type allows — {controlSummary()} Check thermostats daily with a
          thermometer.
        </li>
        <li>
          All figures are estimates from a model: verify with a UV meter and a thermometer in the enclosure,
          and defer to a reptile-experienced vet.
        </li>
      </ul>
    </Section>
  );
}

export function AssessmentPanel({ sim, species }: { sim: SimView; species: StudioSpecies[] }) {
  const { store } = useCommandContext();
  const speciesId = useStudio(store, (s) => s.session.speciesId);
  const addMonths = useStudio(store, (s) => s.session.addMonths);
  const sheet = species.find((s) => s.id === speciesId) ?? null;
  const a = sim.assessment;
  return (
    <div data-testid="assessment-panel">
      <Section title="Species">
        {species.length === 0 ? (
          <div
            className="rounded-md border border-dashed border-basalt-300 bg-basalt-50 p-3 text-sm text-basalt-700"
            data-testid="species-empty"
          >
            <p className="font-medium">No species sheets yet — add one in Species.</p>
            <p className="mt-1 text-caption">
              A species sheet holds the UV zone and temperature ranges the design is checked against.{' '}
              <Link href="/species" className={`text-sky-700 underline ${focusRing}`}>
                Open Species
              </Link>
            </p>
          </div>
        ) : (
          <SelectField
            label="Check against"
            testId="species-select"
            value={speciesId ?? ''}
            options={[
              { value: '', label: 'Choose a species sheet…' },
              ...species.map((s) => ({ value: s.id, label: s.name })),
            ]}
            onChange={(id) => store.setSession({ speciesId: id || null, highlight: null })}
          />
        )}
      </Section>
      {sheet && (
        <Section title="Findings" actions={a ? <StatusBadge status={a.overall} /> : undefined}>
          {addMonths > 0 && (
            <p className="rounded bg-sand-50 px-2 py-1 text-caption text-sand-900">
              With lamps {addMonths} month{addMonths === 1 ? '' : 's'} older than set.
            </p>
          )}
          {!a ? (
            <p className="text-sm text-basalt-600" role="status">
              {sim.status === 'error' ? `The check failed: ${sim.error ?? 'unknown error'}` : 'Checking…'}
            </p>
          ) : (
            <ul className="flex flex-col gap-1.5" aria-label="Findings">
              {worstFirst(a.findings).map((f) => (
                <FindingItem key={f.id} f={f} />
              ))}
            </ul>
          )}
          <p className="text-sm text-basalt-800" data-testid="months-until-unmet">
            {unmetText(sim.monthsUntilUnmet, AGEING_HORIZON_MONTHS)}
          </p>
        </Section>
      )}
      {!sheet && a && (
        <Section title="Safety checks" actions={<StatusBadge status={a.overall} />}>
          <p className="text-caption text-basalt-600">
            No species chosen: lamps within reach, UV near the eyes and surfaces too hot to touch are checked
            against general limits. Choose a sheet for the full check.
          </p>
          <ul className="flex flex-col gap-1.5" aria-label="Safety findings">
            {worstFirst(a.findings).map((f) => (
              <FindingItem key={f.id} f={f} />
            ))}
          </ul>
        </Section>
      )}
      <Cautions />
    </div>
  );
}
