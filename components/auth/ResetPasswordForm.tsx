'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { NewPasswordField } from './NewPasswordField';
import { Notice } from '@/components/ui/Notice';
import { fieldError } from '@/components/ui/api-client';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { useLinkToken } from './link-token';
import { NextStepLink } from './NextStepLink';
import { SubmitButton } from './SubmitButton';

/** Chooses a new password with the e-mailed link (its token is read from the address's fragment). */
export function ResetPasswordForm() {
  const router = useRouter();
  const token = useLinkToken();
  const [mismatch, setMismatch] = useState(false);
  const complete = useApiMutation(
    (password: string) => ({
      method: 'POST',
      url: '/api/password-reset/complete',
      body: { token, password },
    }),
    { refresh: false, onSuccess: () => router.replace('/sign-in?done=password-reset') },
  );
  const failed = complete.error && fieldError(complete.error);
  // A lapsed or used link cannot be fixed on this form: the page offers a new one instead.
  const expired = failed?.field === 'token' ? failed.message : '';
  const errors: Record<string, string> = mismatch
    ? { confirm: 'The two passwords are not the same.' }
    : failed
      ? { [failed.field ?? 'general']: failed.message }
      : {};
  // Busy until sign-in replaces this page.
  const busy = complete.isPending || complete.isSuccess;

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const password = String(form.get('password') ?? '');
    const differs = password !== String(form.get('confirm') ?? '');
    setMismatch(differs);
    if (!differs) complete.mutate(password);
  }

  if (token === undefined) return <p className="text-body text-basalt-600">Reading the link…</p>;
  if (!token || expired) {
    return (
      <div className="space-y-4">
        <Notice tone="error">
          {expired || 'This link is incomplete. Copy the whole link from the e-mail, or ask for a new one.'}
        </Notice>
        <NextStepLink href="/forgot-password">Ask for a new link</NextStepLink>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {errors.general && <Notice tone="error">{errors.general}</Notice>}
      <NewPasswordField
        label="New password"
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
      <SubmitButton busy={busy} busyLabel="Saving…">
        Set the new password
      </SubmitButton>
    </form>
  );
}
