import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { AccountSecurity } from '@/components/account/AccountSecurity';
import { PageHeader } from '@/components/ui/PageHeader';
import { can } from '@/lib/permissions';
import { requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Your account' };

export default async function AccountPage() {
  const user = await requireUser('/account');
  if (!can(user, 'read', { kind: 'account', userId: user.id })) notFound();
  return (
    <>
      <PageHeader title="Your account" lead={`Signed in as ${user.name} (${user.email}).`} />
      <AccountSecurity />
    </>
  );
}
