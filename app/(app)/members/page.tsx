import type { Metadata } from 'next';
import { InviteForm } from '@/components/people/InviteForm';
import { MembersTable } from '@/components/people/MembersTable';
import { PendingInvitations } from '@/components/people/PendingInvitations';
import { PageHeader } from '@/components/ui/PageHeader';
import { card } from '@/components/ui/styles';
import { QueryProvider } from '@/components/ui/QueryProvider';
import { listPeople } from '@/lib/people/queries';
import { pendingInvitationViews } from '@/lib/people/queries';
import { toSearchParams } from '@/lib/list-view';
import { memberListView } from '@/lib/people/list-view';
import { can } from '@/lib/permissions';
import { requireMembershipThatMay, type SearchParamsProps } from '@/lib/session';
import type { Role } from '@/lib/permissions';

export const metadata: Metadata = { title: 'Members' };

export default async function MembersPage({ searchParams }: SearchParamsProps) {
  const session = await requireMembershipThatMay('/members', 'read', 'member');
  if (!session) return null;
  const { user, membership, organisationId } = session;
  const manages = can(user, 'update', { kind: 'member', organisationId });
  const invitable = (['staff', 'keeper', 'owner'] as Role[]).filter((role) =>
    can(user, 'create', { kind: 'invitation', organisationId, role }),
  );
  // The first page is rendered here, for the view the address names; the table then fetches others.
  const view = memberListView.viewFromSearchParams(toSearchParams(await searchParams));
  const [firstPage, invitations] = await Promise.all([
    listPeople({ organisationId, ...memberListView.listQueryForView(view) }),
    pendingInvitationViews(organisationId),
  ]);

  return (
    <>
      <PageHeader
        title="Members"
        lead={
          manages
            ? `Everyone in ${membership.organisationName}. As an owner you change roles, invite and remove people; a removed person is signed out at once.`
            : `Everyone in ${membership.organisationName}. Only an owner changes roles or removes people.`
        }
      />
      <QueryProvider>
        <MembersTable
          organisationId={organisationId}
          selfId={user.id}
          manages={manages}
          initial={{ view, page: firstPage }}
        />
      </QueryProvider>
      {invitable.length > 0 && (
        <section aria-labelledby="invite" className={`${card} mt-8 p-5`}>
          <h2 id="invite" className="text-lead font-semibold">
            Invite someone
          </h2>
          <p className="mb-4 mt-1 text-body text-basalt-600">
            {manages
              ? 'Choose the role they get when they accept.'
              : 'Staff can invite keepers; an owner invites staff and owners.'}
          </p>
          <InviteForm organisationId={organisationId} roles={invitable} />
          <h3 className="mb-2 mt-6 font-semibold">Waiting for an answer</h3>
          <PendingInvitations
            invitations={invitations.map((i) => ({
              ...i,
              canRevoke: can(user, 'delete', { kind: 'invitation', organisationId, role: i.role }),
            }))}
          />
        </section>
      )}
    </>
  );
}
