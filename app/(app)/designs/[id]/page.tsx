import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { DesignDetail } from '@/components/designs/DesignDetail';
import { PageHeader } from '@/components/ui/PageHeader';
import { parseId } from '@/lib/api/schemas';
import { requireUser } from '@/lib/session';
import { getDesignForUser } from '@/lib/variants/queries';

export const metadata: Metadata = { title: 'Design' };

/** One design: its variants, their downloads and share links, and upload of a design file. */
export default async function DesignPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireUser(`/designs/${encodeURIComponent(id)}`);
  const designId = parseId(id);
  const found = designId === null ? null : await getDesignForUser(user, designId);
  // Someone else's design and a missing one look the same.
  if (!found) notFound();
  const { design, enclosure, canEdit } = found;
  return (
    <>
      <Breadcrumbs
        trail={[
          { href: '/enclosures', label: 'Enclosures' },
          { href: `/enclosures/${enclosure.id}`, label: enclosure.name },
        ]}
        current={design.name}
      />
      <PageHeader
        title={design.name}
        lead={`Design for ${enclosure.name}: ${design.variants.length} variant${design.variants.length === 1 ? '' : 's'}. Download or share a variant; edit it in the studio.`}
      />
      <DesignDetail initial={design} canEdit={canEdit} />
    </>
  );
}
