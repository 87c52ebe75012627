import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { InviteForm } from '@/components/people/InviteForm';
import { MemberActions } from '@/components/people/MemberActions';
import { PendingInvitations } from '@/components/people/PendingInvitations';
import { PageHeader } from '@/components/ui/PageHeader';
import { card } from '@/components/ui/styles';
import { memberViews, pendingInvitationViews } from '@/lib/api/views';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';
import type { Role } from '@/lib/permissions';

export const metadata: Metadata = { title: 'Members' };

const ROLE_ORDER: Record<Role, number> = { owner: 0, staff: 1, keeper: 2 };

export default async function MembersPage() {
  const user = await requireUser('/members');
  const membership = await currentMembership(user);
  if (!membership) return null;
  const organisationId = membership.organisationId;
  if (!can(user, 'read', { kind: 'member', organisationId })) notFound();
  const manages = can(user, 'update', { kind: 'member', organisationId });
  const invitable = (['staff', 'keeper', 'owner'] as Role[]).filter((role) =>
    can(user, 'create', { kind: 'invitation', organisationId, role }),
  );
  const [members, invitations] = await Promise.all([
    memberViews(organisationId),
    pendingInvitationViews(organisationId),
  ]);
  members.sort((a, b) => ROLE_ORDER[a.role] - ROLE_ORDER[b.role] || a.name.localeCompare(b.name));

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
      <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
        <table className="min-w-full divide-y divide-basalt-200 text-left text-body">
          <caption className="sr-only">Members</caption>
          <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
            <tr>
              <th scope="col" className="px-4 py-2 font-semibold">
                Name
              </th>
              <th scope="col" className="px-4 py-2 font-semibold">
                Email
              </th>
              <th scope="col" className="px-4 py-2 font-semibold">
                {manages ? 'Role and actions' : 'Role'}
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-basalt-100">
            {members.map((m) => (
              <tr key={m.userId}>
                <td className="px-4 py-3 font-medium">
                  {m.name}
                  {m.userId === user.id && <span className="ml-1 text-caption text-basalt-500">(you)</span>}
                </td>
                <td className="px-4 py-3 text-basalt-700">{m.email}</td>
                <td className="px-4 py-3">
                  {manages ? (
                    <MemberActions
                      organisationId={organisationId}
                      userId={m.userId}
                      name={m.name}
                      role={m.role}
                      isSelf={m.userId === user.id}
                    />
                  ) : (
                    <span className="rounded bg-basalt-100 px-2 py-0.5 text-caption font-medium text-basalt-700">
                      {m.role}
                    </span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
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
