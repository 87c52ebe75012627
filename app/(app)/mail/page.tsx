import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { EmptyState } from '@/components/ui/EmptyState';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { config } from '@/lib/config';
import { capturedMessages, mailViewerEnabled } from '@/lib/mail';
import { organisationAddresses } from '@/lib/organisations/queries';
import { can } from '@/lib/permissions';
import { currentMembership, requireUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Mail (development)' };
export const dynamic = 'force-dynamic';

export default async function MailPage() {
  const user = await requireUser('/mail');
  const membership = await currentMembership(user);
  if (
    !membership ||
    !mailViewerEnabled() ||
    !can(user, 'read', { kind: 'mail', organisationId: membership.organisationId })
  ) {
    notFound();
  }
  const [messages, addresses] = await Promise.all([
    capturedMessages(),
    organisationAddresses(membership.organisationId),
  ]);
  // Only mail to this organisation's people: invitation links are as good as passwords.
  const ours = messages?.filter((m) =>
    m.to.some((t) => addresses.has(t.toLowerCase().replace(/^.*<|>.*$/g, ''))),
  );

  return (
    <>
      <PageHeader
        title="Mail (development)"
        lead="E-mail captured by the development mail server instead of being delivered: invitations and lamp reminders to your organisation's people. Not part of a production deployment."
      />
      {ours === undefined ? (
        <Notice tone="warning" title="The development mail server cannot be reached">
          Nothing is listening at {config().FAKE_SMTP_HTTP}. Start the app with <code>npm run dev</code> (it
          starts the mail server too), then reload this page.
        </Notice>
      ) : ours.length === 0 ? (
        <EmptyState title="No mail captured yet">
          <p>Invite someone from the Keepers or Members page and the e-mail appears here, newest first.</p>
        </EmptyState>
      ) : (
        <ol className="space-y-4">
          {ours.map((m) => (
            <li key={m.id} className="rounded-lg border border-basalt-200 bg-white p-4">
              <div className="flex flex-wrap justify-between gap-2 text-caption text-basalt-500">
                <span>
                  To <span className="font-medium text-basalt-800">{m.to.join(', ')}</span> · from {m.from}
                </span>
                <time dateTime={m.receivedAt}>{new Date(m.receivedAt).toUTCString()}</time>
              </div>
              <h2 className="mt-1 font-semibold text-basalt-900">{m.subject}</h2>
              <pre className="mt-2 whitespace-pre-wrap break-words font-sans text-body text-basalt-800">
                {m.text}
              </pre>
            </li>
          ))}
        </ol>
      )}
    </>
  );
}
