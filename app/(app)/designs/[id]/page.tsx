import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { notFound } from 'next/navigation';
import { DesignDetail } from '@/components/designs/DesignDetail';
import { PageHeader } from '@/components/ui/PageHeader';
import { link } from '@/components/ui/styles';
import { parseId } from '@/lib/api/schemas';
import { requireUser } from '@/lib/session';
import { getDesignForUser } from '@/lib/variants/designs';

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
      <nav aria-label="Breadcrumb" className="mb-2 text-body">
        <Link href="/enclosures" className={link}>
          Enclosures
        </Link>
        <span className="text-basalt-500" aria-hidden="true">
          {' '}
          /{' '}
        </span>
        <Link href={`/enclosures/${enclosure.id}`} className={link}>
          {enclosure.name}
        </Link>
        <span className="text-basalt-500" aria-hidden="true">
          {' '}
          /{' '}
        </span>
        <span aria-current="page">{design.name}</span>
      </nav>
      <PageHeader
        title={design.name}
        lead={`Design for ${enclosure.name}: ${design.variants.length} variant${design.variants.length === 1 ? '' : 's'}. Download or share a variant; edit it in the studio.`}
      />
      <DesignDetail initial={design} canEdit={canEdit} />
    </>
  );
}
