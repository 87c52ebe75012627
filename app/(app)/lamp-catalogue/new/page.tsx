import type { Metadata } from 'next';
import Link from 'next/link';
import { LampTypeForm } from '@/components/catalogue/LampTypeForm';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { link } from '@/components/ui/styles';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Add a lamp type' };

export default async function NewLampTypePage() {
  const user = await requireUser('/lamp-catalogue/new');
  const membership = await currentMembership(user);
  if (!membership) return null;
  const mayCreate = can(user, 'create', { kind: 'lamp-type', organisationId: membership.organisationId });
  return (
    <>
      <p className="mb-2 text-body">
        <Link href="/lamp-catalogue" className={link}>
          ← Lamp catalogue
        </Link>
      </p>
      <PageHeader
        title="Add a lamp type"
        lead="Describe a kind of lamp by its technology — never a brand. Start from the technology’s defaults and correct what you know."
      />
      {mayCreate ? (
        <LampTypeForm organisationId={membership.organisationId} lampType={null} />
      ) : (
        <Notice tone="warning" title="Only owners and staff add lamp types">
          Ask the organisation’s owner or staff to add the lamp you use.
        </Notice>
      )}
    </>
  );
}
