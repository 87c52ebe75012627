'use client';

import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { NewPasswordField } from './NewPasswordField';
import { Notice } from '@/components/ui/Notice';
import { fieldError } from '@/components/ui/api-client';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { NextStepLink } from './NextStepLink';
import { SubmitButton } from './SubmitButton';

type SignUp = { name: string; email: string; password: string; organisationName: string };

/**
 * Creating an account ends on the same "check your inbox" page whether or not the address already had
 * one, so the page never tells a stranger which addresses have accounts: a new account is confirmed by
 * the e-mailed link, the owner of an existing one is e-mailed about the try.
 */
export function SignUpForm() {
  const [sentTo, setSentTo] = useState('');
  const signUp = useApiMutation((body: SignUp) => ({ method: 'POST', url: '/api/sign-up', body }), {
    refresh: false,
    onSuccess: (_, body) => setSentTo(body.email),
  });
  const failed = signUp.error && fieldError(signUp.error);
  const general = failed && !failed.field ? failed.message : '';
  const errors: Record<string, string> = failed?.field ? { [failed.field]: failed.message } : {};
  const busy = signUp.isPending;

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    signUp.mutate({
      name: String(form.get('name') ?? ''),
      email: String(form.get('email') ?? ''),
      password: String(form.get('password') ?? ''),
      organisationName: String(form.get('organisationName') ?? ''),
    });
  }

  if (sentTo) {
    return (
      <div className="space-y-4">
        <Notice tone="info">
          Check the inbox of <strong>{sentTo}</strong>. We have e-mailed it what to do next: a link that
          confirms a new account (it works once, for 2 hours), or, if the address already has an account, how
          to sign in or choose a new password.
        </Notice>
        <p className="text-body text-basalt-600">
          Nothing after a few minutes? Check the spam folder. You can ask for a new link from the sign-in
          page.
        </p>
        <NextStepLink href="/sign-in">Go to sign in</NextStepLink>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {general && <Notice tone="error">{general}</Notice>}
      <Field label="Your name" name="name" autoComplete="name" required error={errors.name} />
      <Field label="Email" name="email" type="email" autoComplete="email" required error={errors.email} />
      <NewPasswordField
        hint="At least 12 characters. A few unrelated words make a strong one."
        error={errors.password}
      />
      <Field
        label="Organisation name"
        name="organisationName"
        required
        hint="Your shop, rescue, zoo or household. You will be its owner and can invite others."
        error={errors.organisationName}
      />
      <SubmitButton busy={busy} busyLabel="Creating your account…">
        Create account
      </SubmitButton>
      <NextStepLink href="/sign-in" lead="Already have an account?">
        Sign in
      </NextStepLink>
    </form>
  );
}
