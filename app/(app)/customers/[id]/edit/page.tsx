import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { Breadcrumbs } from '@/components/ui/Breadcrumbs';
import { CustomerForm } from '@/components/customers/CustomerForm';
import { PageHeader } from '@/components/ui/PageHeader';

import { parseId } from '@/lib/api/schemas';
import { customerForPage } from '@/lib/customers/access';
import { customerDto } from '@/lib/customers/queries';
import { requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Change customer' };

type Props = { params: Promise<{ id: string }> };

export default async function EditCustomerPage({ params }: Props) {
  const { id: raw } = await params;
  const user = await requireUser(`/customers/${raw}/edit`);
  const id = parseId(raw);
  const customer = id ? await customerForPage(user, id) : null;
  if (!customer) notFound();
  const dto = customerDto(customer);
  return (
    <>
      <Breadcrumbs trail={[{ href: `/customers/${dto.id}`, label: dto.name }]} />
      <PageHeader title={`Change ${dto.name}`} />
      <CustomerForm organisationId={dto.organisationId} customer={dto} />
    </>
  );
}
