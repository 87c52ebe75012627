'use client';

import { usePathname, useRouter } from 'next/navigation';
import { useEffect, useMemo, useState, useTransition } from 'react';
import Link from '@/components/ui/Link';
import { CautionList } from '@/components/cautions/CautionList';
import { FindingList } from '@/components/cautions/FindingList';
import type { Assessment } from '@/simulation';
import { assessFor } from '@/shared/designs/assessment';
import { compareQuery, type CompareParams } from '@/shared/designs/compare-params';
import { diffDesigns } from '@/shared/designs/diff';
import { hotSpotMarker } from '@/shared/designs/figures';
import { bandsFor, scaleFor, simulate, type Simulated } from '@/shared/designs/simulate';
import type { SpeciesOption } from '@/lib/variants/species';
import type { VariantForPage } from '@/lib/variants/queries';
import type { VariantOption } from '@/lib/variants/visible';
import { FieldLegend, FieldSvg } from '../FieldSvg';
import { studioHref } from '../list-helpers';
import { btn } from '../styles';
import { ComparePickers } from './ComparePickers';
import { DiffTable } from './DiffTable';
import { FiguresTable } from './FiguresTable';

type Side = { sim: Simulated; assessment: Assessment | null };

/**
 * The comparison itself, computed in the browser: both variants' fields on one shared scale, key
 * figures, assessments (when a species is picked) and the table of differences.
 */
export function CompareView({
  params,
  a,
  b,
  missing,
  options,
  species,
  suggestedSpeciesId,
  defaultSpeciesId,
}: {
  params: CompareParams;
  a: VariantForPage | null;
  b: VariantForPage | null;
  missing: { a: boolean; b: boolean };
  options: VariantOption[];
  species: SpeciesOption[];
  suggestedSpeciesId: number | null;
  /** Used when the URL names no species: the species of variant A's enclosure. */
  defaultSpeciesId: number | null;
}) {
  const router = useRouter();
  const pathname = usePathname();
  const [navigating, startNavigation] = useTransition();
  const go = (next: CompareParams) =>
    startNavigation(() => router.replace(`${pathname}?${compareQuery(next)}`, { scroll: false }));

  const speciesId = params.species === undefined ? defaultSpeciesId : params.species;
  const sheet = species.find((s) => s.id === speciesId) ?? null;
  const [sides, setSides] = useState<{ key: string; a: Side | null; b: Side | null; error?: string } | null>(
    null,
  );
  const key = `${a?.id}:${a?.version}:${b?.id}:${b?.version}:${params.months}:${sheet?.id ?? ''}`;

  useEffect(() => {
    let cancelled = false;
    // Let the "computing" state paint before the engine takes the main thread for a moment.
    const t = setTimeout(() => {
      try {
        const run = (v: VariantForPage | null): Side | null => {
          if (!v) return null;
          const sim = simulate(v.design, params.months);
          return { sim, assessment: sheet ? assessFor(v.design, sheet.sheet, params.months) : null };
        };
        const next = { key, a: run(a), b: run(b) };
        if (!cancelled) setSides(next);
      } catch (e) {
        if (!cancelled)
          setSides({ key, a: null, b: null, error: e instanceof Error ? e.message : String(e) });
      }
    }, 30);
    return () => {
      cancelled = true;
      clearTimeout(t);
    };
    // `key` captures every input that changes the result.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);

  const ready = sides?.key === key ? sides : null;
  const sims = [ready?.a?.sim, ready?.b?.sim].filter((s): s is Simulated => Boolean(s));
  const scale = useMemo(() => (sims.length ? scaleFor(params.field, sims) : null), [params.field, ready]); // eslint-disable-line react-hooks/exhaustive-deps
  const diff = useMemo(() => (a && b ? diffDesigns(a.design, b.design) : null), [a, b]);

  return (
    <div className="space-y-6" aria-busy={navigating || !ready}>
      <ComparePickers
        params={params}
        options={options}
        species={species}
        suggestedSpeciesId={suggestedSpeciesId}
        shownSpeciesId={sheet?.id ?? null}
        onChange={go}
      />
      {options.length === 0 && (
        <p className="text-body text-basalt-600">
          There are no variants to compare yet. Create a design on an enclosure’s page first.
        </p>
      )}
      {ready?.error && (
        <p
          role="alert"
          className="rounded-md border border-ember-200 bg-ember-50 px-3 py-2 text-body text-ember-800"
        >
          The fields could not be computed: {ready.error}
        </p>
      )}
      <div className="grid gap-4 lg:grid-cols-2">
        {(['a', 'b'] as const).map((slot) => {
          const v = slot === 'a' ? a : b;
          const side = ready?.[slot] ?? null;
          return (
            <section
              key={slot}
              aria-label={`Variant ${slot.toUpperCase()}`}
              className="space-y-2 rounded-lg border border-basalt-200 bg-white p-4"
              data-testid={`compare-${slot}`}
            >
              {!v ? (
                <p className="py-10 text-center text-body text-basalt-600">
                  {missing[slot]
                    ? 'That variant was not found, or it is not yours to see.'
                    : `Choose variant ${slot.toUpperCase()} above.`}
                </p>
              ) : (
                <>
                  <div className="flex flex-wrap items-baseline justify-between gap-2">
                    <h2 className="text-lead font-semibold text-basalt-900">
                      {slot.toUpperCase()}: {v.name}
                    </h2>
                    <Link className={btn.small} href={studioHref(v.id)}>
                      Open in studio
                    </Link>
                  </div>
                  <p className="text-caption text-basalt-500">
                    {v.enclosure.name} · {v.designName} · version {v.version}
                  </p>
                  {side && scale ? (
                    <FieldSvg
                      design={v.design}
                      bands={bandsFor(side.sim, scale)}
                      scale={scale}
                      title={`${scale.label} of ${v.name}`}
                      markers={hotSpotMarker(side.sim.figures)}
                    />
                  ) : (
                    <div
                      className="aspect-[2/1] animate-pulse rounded bg-basalt-100"
                      aria-label="Computing the fields"
                    />
                  )}
                  {!v.design.objects.some((o) => o.type === 'lamp') && (
                    <p className="rounded-md border border-dashed border-basalt-300 px-3 py-2 text-caption text-basalt-700">
                      No lamps yet: no UV anywhere and every surface at room temperature. Add lamps in the
                      studio.
                    </p>
                  )}
                </>
              )}
            </section>
          );
        })}
      </div>
      {scale && <FieldLegend scale={scale} />}
      <p className="text-caption text-basalt-500">
        Both sides use the same colour scale. Lamps: orange for UV, red for heat; the white ring marks the hot
        spot. Every figure is an estimate — verify with a UV meter and a thermometer.
      </p>

      {(ready?.a || ready?.b) && (
        <FiguresTable a={ready?.a?.sim.figures ?? null} b={ready?.b?.sim.figures ?? null} />
      )}

      {sheet ? (
        <div className="grid gap-4 lg:grid-cols-2">
          {(['a', 'b'] as const).map((slot) => {
            const side = ready?.[slot];
            return side?.assessment ? (
              <div key={slot} className="rounded-lg border border-basalt-200 bg-white p-4">
                <p className="mb-2 text-caption font-medium text-basalt-500">Variant {slot.toUpperCase()}</p>
                <FindingList assessment={side.assessment} speciesName={sheet.name} />
              </div>
            ) : null;
          })}
        </div>
      ) : (
        <p className="rounded-md border border-dashed border-basalt-300 px-4 py-3 text-body text-basalt-600">
          No species picked: the fields and their differences are shown without an assessment. Pick a species
          above to check each variant’s basking UV, UV-free shade, hot spot and cool end against its needs.
        </p>
      )}

      {diff && <DiffTable diff={diff} />}

      {(a || b) && (
        <CautionList
          design={{ objects: [...(a?.design.objects ?? []), ...(b?.design.objects ?? [])] }}
          assessment={
            ready?.a?.assessment || ready?.b?.assessment
              ? {
                  findings: [
                    ...(ready?.a?.assessment?.findings ?? []),
                    ...(ready?.b?.assessment?.findings ?? []),
                  ],
                }
              : null
          }
        />
      )}
    </div>
  );
}
