'use client';

import { signIn } from 'next-auth/react';
import Link from '@/components/ui/Link';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { button, link } from '@/components/ui/styles';
import { signInErrorMessage } from '@/lib/auth/messages';

export function SignInForm({ returnTo, initialError }: { returnTo: string; initialError?: string }) {
  const router = useRouter();
  const [error, setError] = useState(initialError ? signInErrorMessage(initialError) : '');
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setBusy(true);
    setError('');
    try {
      const result = await signIn('credentials', {
        email: String(form.get('email') ?? ''),
        password: String(form.get('password') ?? ''),
        redirect: false,
      });
      if (!result || result.error || !result.ok) {
        setError(signInErrorMessage(result?.error ?? 'ServiceUnavailable'));
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
      <Field label="Email" name="email" type="email" autoComplete="username" required autoFocus />
      <Field label="Password" name="password" type="password" autoComplete="current-password" required />
      <p className="-mt-2 text-right text-body">
        <Link href="/forgot-password" className={link}>
          Forgot your password?
        </Link>
      </p>
      <button type="submit" className={`${button.primary} w-full`} disabled={busy}>
        {busy ? 'Signing in…' : 'Sign in'}
      </button>
      <p className="text-center text-body text-basalt-600">
        New here?{' '}
        <Link href="/sign-up" className={link}>
          Create an account
        </Link>
      </p>
    </form>
  );
}
