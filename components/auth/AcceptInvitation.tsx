'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';

type Props = {
  token: string;
  email: string;
  organisationName: string;
  /** join: signed in with the invited address; create: a new account. */
  mode: 'join' | 'create';
};

export function AcceptInvitation({ token, email, organisationName, mode }: Props) {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [general, setGeneral] = useState('');
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const name = String(form.get('name') ?? '');
    const password = String(form.get('password') ?? '');
    setBusy(true);
    setErrors({});
    setGeneral('');
    try {
      const joined = await sendJson<{ organisationId: number }>(
        'POST',
        '/api/invitations/accept',
        mode === 'join' ? { token } : { token, name, password },
      );
      if (mode === 'create') {
        const result = await signIn('credentials', { email, password, redirect: false });
        if (!result?.ok || result.error) {
          router.replace('/sign-in');
          return;
        }
      }
      await sendJson('PUT', '/api/current-organisation', { organisationId: joined.organisationId }).catch(
        () => {},
      );
      router.replace('/enclosures');
      router.refresh();
    } catch (error) {
      const { field, message } = fieldError(error);
      if (field) setErrors({ [field]: message });
      else setGeneral(message);
      setBusy(false);
    }
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {general && <Notice tone="error">{general}</Notice>}
      {mode === 'create' && (
        <>
          <Field label="Email" name="email" type="email" value={email} readOnly hint="The invited address." />
          <Field label="Your name" name="name" autoComplete="name" required error={errors.name} />
          <Field
            label="Password"
            name="password"
            type="password"
            autoComplete="new-password"
            required
            minLength={12}
            hint="At least 12 characters."
            error={errors.password}
          />
        </>
      )}
      <button type="submit" className={`${button.primary} w-full`} disabled={busy}>
        {busy
          ? 'Joining…'
          : mode === 'create'
            ? `Create account and join ${organisationName}`
            : `Join ${organisationName}`}
      </button>
    </form>
  );
}
