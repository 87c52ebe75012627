import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { SignInForm } from '@/components/auth/SignInForm';
import { safeReturnTo } from '@/lib/auth/return-to';
import { currentUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[]>>;
}) {
  const params = await searchParams;
  const returnTo = safeReturnTo(params.callbackUrl);
  if (await currentUser()) redirect(returnTo);
  const error = typeof params.error === 'string' ? params.error : undefined;
  return (
    <>
      <h1 className="mb-1 text-title">Sign in</h1>
      <p className="mb-6 text-body text-basalt-600">
        Welcome back. Sign in with the e-mail and password of your account.
      </p>
      <SignInForm returnTo={returnTo} initialError={error} />
    </>
  );
}
