'use client';

import { type FormEvent } from 'react';
import { EmptyState } from '@/components/ui/EmptyState';
import { Field } from '@/components/ui/Field';
import { fieldError } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';
import { useApiMutation, useSwitchOrganisation } from '@/components/ui/useApiMutation';

/** Shown to someone signed in who belongs to no organisation (e.g. just removed from one). */
export function NoOrganisation() {
  const switchTo = useSwitchOrganisation();
  const start = useApiMutation<string, { id: number }>(
    (name) => ({ method: 'POST', url: '/api/organisations', body: { name } }),
    { refresh: false, onSuccess: (org) => switchTo.mutate(org.id) },
  );
  const failed = start.error ?? switchTo.error;
  const error = failed ? fieldError(failed).message : '';
  // Busy until the refreshed layout shows the new organisation instead of this form.
  const busy = start.isPending || switchTo.isPending || switchTo.isSuccess;
  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    switchTo.reset();
    start.mutate(String(new FormData(e.currentTarget).get('name') ?? ''));
  }
  return (
    <EmptyState title="You are not in an organisation yet">
      <p>
        Enclosures, people and catalogues belong to an organisation. Ask the owner of your shop or household
        for an invitation, or start your own here.
      </p>
      <form
        onSubmit={onSubmit}
        className="mx-auto mt-4 flex max-w-md flex-col gap-3 text-left sm:flex-row sm:items-end"
      >
        <Field label="Organisation name" name="name" required error={error} className="flex-1" />
        <button type="submit" className={button.primary} disabled={busy}>
          Start it
        </button>
      </form>
    </EmptyState>
  );
}
