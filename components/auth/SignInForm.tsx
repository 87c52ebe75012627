'use client';

import Link from '@/components/ui/Link';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { fieldError } from '@/components/ui/api-client';
import { link } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { signInErrorMessage } from '@/lib/auth/messages';
import { NextStepLink } from './NextStepLink';
import { SubmitButton } from './SubmitButton';

/** The refusal that also covers an account still waiting for its confirmation link (see messages.ts). */
const MISMATCH = 'CredentialsSignin';

export function SignInForm({ returnTo, initialError }: { returnTo: string; initialError?: string }) {
  const router = useRouter();
  const [error, setError] = useState(initialError ? signInErrorMessage(initialError) : '');
  const [busy, setBusy] = useState(false);
  // After a refusal that may mean "not confirmed yet": the address to offer a new confirmation link for.
  const [resendTo, setResendTo] = useState('');
  const resend = useApiMutation<string, { message: string }>(
    (email) => ({ method: 'POST', url: '/api/sign-up/resend', body: { email } }),
    { refresh: false },
  );
  const resent = resend.data
    ? { tone: 'success' as const, message: resend.data.message }
    : resend.error
      ? { tone: 'error' as const, message: fieldError(resend.error).message }
      : null;

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const email = String(form.get('email') ?? '');
    setBusy(true);
    setError('');
    setResendTo('');
    resend.reset();
    try {
      const result = await signIn('credentials', {
        email,
        password: String(form.get('password') ?? ''),
        redirect: false,
      });
      if (!result || result.error || !result.ok) {
        setError(signInErrorMessage(result?.error ?? 'ServiceUnavailable'));
        if (result?.error === MISMATCH && email.trim()) setResendTo(email.trim());
        setBusy(false);
        return;
      }
      router.replace(returnTo);
      router.refresh();
    } catch {
      setError('Baskwell cannot be reached. Check your connection and try again.');
      setBusy(false);
    }
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error && <Notice tone="error">{error}</Notice>}
      {resendTo && !resent && (
        <p className="text-body">
          <button type="button" className={link} onClick={() => resend.mutate(resendTo)}>
            Send the confirmation link to {resendTo} again
          </button>
        </p>
      )}
      {resent && <Notice tone={resent.tone}>{resent.message}</Notice>}
      <Field label="Email" name="email" type="email" autoComplete="username" required autoFocus />
      <Field label="Password" name="password" type="password" autoComplete="current-password" required />
      <p className="-mt-2 text-right text-body">
        <Link href="/forgot-password" className={link}>
          Forgot your password?
        </Link>
      </p>
      <SubmitButton busy={busy} busyLabel="Signing in…">
        Sign in
      </SubmitButton>
      <NextStepLink href="/sign-up" lead="New here?">
        Create an account
      </NextStepLink>
    </form>
  );
}
