'use client';

import { signIn } from 'next-auth/react';
import Link from '@/components/ui/Link';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { button, link } from '@/components/ui/styles';

export function SignUpForm() {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [general, setGeneral] = useState('');
  const [busy, setBusy] = useState(false);
  const [sentTo, setSentTo] = useState('');

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const body = {
      name: String(form.get('name') ?? ''),
      email: String(form.get('email') ?? ''),
      password: String(form.get('password') ?? ''),
      organisationName: String(form.get('organisationName') ?? ''),
    };
    setBusy(true);
    setErrors({});
    setGeneral('');
    try {
      await sendJson('POST', '/api/sign-up', body);
    } catch (error) {
      const { field, message } = fieldError(error);
      if (field) setErrors({ [field]: message });
      else setGeneral(message);
      setBusy(false);
      return;
    }
    const result = await signIn('credentials', {
      email: body.email,
      password: body.password,
      redirect: false,
    });
    if (result?.ok && !result.error) {
      router.replace('/enclosures');
      router.refresh();
    } else {
      // Sign-up answers the same whether or not the address had an account; if it had, its owner was
      // e-mailed, and this password is not theirs.
      setSentTo(body.email);
      setBusy(false);
    }
  }

  if (sentTo) {
    return (
      <div className="space-y-4">
        <Notice tone="info">
          Check the inbox of {sentTo}. If that address already has an account, we have e-mailed it what to do
          next: sign in, or choose a new password if it is forgotten.
        </Notice>
        <p className="text-center text-body">
          <Link href="/sign-in" className={link}>
            Go to sign in
          </Link>
        </p>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {general && <Notice tone="error">{general}</Notice>}
      <Field label="Your name" name="name" autoComplete="name" required error={errors.name} />
      <Field label="Email" name="email" type="email" autoComplete="email" required error={errors.email} />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        required
        minLength={12}
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
      <button type="submit" className={`${button.primary} w-full`} disabled={busy}>
        {busy ? 'Creating your account…' : 'Create account'}
      </button>
      <p className="text-center text-body text-basalt-600">
        Already have an account?{' '}
        <Link href="/sign-in" className={link}>
          Sign in
        </Link>
      </p>
    </form>
  );
}
