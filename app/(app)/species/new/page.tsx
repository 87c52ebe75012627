import type { Metadata } from 'next';
import Link from 'next/link';
import { SpeciesForm } from '@/components/species/SpeciesForm';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { link } from '@/components/ui/styles';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'New species sheet' };

export default async function NewSpeciesPage() {
  const user = await requireUser('/species/new');
  const membership = await currentMembership(user);
  if (!membership) return null;
  const mayCreate = can(user, 'create', { kind: 'species', organisationId: membership.organisationId });
  return (
    <>
      <p className="mb-2 text-body">
        <Link href="/species" className={link}>
          ← All species
        </Link>
      </p>
      <PageHeader
        title="New species sheet"
        lead="Give the species’ needs and where each figure comes from. Every figure is checked against the design in the studio."
      />
      {mayCreate ? (
        <SpeciesForm organisationId={membership.organisationId} sheet={null} />
      ) : (
        <Notice tone="warning" title="Only owners and staff add species sheets">
          Ask the organisation’s owner or staff to add the species you keep.
        </Notice>
      )}
    </>
  );
}
