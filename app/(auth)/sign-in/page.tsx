import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { SignInForm } from '@/components/auth/SignInForm';
import { Notice } from '@/components/ui/Notice';
import { safeReturnTo } from '@/lib/auth/return-to';
import { currentUser, type SearchParamsProps } from '@/lib/session';

export const metadata: Metadata = { title: 'Sign in' };

/** What the account page just did, said once the person lands here signed out. */
const DONE: Record<string, string> = {
  'password-changed': 'Your password was changed and every session ended. Sign in with the new password.',
  'signed-out-everywhere': 'You were signed out on every device.',
  'password-reset': 'Your new password is set and every session ended. Sign in with the new password.',
  'account-confirmed': 'Your account is confirmed. Sign in with the e-mail and password you chose.',
};

export default async function SignInPage({ searchParams }: SearchParamsProps) {
  const params = await searchParams;
  const returnTo = safeReturnTo(params.callbackUrl);
  if (await currentUser()) redirect(returnTo);
  const error = typeof params.error === 'string' ? params.error : undefined;
  const done = typeof params.done === 'string' ? DONE[params.done] : undefined;
  return (
    <>
      {done && (
        <div className="mb-4">
          <Notice tone="success">{done}</Notice>
        </div>
      )}
      <h1 className="mb-1 text-title">Sign in</h1>
      <p className="mb-6 text-body text-basalt-600">
        Welcome back. Sign in with the e-mail and password of your account.
      </p>
      <SignInForm returnTo={returnTo} initialError={error} />
    </>
  );
}
