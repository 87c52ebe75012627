'use client';

import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { fieldError } from '@/components/ui/api-client';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { NextStepLink } from './NextStepLink';
import { SubmitButton } from './SubmitButton';

/** Asks for a "choose a new password" link. The answer never says whether the address has an account. */
export function ForgotPasswordForm() {
  const [sent, setSent] = useState<{ email: string; message: string } | null>(null);
  const ask = useApiMutation<string, { message: string }>(
    (email) => ({ method: 'POST', url: '/api/password-reset', body: { email } }),
    { refresh: false, onSuccess: (answer, email) => setSent({ email, message: answer.message }) },
  );
  const error = ask.error && fieldError(ask.error);
  const busy = ask.isPending;

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    ask.mutate(String(new FormData(e.currentTarget).get('email') ?? ''));
  }

  if (sent) {
    return (
      <div className="space-y-4">
        <Notice tone="success">{sent.message}</Notice>
        <p className="text-body text-basalt-600">
          Sent to <strong>{sent.email}</strong>. Nothing after a few minutes? Check the spam folder, or ask
          again in a while.
        </p>
        <NextStepLink href="/sign-in">Back to sign in</NextStepLink>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error && !error.field && <Notice tone="error">{error.message}</Notice>}
      <Field
        label="Email"
        name="email"
        type="email"
        autoComplete="username"
        required
        autoFocus
        error={error?.field === 'email' ? error.message : undefined}
      />
      <SubmitButton busy={busy} busyLabel="Sending…">
        Send me a link
      </SubmitButton>
      <NextStepLink href="/sign-in" lead="Remembered it?">
        Sign in
      </NextStepLink>
    </form>
  );
}
