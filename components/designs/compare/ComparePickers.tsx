'use client';

import type { FieldName } from '@/simulation';
import { MONTH_CHOICES, type CompareParams } from '@/shared/designs/compare-params';
import type { SpeciesOption } from '@/lib/variants/species';
import type { VariantOption } from '@/lib/variants/visible';
import { btn, input } from '../styles';

const FIELDS: { id: FieldName; label: string }[] = [
  { id: 'uvi', label: 'UV Index' },
  { id: 'uvb', label: 'UVB' },
  { id: 'tempC', label: 'Temperature' },
];

function VariantSelect({
  label,
  value,
  options,
  onChange,
}: {
  label: string;
  value?: number;
  options: VariantOption[];
  onChange: (id: number | undefined) => void;
}) {
  // Grouped by enclosure and design, in the order the server sorted them.
  const groups = new Map<string, VariantOption[]>();
  for (const o of options) {
    const key = `${o.enclosureName} · ${o.designName}`;
    groups.set(key, [...(groups.get(key) ?? []), o]);
  }
  return (
    <label className="flex min-w-0 flex-1 flex-col gap-1 text-caption font-medium text-basalt-700">
      {label}
      <select
        className={`${input} w-full`}
        value={value ?? ''}
        onChange={(e) => onChange(e.target.value ? Number(e.target.value) : undefined)}
      >
        <option value="">Choose a variant…</option>
        {[...groups].map(([group, items]) => (
          <optgroup key={group} label={group}>
            {items.map((o) => (
              <option key={o.id} value={o.id}>
                {o.name}
              </option>
            ))}
          </optgroup>
        ))}
      </select>
    </label>
  );
}

/** The choices of the compare page; every change goes into the URL. */
export function ComparePickers({
  params,
  options,
  species,
  suggestedSpeciesId,
  shownSpeciesId,
  onChange,
}: {
  params: CompareParams;
  options: VariantOption[];
  species: SpeciesOption[];
  suggestedSpeciesId: number | null;
  /** The species assessed against: the URL's choice, else variant A's enclosure's. */
  shownSpeciesId: number | null;
  onChange: (next: CompareParams) => void;
}) {
  const set = (patch: Partial<CompareParams>) => onChange({ ...params, ...patch });
  const suggested = species.find((s) => s.id === suggestedSpeciesId);
  return (
    <div className="space-y-3 rounded-lg border border-basalt-200 bg-white p-4">
      <div className="flex flex-wrap items-end gap-3">
        <VariantSelect label="Variant A" value={params.a} options={options} onChange={(a) => set({ a })} />
        <button
          type="button"
          className={btn.small}
          onClick={() => set({ a: params.b, b: params.a })}
          aria-label="Swap A and B"
          title="Swap A and B"
        >
          ⇄ Swap
        </button>
        <VariantSelect label="Variant B" value={params.b} options={options} onChange={(b) => set({ b })} />
      </div>
      <div className="flex flex-wrap items-center gap-4">
        <div
          role="radiogroup"
          aria-label="Field"
          className="inline-flex overflow-hidden rounded-md border border-basalt-300"
        >
          {FIELDS.map((f) => (
            <button
              key={f.id}
              type="button"
              role="radio"
              aria-checked={params.field === f.id}
              className={`px-3 py-1.5 text-body ${
                params.field === f.id
                  ? 'bg-basalt-800 text-white'
                  : 'bg-white text-basalt-700 hover:bg-basalt-50'
              }`}
              onClick={() => set({ field: f.id })}
            >
              {f.label}
            </button>
          ))}
        </div>
        <label className="flex items-center gap-2 text-body text-basalt-700">
          Lamp age
          <select
            className={input}
            value={params.months}
            onChange={(e) => set({ months: Number(e.target.value) })}
          >
            {[...new Set<number>([...MONTH_CHOICES, params.months])]
              .sort((x, y) => x - y)
              .map((m) => (
                <option key={m} value={m}>
                  {m === 0 ? 'as installed' : `+${m} months`}
                </option>
              ))}
          </select>
        </label>
        {/* The species list's longest choice would widen the select past a phone's card: it shrinks. */}
        <label className="flex min-w-0 max-w-full items-center gap-2 text-body text-basalt-700">
          Species
          <select
            className={`${input} min-w-0 max-w-full`}
            value={shownSpeciesId ?? ''}
            // "None" is written as species=none: an absent species means the enclosure's own.
            onChange={(e) => set({ species: e.target.value ? Number(e.target.value) : 'none' })}
          >
            <option value="">None (fields and differences only)</option>
            {species.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </label>
        {params.species === undefined && shownSpeciesId !== null && (
          <span className="text-caption text-basalt-500">from variant A’s enclosure</span>
        )}
        {suggested && shownSpeciesId !== suggested.id && (
          <button type="button" className={btn.small} onClick={() => set({ species: suggested.id })}>
            Use {suggested.name} (the enclosure’s species)
          </button>
        )}
      </div>
    </div>
  );
}
