'use client';

import { useQuery } from '@tanstack/react-query';
import Link from '@/components/ui/Link';
import { useState } from 'react';
import type { DesignSummary, VariantSummary } from '@/lib/variants/queries';
import { designsApi } from './api';
import { ChangedAgo } from './ChangedAgo';
import { compareHref, studioHref } from './list-helpers';
import { QueryProvider } from '@/components/ui/QueryProvider';
import { ShareLinks } from './ShareLinks';
import { btn, input } from './styles';
import { UploadVariant } from './UploadVariant';

const FIELDS = [
  { id: 'uvi', label: 'UV Index' },
  { id: 'uvb', label: 'UVB' },
  { id: 'tempC', label: 'Temperature' },
] as const;

/** A design's variants with their downloads and share links, and an upload of a design file. */
export function DesignDetail(props: { initial: DesignSummary; canEdit: boolean }) {
  return (
    <QueryProvider>
      <DesignDetailInner {...props} />
    </QueryProvider>
  );
}

function DesignDetailInner({ initial, canEdit }: { initial: DesignSummary; canEdit: boolean }) {
  const q = useQuery({
    queryKey: ['design', initial.id],
    queryFn: async () => (await designsApi.get(initial.id)).design,
    initialData: initial,
  });
  const design = q.data;
  return (
    <div className="space-y-6">
      {q.isError && (
        <p
          role="alert"
          className="rounded-md border border-ember-200 bg-ember-50 px-3 py-2 text-body text-ember-800"
        >
          The latest state could not be loaded: {q.error.message}
        </p>
      )}
      <ul className="space-y-4">
        {design.variants.map((v) => (
          <VariantPanel
            key={v.id}
            variant={v}
            others={design.variants.filter((o) => o.id !== v.id)}
            canShare={canEdit}
          />
        ))}
      </ul>
      {canEdit && (
        <section
          aria-labelledby="upload-heading"
          className="rounded-lg border border-basalt-200 bg-white p-4"
        >
          <h2 id="upload-heading" className="mb-2 text-lead font-semibold text-basalt-900">
            Upload a design file
          </h2>
          <p className="mb-3 text-body text-basalt-600">
            A design file downloaded from Baskwell (any version) becomes a new variant of this design. It is
            checked before it is saved; nothing is changed if it is refused.
          </p>
          <UploadVariant designId={design.id} />
        </section>
      )}
    </div>
  );
}

function VariantPanel({
  variant: v,
  others,
  canShare,
}: {
  variant: VariantSummary;
  others: VariantSummary[];
  canShare: boolean;
}) {
  const [field, setField] = useState<(typeof FIELDS)[number]['id']>('uvi');
  const exportHref = (format: string) => `/api/variants/${v.id}/export?format=${format}&field=${field}`;
  return (
    <li className="rounded-lg border border-basalt-200 bg-white p-4 shadow-sm" data-testid="variant-panel">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-lead font-semibold text-basalt-900">{v.name}</h2>
        <span className="text-caption text-basalt-500">
          version {v.version} · changed <ChangedAgo iso={v.updatedAt} />
        </span>
      </div>
      <div className="mt-3 flex flex-wrap items-center gap-2">
        <Link className={btn.secondary} href={studioHref(v.id)}>
          Open in studio
        </Link>
        {others[0] && (
          <Link className={btn.secondary} href={compareHref(v.id, others[0].id)}>
            Compare with {others[0].name}
          </Link>
        )}
      </div>
      <div className="mt-4 grid gap-4 md:grid-cols-2">
        <section aria-label={`Downloads of ${v.name}`}>
          <h3 className="mb-2 text-body font-semibold text-basalt-800">Download</h3>
          <div className="flex flex-wrap items-center gap-2">
            <a className={btn.small} href={exportHref('json')} download>
              Design file (JSON)
            </a>
            <label className="flex items-center gap-1 text-caption text-basalt-600">
              Field
              <select
                className={input}
                value={field}
                onChange={(e) => setField(e.target.value as typeof field)}
                aria-label={`Field for the picture and report of ${v.name}`}
              >
                {FIELDS.map((f) => (
                  <option key={f.id} value={f.id}>
                    {f.label}
                  </option>
                ))}
              </select>
            </label>
            <a className={btn.small} href={exportHref('png')} download>
              Picture (PNG)
            </a>
            <a className={btn.small} href={exportHref('pdf')} download>
              Report (PDF)
            </a>
          </div>
          <p className="mt-2 text-caption text-basalt-500">
            Reports carry the assessment for the enclosure’s species, the lamp list and the cautions. Every
            figure is an estimate to verify with a meter and thermometer.
          </p>
        </section>
        {canShare && (
          <section aria-label={`Sharing of ${v.name}`}>
            <h3 className="mb-2 text-body font-semibold text-basalt-800">Share read-only</h3>
            <ShareLinks variantId={v.id} variantName={v.name} />
          </section>
        )}
      </div>
    </li>
  );
}
