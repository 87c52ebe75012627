'use client';

import { useRef, useState, type FormEvent } from 'react';
import { fieldError } from '@/components/ui/api-client';
import { Field } from '@/components/ui/Field';
import { useViewerZone } from '@/components/ui/LocalTime';
import { Notice } from '@/components/ui/Notice';
import { Select } from '@/components/ui/Select';
import { button } from '@/components/ui/styles';
import { useLengthUnit } from '@/components/ui/units';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { dayInZone } from '@/lib/time/format';
import { type DesignLampOption, DesignLampSelect } from './DesignLampSelect';
import { LampUseFields } from './LampUseFields';
import { shareInput } from '@/components/ui/share-input';

export type LampTypeOption = { id: number; name: string; tech: string; uvbAt30: number };

/** Logs a lamp installed in this enclosure. */
export function AddLampForm({
  enclosureId,
  lampTypes,
  designLamps,
}: {
  enclosureId: number;
  lampTypes: LampTypeOption[];
  designLamps: DesignLampOption[];
}) {
  const [unit] = useLengthUnit();
  const formRef = useRef<HTMLFormElement>(null);
  // The viewer's today, not the server's: a lamp switched on this evening in New York is not tomorrow's.
  const today = dayInZone(new Date(), useViewerZone());
  const [between, setBetween] = useState('none');
  const add = useApiMutation(
    (body: Record<string, unknown>) => ({
      method: 'POST',
      url: `/api/enclosures/${enclosureId}/lamps`,
      body,
    }),
    {
      onSuccess: () => {
        formRef.current?.reset();
        setBetween('none');
      },
    },
  );
  const error = add.error && fieldError(add.error);
  const busy = add.isPending;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const text = (k: string) => String(form.get(k) ?? '').trim();
    const num = (k: string) => (text(k) === '' ? undefined : Number(text(k)));
    add.mutate({
      lampTypeId: num('lampTypeId'),
      label: text('label'),
      firstUsedOn: text('firstUsedOn'),
      hoursPerDay: num('hoursPerDay'),
      baskingDistance: num('baskingDistance') ?? null,
      baskingTransmission:
        between === 'none' ? null : between === 'custom' ? num('customTransmission') : Number(between),
      designObjectId: text('designObjectId') || null,
      lengthUnit: unit,
    });
  }

  const err = (f: string) => (error?.field === f ? error.message : null);
  return (
    <form ref={formRef} onSubmit={submit} className="space-y-3" aria-label="Add a lamp" noValidate>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Name" name="label" placeholder="e.g. Basking tube" required error={err('label')} />
        <Select label="Lamp type" name="lampTypeId" required error={err('lampTypeId')} defaultValue="">
          <option value="" disabled>
            Choose from the lamp catalogue…
          </option>
          {lampTypes.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name}
              {t.uvbAt30 > 0 ? '' : ' (no UV)'}
            </option>
          ))}
        </Select>
        <LampUseFields firstUsedOn={today} hoursPerDay="12" today={today} error={err} />
        <Field
          label={`Lamp to basking spot (${unit})`}
          name="baskingDistance"
          type="number"
          step="any"
          min="0"
          hint="Leave empty to use the distance of the latest reading."
          error={err('baskingDistance')}
        />
        <Select
          label="Between lamp and basking spot"
          name="between"
          value={between}
          onChange={(e) => setBetween(e.target.value)}
          error={err('baskingTransmission')}
        >
          <option value="none">Nothing (lamp inside, no mesh)</option>
          <option value="0.6">Fine mesh lid (passes about 60 %)</option>
          <option value="0.5">Dense mesh lid (passes about 50 %)</option>
          <option value="custom">Other — I know the share…</option>
        </Select>
        {between === 'custom' && (
          <Field
            label="Share of UVB passing (0–1)"
            name="customTransmission"
            {...shareInput}
            required
            error={err('baskingTransmission')}
          />
        )}
        <DesignLampSelect
          label="Lamp in the design (for calibration)"
          designLamps={designLamps}
          linked={null}
          error={err('designObjectId')}
        />
      </div>
      <p className="text-caption text-basalt-500">
        Mesh shares are typical open areas of woven mesh (ISO 9044); screens can cut UVB by as much as half.
        To know your own lid&apos;s share, take two readings at the same distance, one through the lid and one
        without, and divide; each reading then says what was between lamp and meter, so the lid is counted
        once.
      </p>
      {error && <Notice tone="error">{error.message}</Notice>}
      <button type="submit" className={button.primary} disabled={busy || lampTypes.length === 0}>
        {busy ? 'Adding…' : 'Add lamp'}
      </button>
    </form>
  );
}
