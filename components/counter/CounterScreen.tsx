'use client';

import { useEffect, useRef, useState, type FormEvent } from 'react';
import {
  DistanceBelowLampField,
  MeterKindSelect,
  MeterValueField,
  ReadingSetupFields,
} from '@/components/lamp-log/ReadingSetupFields';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { Select } from '@/components/ui/Select';
import { UnitToggle } from '@/components/ui/UnitToggle';
import { button, card } from '@/components/ui/styles';
import { useLengthUnit } from '@/components/ui/units';
import { useApiMutation } from '@/components/ui/useApiMutation';
import type { CounterAnswerDto } from '@/lib/counter/queries';
import { WARM_UP_MINUTES } from '@/shared/reading-setup';
import { CustomerPicker, type Who } from './CustomerPicker';
import { KeeperLampChoice } from './KeeperLampChoice';
import { SavedTestNotice, type SavedTest } from './SavedTest';
import { VerdictCard } from './VerdictCard';
import { shareInput } from '@/components/ui/share-input';

export type CounterOptions = {
  organisationId: number;
  lampTypes: { id: number; name: string }[];
  species: { id: number; name: string }[];
  /**
   * Testing a known lamp: a counter lamp kept before, or a lamp in the enclosure of a keeper linked to a
   * customer (its reading goes to the lamp log). Its type and age are known.
   */
  kept: {
    kind: 'counter' | 'enclosure';
    id: number;
    name: string;
    customerId: number | null;
    customerName: string | null;
  } | null;
  /** Opened from a customer's page. */
  customer: { id: number; name: string } | null;
};

type Answer = CounterAnswerDto;
/** The numbers of a form field, or undefined when empty. */
const num = (form: FormData, k: string) => {
  const v = String(form.get(k) ?? '').trim();
  return v === '' ? undefined : Number(v);
};

/**
 * The counter test on one screen, made for one hand on a phone: who, which lamp and how old, how it was
 * measured and the reading; the answer appears as soon as those are in, and is asked again whenever a
 * field changes. Saving keeps the lamp and the reading under the customer (or anonymous, for a walk-in).
 */
export function CounterScreen({ options }: { options: CounterOptions }) {
  const [unit] = useLengthUnit();
  const formRef = useRef<HTMLFormElement>(null);
  const [who, setWho] = useState<Who>(
    options.customer
      ? { kind: 'existing', id: options.customer.id, name: options.customer.name }
      : { kind: 'walk-in' },
  );
  const [through, setThrough] = useState('');
  const [ageBy, setAgeBy] = useState<'months' | 'date'>('months');
  // What the form refuses before sending (nothing to save yet); the rest comes from the two mutations.
  const [refused, setRefused] = useState<string | null>(null);
  // The answer while the form is filled in: asked again on every change, writes nothing, so the page's
  // server parts need no refresh. The mutation's state follows its latest call, so a slow answer to an
  // older form never overwrites a newer one.
  const assess = useApiMutation<Record<string, unknown>, { answer: Answer }>(
    (b) => ({ method: 'POST', url: '/api/counter/assess', body: b }),
    { refresh: false },
  );
  const save = useApiMutation<Record<string, unknown>, SavedTest & { answer: Answer }>((b) => ({
    method: 'POST',
    url: '/api/counter/tests',
    body: b,
  }));
  const saved = save.data ?? null;
  const answer = save.data?.answer ?? assess.data?.answer ?? null;
  const asking = assess.isPending;
  // A saved test shows no older complaint; a refused save shows its own until the form changes.
  const failure = save.isSuccess ? null : (save.error ?? assess.error ?? null);
  const error = refused
    ? { message: refused }
    : failure
      ? { field: failure.field ?? undefined, message: failure.message }
      : null;
  // A lamp of the linked keeper's enclosures chosen for an existing customer.
  const [keeperLampId, setKeeperLampId] = useState<number | null>(null);
  const enclosureLampId =
    options.kept?.kind === 'enclosure' ? options.kept.id : options.kept ? null : keeperLampId;
  const known = Boolean(options.kept || enclosureLampId);
  const [changed, setChanged] = useState(0);

  /** The request body from the form, or null while something the answer needs is missing. */
  function body(): Record<string, unknown> | null {
    const form = new FormData(formRef.current!);
    const value = num(form, 'value');
    const distance = num(form, 'distance');
    const warmedUp = String(form.get('warmedUp') ?? '');
    if (value === undefined || distance === undefined || !through || !warmedUp) return null;
    const home = {
      hoursPerDay: num(form, 'hoursPerDay') ?? 12,
      speciesSheetId: num(form, 'speciesSheetId') ?? null,
      baskingDistance: num(form, 'baskingDistance') ?? null,
      baskingTransmission: num(form, 'baskingTransmission') ?? null,
      lengthUnit: unit,
    };
    let lamp: Record<string, unknown> | null = null;
    if (!known) {
      const lampTypeId = num(form, 'lampTypeId');
      const months = num(form, 'ageMonths');
      const date = String(form.get('firstUsedOn') ?? '');
      if (!lampTypeId || (ageBy === 'months' ? months === undefined : !date)) return null;
      lamp = {
        lampTypeId,
        ...(ageBy === 'months' ? { ageMonths: months } : { firstUsedOn: date }),
        ...home,
        label: String(form.get('label') ?? '').trim() || null,
      };
    }
    return {
      organisationId: options.organisationId,
      ...(options.kept?.kind === 'counter' ? { counterLampId: options.kept.id } : {}),
      ...(enclosureLampId ? { enclosureLampId } : {}),
      lamp,
      reading: {
        distance,
        distanceUnit: unit,
        value,
        unit: String(form.get('unit') ?? 'uvb'),
        through,
        throughTransmission: ['lid', 'screen', 'glass'].includes(through)
          ? (num(form, 'throughTransmission') ?? null)
          : null,
        warmedUp,
        meter: String(form.get('meter') ?? '').trim() || null,
      },
    };
  }

  // Ask for the answer a moment after the last change, so typing a number does not send every digit.
  useEffect(() => {
    if (changed === 0) return;
    const b = body();
    const timer = setTimeout(() => {
      setRefused(null);
      if (b) assess.mutate(b);
      else assess.reset();
    }, 250);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the form is read when it changes
  }, [changed, through, ageBy, unit, enclosureLampId]);

  function submit(e: FormEvent) {
    e.preventDefault();
    const b = body();
    if (!b) return setRefused('Fill in the lamp and the reading first.');
    const form = new FormData(formRef.current!);
    const customer =
      who.kind === 'new'
        ? {
            kind: 'new',
            name: String(form.get('customerName') ?? '').trim(),
            email: String(form.get('customerEmail') ?? '').trim() || null,
            phone: String(form.get('customerPhone') ?? '').trim() || null,
            reminderConsent: form.get('customerConsent') === 'on',
          }
        : who.kind === 'existing'
          ? { kind: 'existing', id: who.id }
          : options.kept?.kind === 'enclosure' && options.kept.customerId
            ? { kind: 'existing', id: options.kept.customerId }
            : { kind: 'walk-in' };
    setRefused(null);
    save.mutate({ ...b, customer });
  }

  // The server names a field by its path in the request (`reading.value`, `customer.email`).
  const err = (f: string) =>
    error?.field && ['', 'reading.', 'lamp.', 'customer.'].some((p) => error.field === `${p}${f}`)
      ? error.message
      : null;
  const touch = () => {
    if (save.isError) save.reset();
    setChanged((n) => n + 1);
  };

  return (
    <form
      ref={formRef}
      onSubmit={submit}
      onInput={touch}
      onChange={touch}
      aria-label="Counter test"
      noValidate
      className="mx-auto max-w-xl space-y-5"
    >
      <section className={`${card} space-y-3 p-4`} aria-label="Who">
        {options.kept?.kind === 'enclosure' ? (
          <p className="text-body">
            Testing <strong>{options.kept.name}</strong> of {options.kept.customerName}, as the lamp log has
            it. The reading is added to that lamp; its earlier readings give it its own decay.
          </p>
        ) : options.kept ? (
          <p className="text-body">
            Testing again: <strong>{options.kept.name}</strong>
            {options.kept.customerName ? ` of ${options.kept.customerName}` : ' (kept without a name)'}. Its
            earlier readings give it its own decay.
          </p>
        ) : (
          <>
            <CustomerPicker
              organisationId={options.organisationId}
              who={who}
              onWho={(next) => {
                setKeeperLampId(null);
                setWho(next);
              }}
            />
            {who.kind === 'existing' && (
              <KeeperLampChoice customerId={who.id} chosen={keeperLampId} onChoose={setKeeperLampId} />
            )}
          </>
        )}
      </section>

      {!known && (
        <section className={`${card} space-y-3 p-4`} aria-label="The lamp">
          <Select label="Lamp type" name="lampTypeId" defaultValue="" required error={err('lampTypeId')}>
            <option value="" disabled>
              Choose from the catalogue…
            </option>
            {options.lampTypes.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </Select>
          <fieldset>
            <legend className="mb-1 text-body font-medium text-basalt-800">Age</legend>
            <div className="mb-2 flex gap-2" role="radiogroup" aria-label="Give the age as">
              {(['months', 'date'] as const).map((k) => (
                <button
                  key={k}
                  type="button"
                  role="radio"
                  aria-checked={ageBy === k}
                  onClick={() => setAgeBy(k)}
                  className={`${ageBy === k ? button.primary : button.secondary} min-h-11 flex-1`}
                >
                  {k === 'months' ? 'Months in use' : 'First switch-on date'}
                </button>
              ))}
            </div>
            {ageBy === 'months' ? (
              <Field
                label="Months in use"
                name="ageMonths"
                type="number"
                inputMode="decimal"
                step="any"
                min="0"
                required
                error={err('ageMonths')}
              />
            ) : (
              <Field
                label="First switched on"
                name="firstUsedOn"
                type="date"
                required
                error={err('firstUsedOn')}
              />
            )}
          </fieldset>
          <Field
            label="Hours a day it is on"
            name="hoursPerDay"
            type="number"
            inputMode="decimal"
            step="any"
            min="0.5"
            max="24"
            defaultValue={12}
            error={err('hoursPerDay')}
          />
        </section>
      )}

      <section className={`${card} space-y-3 p-4`} aria-label="The reading">
        <div className="flex items-center justify-between gap-2">
          <h2 className="text-lead font-semibold text-basalt-900">The reading</h2>
          <UnitToggle quantity="length" />
        </div>
        <DistanceBelowLampField key={unit} unit={unit} defaultValue={unit === 'cm' ? 30 : 12} error={err} />
        <MeterKindSelect error={err} />
        <ReadingSetupFields
          through={through}
          onThrough={setThrough}
          shareDefault=""
          lidShare={null}
          warmedUpDefault=""
          error={err}
          lidHint="The share of UVB the customer's lid passes, if it was measured through it."
        />
        <MeterValueField error={err} />
        <Field
          label="Meter (optional)"
          name="meter"
          placeholder="Which meter, in your words"
          error={err('meter')}
        />
        <p className="text-caption text-basalt-500">
          Switch the lamp on at least {WARM_UP_MINUTES} minutes before measuring; the bare lamp straight below
          is the most direct reading.
        </p>
      </section>

      {!known && (
        <details className={`${card} p-4`}>
          <summary className="min-h-11 cursor-pointer text-body font-medium text-basalt-900">
            At home (optional): species and basking distance
          </summary>
          <div className="mt-3 space-y-3">
            <Select label="Species" name="speciesSheetId" defaultValue="" error={err('speciesSheetId')}>
              <option value="">Not given</option>
              {options.species.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
            </Select>
            <Field
              label={`Basking distance at home (${unit})`}
              name="baskingDistance"
              type="number"
              inputMode="decimal"
              step="any"
              min="0"
              hint="From the lamp down to where the animal basks."
              error={err('baskingDistance')}
            />
            <Field
              label="Share of UVB the lid or mesh at home passes (0–1)"
              name="baskingTransmission"
              {...shareInput}
              hint="Leave empty when nothing lies between lamp and basking spot."
              error={err('baskingTransmission')}
            />
          </div>
        </details>
      )}

      <div aria-live="polite">
        {answer ? (
          <VerdictCard answer={answer} unit={unit} busy={asking} />
        ) : (
          <p className="rounded-md border border-dashed border-basalt-300 px-4 py-3 text-body text-basalt-600">
            {asking
              ? 'Working it out…'
              : 'The answer appears here once the lamp type, its age, the set-up and the meter value are in.'}
          </p>
        )}
      </div>
      {error && <Notice tone="error">{error.message}</Notice>}

      {saved ? (
        <SavedTestNotice saved={saved} />
      ) : (
        <section className={`${card} space-y-3 p-4`} aria-label="Save">
          {!known && who.kind === 'new' && (
            <div className="space-y-3">
              <Field
                label="Customer’s name"
                name="customerName"
                autoComplete="off"
                required
                error={err('name')}
              />
              <Field
                label="E-mail (optional)"
                name="customerEmail"
                type="email"
                inputMode="email"
                error={err('email')}
              />
              <Field
                label="Phone (optional)"
                name="customerPhone"
                type="tel"
                inputMode="tel"
                error={err('phone')}
              />
              <label className="flex items-start gap-2 text-body text-basalt-800">
                <input type="checkbox" name="customerConsent" className="mt-1 h-5 w-5" />
                <span>The customer agrees to reminder e-mails about re-testing (the date is recorded).</span>
              </label>
            </div>
          )}
          <button
            type="submit"
            className={`${button.primary} min-h-12 w-full`}
            disabled={save.isPending || !answer}
          >
            {save.isPending
              ? 'Saving…'
              : enclosureLampId
                ? 'Add this reading to the lamp log'
                : options.kept
                  ? 'Save this reading'
                  : who.kind === 'new'
                    ? 'Save for the new customer'
                    : who.kind === 'existing'
                      ? `Save for ${who.name}`
                      : 'Save without a name (walk-in)'}
          </button>
        </section>
      )}
    </form>
  );
}
