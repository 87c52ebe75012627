import { LocalTime } from '@/components/ui/LocalTime';
import type { Metadata } from 'next';
import Link from '@/components/ui/Link';
import { AcceptInvitation } from '@/components/auth/AcceptInvitation';
import { SignOutButton } from '@/components/shell/SignOutButton';
import { Notice } from '@/components/ui/Notice';
import { button } from '@/components/ui/styles';
import { hasAccount, invitationForToken, invitationState } from '@/lib/auth/invitations';
import { currentUser } from '@/lib/session';

// The token is in the address: keep it out of Referer headers sent to other sites.
export const metadata: Metadata = { title: 'Invitation', referrer: 'no-referrer' };

const ROLE_TEXT = {
  owner: 'an owner',
  staff: 'a member of staff',
  keeper: 'a keeper',
};

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const found = await invitationForToken(token);
  if (!found) {
    return (
      <Problem title="This invitation link is not valid">
        Check that the whole link from the e-mail was opened, or ask for a new invitation.
      </Problem>
    );
  }
  const { invitation } = found;
  const orgName = found.organisationName ?? 'the organisation';
  const state = invitationState(invitation);
  if (state !== 'pending') {
    const why = { accepted: 'has already been used', revoked: 'was withdrawn', expired: 'has expired' }[
      state
    ];
    return (
      <Problem title={`This invitation ${why}`}>
        Ask someone at {orgName} to send a new one.{' '}
        {state === 'accepted' && (
          <>
            If you accepted it yourself, just{' '}
            <Link href="/sign-in" className="underline">
              sign in
            </Link>
            .
          </>
        )}
      </Problem>
    );
  }
  const user = await currentUser();
  const intro = (
    <>
      <h1 className="mb-1 text-title">Join {orgName}</h1>
      <p className="mb-6 text-body text-basalt-600">
        You were invited to {orgName} on Baskwell as {ROLE_TEXT[invitation.role]}. The invitation is for{' '}
        <strong>{invitation.email}</strong> and works until{' '}
        <LocalTime value={invitation.expiresAt.toISOString()} />.
      </p>
    </>
  );
  // Someone signed in with the invited address joins with that account; someone without one creates it.
  const accept = (mode: 'join' | 'create') => (
    <>
      {intro}
      <AcceptInvitation token={token} email={invitation.email} organisationName={orgName} mode={mode} />
    </>
  );
  if (user) {
    if (user.email !== invitation.email) {
      return (
        <>
          {intro}
          <Notice tone="warning" title="You are signed in with another account">
            You are signed in as {user.email}. Sign out, then open the invitation link again.
          </Notice>
          <div className="mt-4">
            <SignOutButton className={button.secondary} />
          </div>
        </>
      );
    }
    return accept('join');
  }
  if (await hasAccount(invitation.email)) {
    return (
      <>
        {intro}
        <Notice tone="info">
          {invitation.email} already has an account. Sign in, and you will come back here to join.
        </Notice>
        <Link
          href={`/sign-in?callbackUrl=${encodeURIComponent(`/invite/${token}`)}`}
          className={`${button.primary} mt-4 w-full`}
        >
          Sign in to accept
        </Link>
      </>
    );
  }
  return accept('create');
}

function Problem({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <>
      <h1 className="mb-3 text-title">{title}</h1>
      <p className="text-body text-basalt-600">{children}</p>
      <Link href="/" className={`${button.secondary} mt-6`}>
        Go to the start page
      </Link>
    </>
  );
}
