import { LocalTime } from '@/components/ui/LocalTime';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { EmptyState } from '@/components/ui/EmptyState';
import { Notice } from '@/components/ui/Notice';
import { PageHeader } from '@/components/ui/PageHeader';
import { config } from '@/lib/config';
import { VIEWER_KIND_LABEL, mailViewerEnabled, organisationMail } from '@/lib/mail-viewer';
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
  // Only what this organisation sent, with links of used or withdrawn invitations removed.
  const ours = await organisationMail(membership.organisationId);

  return (
    <>
      <PageHeader
        title="Mail (development)"
        lead="E-mail this organisation sent while the development mail server captured it instead of delivering it: invitations, lamp reminders, and the counter's test slips and re-test reminders to customers. Only the organisation's owners see this page, and only when the server was started with MAIL_VIEWER=1; it is not part of a production deployment."
      />
      {ours === null ? (
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
                  To <span className="font-medium text-basalt-800">{m.to.join(', ')}</span> · from {m.from} ·{' '}
                  {VIEWER_KIND_LABEL[m.kind ?? ''] ?? m.kind}
                </span>
                <LocalTime value={m.receivedAt} />
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
