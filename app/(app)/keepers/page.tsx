import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { notFound } from 'next/navigation';
import { InviteForm } from '@/components/people/InviteForm';
import { PendingInvitations } from '@/components/people/PendingInvitations';
import { EmptyState } from '@/components/ui/EmptyState';
import { PageHeader } from '@/components/ui/PageHeader';
import { card, link } from '@/components/ui/styles';
import { keeperViews, pendingInvitationViews } from '@/lib/api/views';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Keepers' };

export default async function KeepersPage() {
  const user = await requireUser('/keepers');
  const membership = await currentMembership(user);
  if (!membership) return null;
  const organisationId = membership.organisationId;
  if (!can(user, 'read', { kind: 'member', organisationId })) notFound();
  const mayInvite = can(user, 'create', { kind: 'invitation', organisationId, role: 'keeper' });
  const [keepers, invitations] = await Promise.all([
    keeperViews(organisationId),
    pendingInvitationViews(organisationId, 'keeper'),
  ]);

  return (
    <>
      <PageHeader
        title="Keepers"
        lead="Your customers and the people who look after the animals. Each keeper sees and edits only their own enclosures, designs and readings."
      />
      {keepers.length === 0 ? (
        <EmptyState title="No keepers yet">
          <p>
            Invite a customer by e-mail below. They choose their own password and then see only their own
            enclosures. You can still add enclosures for them before they accept.
          </p>
        </EmptyState>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
          <table className="min-w-full divide-y divide-basalt-200 text-left text-body">
            <caption className="sr-only">Keepers</caption>
            <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
              <tr>
                <th scope="col" className="px-4 py-2 font-semibold">
                  Name
                </th>
                <th scope="col" className="px-4 py-2 font-semibold">
                  Email
                </th>
                <th scope="col" className="px-4 py-2 font-semibold">
                  Enclosures
                </th>
                <th scope="col" className="px-4 py-2 font-semibold">
                  Joined
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-basalt-100">
              {keepers.map((k) => (
                <tr key={k.userId}>
                  <td className="px-4 py-3 font-medium">{k.name}</td>
                  <td className="px-4 py-3 text-basalt-700">{k.email}</td>
                  <td className="px-4 py-3">
                    <Link href={`/enclosures?keeper=${k.userId}`} className={link}>
                      {k.enclosureCount} {k.enclosureCount === 1 ? 'enclosure' : 'enclosures'}
                    </Link>
                  </td>
                  <td className="px-4 py-3 text-basalt-500">{k.joinedAt.slice(0, 10)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
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
