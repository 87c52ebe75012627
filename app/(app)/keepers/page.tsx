import type { Metadata } from 'next';
import { KeepersTable } from '@/components/people/KeepersTable';
import { InviteForm } from '@/components/people/InviteForm';
import { PendingInvitations } from '@/components/people/PendingInvitations';
import { EmptyState } from '@/components/ui/EmptyState';
import { PageHeader } from '@/components/ui/PageHeader';
import { card } from '@/components/ui/styles';
import { QueryProvider } from '@/components/ui/QueryProvider';
import { listKeepers } from '@/lib/people/queries';
import { pendingInvitationViews } from '@/lib/people/queries';
import { toSearchParams } from '@/lib/list-view';
import { keeperListView } from '@/lib/people/list-view';
import { can } from '@/lib/permissions';
import { requireMembershipThatMay, type SearchParamsProps } from '@/lib/session';

export const metadata: Metadata = { title: 'Keepers' };

export default async function KeepersPage({ searchParams }: SearchParamsProps) {
  const session = await requireMembershipThatMay('/keepers', 'read', 'member');
  if (!session) return null;
  const { user, membership, organisationId } = session;
  const mayInvite = can(user, 'create', { kind: 'invitation', organisationId, role: 'keeper' });
  // The first page is rendered here, for the view the address names; the table then fetches others.
  const view = keeperListView.viewFromSearchParams(toSearchParams(await searchParams));
  const [firstPage, invitations] = await Promise.all([
    listKeepers({ organisationId, ...keeperListView.listQueryForView(view) }),
    pendingInvitationViews(organisationId, 'keeper'),
  ]);

  return (
    <>
      <PageHeader
        title="Keepers"
        lead="Your customers and the people who look after the animals. Each keeper sees and edits only their own enclosures, designs and readings."
      />
      {firstPage.total === 0 && !view.q ? (
        <EmptyState title="No keepers yet">
          <p>
            Invite a customer by e-mail below. They choose their own password and then see only their own
            enclosures. You can still add enclosures for them before they accept.
          </p>
        </EmptyState>
      ) : (
        <QueryProvider>
          <KeepersTable organisationId={organisationId} initial={{ view, page: firstPage }} />
        </QueryProvider>
      )}
      {mayInvite && (
        <section aria-labelledby="invite-keeper" className={`${card} mt-8 p-5`}>
          <h2 id="invite-keeper" className="text-lead font-semibold">
            Invite a keeper
          </h2>
          <p className="mb-4 mt-1 text-body text-basalt-600">
            They get an e-mail with a link to join {membership.organisationName}.
          </p>
          <InviteForm organisationId={organisationId} roles={['keeper']} submitLabel="Invite keeper" />
          <h3 className="mb-2 mt-6 font-semibold">Waiting for an answer</h3>
          <PendingInvitations invitations={invitations.map((i) => ({ ...i, canRevoke: true }))} />
        </section>
      )}
    </>
  );
}
