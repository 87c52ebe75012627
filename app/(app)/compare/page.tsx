import type { Metadata } from 'next';
import { CompareView } from '@/components/designs/compare/CompareView';
import { PageHeader } from '@/components/ui/PageHeader';
import { currentMembership, requireUser } from '@/lib/session';
import { parseCompareParams, compareQuery } from '@/shared/designs/compare-params';
import { speciesOptions, attachedSpecies, type SpeciesOption } from '@/lib/variants/species';
import { getVariantForUser } from '@/lib/variants/queries';
import { visibleVariants } from '@/lib/variants/visible';

export const metadata: Metadata = { title: 'Compare variants' };

/**
 * Two variants side by side on one colour scale: `?a=&b=&field=&months=&species=`. The variants are
 * loaded and access-checked here; the fields are computed in the browser.
 */
export default async function ComparePage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const asked = parseCompareParams(await searchParams);
  const user = await requireUser(`/compare?${compareQuery(asked)}`);
  const [a, b, options] = await Promise.all([
    asked.a ? getVariantForUser(user, asked.a) : null,
    asked.b ? getVariantForUser(user, asked.b) : null,
    visibleVariants(user),
  ]);
  // Species come from the organisation of the variants shown (or the one the user is working in).
  const orgId =
    a?.enclosure.organisationId ??
    b?.enclosure.organisationId ??
    (await currentMembership(user))?.organisationId;
  let species: SpeciesOption[] = [];
  if (orgId) {
    species = await speciesOptions(orgId);
  }
  const suggested = attachedSpecies(species, a?.enclosure.speciesName ?? b?.enclosure.speciesName);
  // Unless the URL names a species (or `none`), assess against the species of variant A's enclosure:
  // that is the animal the comparison is for. It stays out of the URL, so picking another variant A
  // brings that enclosure's species; a species picked on the page (or None) is written into the URL.
  const ofA = attachedSpecies(species, a?.enclosure.speciesName);
  return (
    <>
      <PageHeader
        title="Compare variants"
        lead="Two variants side by side on the same colour scale, with what differs between them. Every figure is an estimate to verify with a meter and thermometer."
      />
      <CompareView
        params={asked}
        a={a}
        b={b}
        missing={{ a: Boolean(asked.a && !a), b: Boolean(asked.b && !b) }}
        options={options}
        species={species}
        suggestedSpeciesId={suggested?.id ?? null}
        defaultSpeciesId={ofA?.id ?? null}
      />
    </>
  );
}
