'use client';

import { Field } from '@/components/ui/Field';
import { button } from '@/components/ui/styles';
import { FIELD_LABELS, SHEET_FIELDS, type SheetField, type SpeciesSource } from '@/lib/species/schema';

/** The sheet's sources: a citation, how sure it is, and which figures it speaks for. */
export function SourcesEditor({
  sources,
  onChange,
  errors,
}: {
  sources: SpeciesSource[];
  onChange: (s: SpeciesSource[]) => void;
  errors: Record<string, string>;
}) {
  const set = (i: number, patch: Partial<SpeciesSource>) =>
    onChange(sources.map((s, k) => (k === i ? { ...s, ...patch } : s)));
  const toggle = (i: number, f: SheetField) => {
    const covers = sources[i]!.covers;
    set(i, { covers: covers.includes(f) ? covers.filter((c) => c !== f) : [...covers, f] });
  };

  return (
    <fieldset className="rounded-lg border border-basalt-200 bg-white p-5 shadow-sm">
      <legend className="px-1 text-lead font-semibold text-basalt-900">Sources</legend>
      <p className="mb-3 text-body text-basalt-600">
        Name where each figure comes from: a published citation, or say plainly “from memory” or “common
        practice, no published source”.
      </p>
      <ol className="space-y-4">
        {sources.map((s, i) => (
          <li key={i} className="rounded-md border border-basalt-200 p-3">
            <div className="grid gap-3 sm:grid-cols-2">
              <Field
                id={`src-${i}-citation`}
                label={`Citation [${i + 1}]`}
                value={s.citation}
                onChange={(e) => set(i, { citation: e.target.value })}
                error={errors[`sources.${i}.citation`]}
              />
              <Field
                id={`src-${i}-confidence`}
                label="Confidence"
                value={s.confidence}
                onChange={(e) => set(i, { confidence: e.target.value })}
                error={errors[`sources.${i}.confidence`]}
              />
            </div>
            <fieldset className="mt-3">
              <legend className="text-caption font-medium text-basalt-700">Figures it speaks for</legend>
              <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
                {SHEET_FIELDS.map((f) => (
                  <label key={f} className="inline-flex items-center gap-1.5 text-caption text-basalt-700">
                    <input type="checkbox" checked={s.covers.includes(f)} onChange={() => toggle(i, f)} />
                    {FIELD_LABELS[f]}
                  </label>
                ))}
              </div>
            </fieldset>
            <button
              type="button"
              className={`${button.quietDanger} mt-2`}
              onClick={() => onChange(sources.filter((_, k) => k !== i))}
            >
              Remove source [{i + 1}]
            </button>
          </li>
        ))}
      </ol>
      <button
        type="button"
        className={`${button.secondary} mt-3`}
        onClick={() => onChange([...sources, { citation: '', confidence: '', covers: [] }])}
      >
        Add a source
      </button>
    </fieldset>
  );
}
