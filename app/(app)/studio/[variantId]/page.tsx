import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { StudioLoader } from '@/components/studio/StudioLoader';
import { parseId } from '@/lib/api/schemas';
import { requireUser } from '@/lib/session';
import { getVariantForUser } from '@/lib/variants/queries';
import { studioCatalogueFor } from '@/lib/lamp-types/studio-catalogue';
import { attachedSpecies, speciesOptions } from '@/lib/variants/species';
import { studioPhotos } from '@/lib/uploads/studio-photos';
import { studioPictureFor } from '@/lib/variants/studio-picture';

export const metadata: Metadata = { title: 'Studio' };

/** The signed-in studio for one stored variant: loaded and access-checked here, edited on the client. */
export default async function VariantStudioPage({ params }: { params: Promise<{ variantId: string }> }) {
  const { variantId } = await params;
  const user = await requireUser(`/studio/${encodeURIComponent(variantId)}`);
  const id = parseId(variantId) ?? NaN;
  const variant = await getVariantForUser(user, id);
  // Someone else's variant and a missing one look the same.
  if (!variant) notFound();
  // The field is drawn on an engine thread while the rest of the page is looked up, the species and the
  // photos side by side: each is a database round trip the page's first byte waits for.
  const [options, photos, picture, catalogueTypes] = await Promise.all([
    speciesOptions(variant.enclosure.organisationId),
    studioPhotos(user, variant.enclosure, variant.design.backdrop?.uploadId),
    studioPictureFor(variant.design),
    studioCatalogueFor(user, variant.enclosure.organisationId),
  ]);
  const attached = attachedSpecies(options, variant.enclosure.speciesName);
  return (
    <StudioLoader
      source={{ kind: 'variant', variantId: String(variant.id) }}
      title={`${variant.enclosure.name} · ${variant.designName} · ${variant.name}`}
      backHref={`/enclosures/${variant.enclosure.id}`}
      backLabel="Enclosure"
      initial={{ design: variant.design, version: variant.version }}
      species={options.map((o) => ({ id: String(o.id), ...o.sheet }))}
      initialSpeciesId={attached ? String(attached.id) : null}
      readOnly={!variant.canEdit}
      photos={photos}
      catalogueTypes={catalogueTypes}
      picture={picture}
    />
  );
}
