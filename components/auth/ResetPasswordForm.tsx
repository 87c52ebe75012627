'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import Link from '@/components/ui/Link';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { button, link } from '@/components/ui/styles';
import { useLinkToken } from './link-token';

/** Chooses a new password with the e-mailed link (its token is read from the address's fragment). */
export function ResetPasswordForm() {
  const router = useRouter();
  const token = useLinkToken();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [expired, setExpired] = useState('');
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const password = String(form.get('password') ?? '');
    if (password !== String(form.get('confirm') ?? '')) {
      setErrors({ confirm: 'The two passwords are not the same.' });
      return;
    }
    setBusy(true);
    setErrors({});
    try {
      await sendJson('POST', '/api/password-reset/complete', { token, password });
      router.replace('/sign-in?done=password-reset');
    } catch (err) {
      const { field, message } = fieldError(err);
      if (field === 'token') setExpired(message);
      else setErrors({ [field ?? 'general']: message });
      setBusy(false);
    }
  }

  if (token === undefined) return <p className="text-body text-basalt-600">Reading the link…</p>;
  if (!token || expired) {
    return (
      <div className="space-y-4">
        <Notice tone="error">
          {expired || 'This link is incomplete. Copy the whole link from the e-mail, or ask for a new one.'}
        </Notice>
        <p className="text-center text-body">
          <Link href="/forgot-password" className={link}>
            Ask for a new link
          </Link>
        </p>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {errors.general && <Notice tone="error">{errors.general}</Notice>}
      <Field
        label="New password"
        name="password"
        type="password"
        autoComplete="new-password"
        required
        minLength={12}
        autoFocus
        hint="At least 12 characters. A few unrelated words make a strong one."
        error={errors.password}
      />
      <Field
        label="New password again"
        name="confirm"
        type="password"
        autoComplete="new-password"
        required
        error={errors.confirm}
      />
      <button type="submit" className={`${button.primary} w-full`} disabled={busy}>
        {busy ? 'Saving…' : 'Set the new password'}
      </button>
    </form>
  );
}
