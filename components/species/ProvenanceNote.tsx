import type { ReactNode } from 'react';
import type { SpeciesSource } from '@/lib/species/schema';
import { hasUnverifiedFigures } from './format';

/**
 * The visible note on where a sheet's figures come from. Starting sheets are the sheet author's
 * recollection, not a checked reference, and the page says so every time.
 */
export function ProvenanceNote({
  sources,
  startingSheet,
}: {
  sources: Pick<SpeciesSource, 'citation' | 'confidence'>[];
  startingSheet: boolean;
}) {
  const unverified = hasUnverifiedFigures(sources);
  return (
    <WhereFrom>
      {startingSheet
        ? 'This is one of Baskwell’s starting sheets. The UV zones are those defined by Ferguson et al. 2010 (Zoo Biology 29:317–334); which zone this species is in, and its temperatures, were written from memory of the husbandry literature and have not been checked against a published reference. '
        : ''}
      {unverified
        ? 'Some figures are marked “from memory” or “no published source” below: treat them as a starting point, check them with a reptile-experienced vet or current literature, and correct the sheet.'
        : 'Each figure names its source below.'}
    </WhereFrom>
  );
}

/** The short form for lists. */
export function ProvenanceBadge({ sources }: { sources: Pick<SpeciesSource, 'citation' | 'confidence'>[] }) {
  return hasUnverifiedFigures(sources) ? (
    <span className="inline-flex items-center rounded-full bg-sand-100 px-2 py-0.5 text-caption font-medium text-sand-800">
      from memory — verify
    </span>
  ) : (
    <span className="inline-flex items-center rounded-full bg-moss-100 px-2 py-0.5 text-caption font-medium text-moss-800">
      sourced
    </span>
  );
}

/** The note above the list of sheets. */
export function SpeciesListNote() {
  return (
    <WhereFrom>
      The starting sheets were written from memory of the husbandry literature; the UV zones are those defined
      by Ferguson et al. 2010 (Zoo Biology 29:317–334). Each sheet lists its sources and says which figures
      are unverified. Review them with a reptile-experienced vet before relying on them, and correct your
      copies.
    </WhereFrom>
  );
}

/** The sand-coloured note that says where a sheet's figures come from. */
function WhereFrom({ children }: { children: ReactNode }) {
  return (
    <aside
      aria-label="Where these figures come from"
      className="rounded-md border border-sand-300 bg-sand-50 px-4 py-3 text-body text-sand-900"
    >
      <p className="font-semibold">Where these figures come from</p>
      <p className="mt-1">{children}</p>
    </aside>
  );
}
