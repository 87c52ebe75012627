'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { NewPasswordField } from './NewPasswordField';
import { Notice } from '@/components/ui/Notice';
import { fieldError } from '@/components/ui/api-client';
import { useApiMutation, useSwitchOrganisation } from '@/components/ui/useApiMutation';
import { SubmitButton } from './SubmitButton';

type Props = {
  token: string;
  email: string;
  organisationName: string;
  /** join: signed in with the invited address; create: a new account. */
  mode: 'join' | 'create';
};

export function AcceptInvitation({ token, email, organisationName, mode }: Props) {
  const router = useRouter();
  const open = () => {
    router.replace('/enclosures');
    router.refresh();
  };
  // Showing the joined organisation is a convenience: its pages open even when the switch failed.
  const switchTo = useSwitchOrganisation({ refresh: false });
  const accept = useApiMutation<
    { token: string; name?: string; password?: string },
    { organisationId: number }
  >((body) => ({ method: 'POST', url: '/api/invitations/accept', body }), {
    refresh: false,
    onSuccess: async ({ organisationId }, { password }) => {
      if (mode === 'create') {
        // The account exists and has joined now, so a failed sign-in here ends on the sign-in page.
        const result = await signIn('credentials', { email, password, redirect: false }).catch(() => null);
        if (!result?.ok || result.error) return router.replace('/sign-in');
      }
      switchTo.mutate(organisationId, { onSettled: open });
    },
  });
  const failed = accept.error && fieldError(accept.error);
  const general = failed && !failed.field ? failed.message : '';
  const errors: Record<string, string> = failed?.field ? { [failed.field]: failed.message } : {};
  // Busy until the organisation's pages replace this one.
  const busy = accept.isPending || accept.isSuccess;

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const name = String(form.get('name') ?? '');
    const password = String(form.get('password') ?? '');
    accept.mutate(mode === 'join' ? { token } : { token, name, password });
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {general && <Notice tone="error">{general}</Notice>}
      {mode === 'create' && (
        <>
          <Field label="Email" name="email" type="email" value={email} readOnly hint="The invited address." />
          <Field label="Your name" name="name" autoComplete="name" required error={errors.name} />
          <NewPasswordField error={errors.password} />
        </>
      )}
      <SubmitButton busy={busy} busyLabel="Joining…">
        {mode === 'create' ? `Create account and join ${organisationName}` : `Join ${organisationName}`}
      </SubmitButton>
    </form>
  );
}
