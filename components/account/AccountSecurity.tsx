'use client';

import { signOut } from 'next-auth/react';
import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { NewPasswordField } from '@/components/auth/NewPasswordField';
import { Notice } from '@/components/ui/Notice';
import { button, card } from '@/components/ui/styles';
import { fieldError } from '@/components/ui/api-client';
import { useApiMutation } from '@/components/ui/useApiMutation';

/**
 * Change the password, or sign out on every device. Both end every session of the account, this one
 * included (the server bumps the session version), so the page then signs this browser out too.
 */
export function AccountSecurity() {
  const [mismatch, setMismatch] = useState(false);
  const leave = (done: string) => void signOut({ callbackUrl: `/sign-in?done=${done}` });
  const password = useApiMutation(
    (body: { currentPassword: string; newPassword: string }) => ({
      method: 'PUT',
      url: '/api/account/password',
      body,
    }),
    { refresh: false, onSuccess: () => leave('password-changed') },
  );
  const everywhere = useApiMutation(() => ({ method: 'DELETE', url: '/api/account/sessions' }), {
    refresh: false,
    onSuccess: () => leave('signed-out-everywhere'),
  });
  // Busy from the click until signing out leaves the page: a second click would only fail.
  const busy =
    password.isPending || password.isSuccess
      ? 'password'
      : everywhere.isPending || everywhere.isSuccess
        ? 'everywhere'
        : 'idle';
  const failed = password.error ?? everywhere.error;
  const error = mismatch
    ? { field: 'repeatPassword', message: 'The two new passwords differ.' }
    : failed && fieldError(failed);

  function changePassword(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const newPassword = String(form.get('newPassword') ?? '');
    const differs = newPassword !== String(form.get('repeatPassword') ?? '');
    everywhere.reset();
    setMismatch(differs);
    if (differs) return;
    password.mutate({ currentPassword: String(form.get('currentPassword') ?? ''), newPassword });
  }

  function signOutEverywhere() {
    setMismatch(false);
    password.reset();
    everywhere.mutate();
  }

  const general = error && !error.field ? error.message : null;
  const on = (field: string) => (error?.field === field ? error.message : null);

  return (
    <div className="space-y-6">
      {general && <Notice tone="error">{general}</Notice>}
      <section className={`${card} p-5`} aria-labelledby="password-heading">
        <h2 id="password-heading" className="text-lead font-semibold text-basalt-900">
          Change password
        </h2>
        <p className="mt-1 text-body text-basalt-600">
          Every device signed in to this account is signed out, this one too; sign in again with the new
          password.
        </p>
        <form className="mt-4 grid max-w-md gap-4" onSubmit={changePassword}>
          <Field
            label="Current password"
            name="currentPassword"
            type="password"
            autoComplete="current-password"
            required
            error={on('currentPassword')}
          />
          <NewPasswordField label="New password" name="newPassword" error={on('newPassword')} />
          <Field
            label="New password again"
            name="repeatPassword"
            type="password"
            autoComplete="new-password"
            required
            error={on('repeatPassword')}
          />
          <div>
            <button type="submit" className={button.primary} disabled={busy !== 'idle'}>
              {busy === 'password' ? 'Changing…' : 'Change password'}
            </button>
          </div>
        </form>
      </section>
      <section className={`${card} p-5`} aria-labelledby="sessions-heading">
        <h2 id="sessions-heading" className="text-lead font-semibold text-basalt-900">
          Sign out everywhere
        </h2>
        <p className="mt-1 text-body text-basalt-600">
          Lost a phone, or signed in on a shared computer? This ends every session of your account on every
          device, including this one.
        </p>
        <button
          type="button"
          className={`${button.danger} mt-4`}
          disabled={busy !== 'idle'}
          onClick={signOutEverywhere}
        >
          {busy === 'everywhere' ? 'Signing out everywhere…' : 'Sign out everywhere'}
        </button>
      </section>
    </div>
  );
}
