'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { EmptyState } from '@/components/ui/EmptyState';
import { Field } from '@/components/ui/Field';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';

/** Shown to someone signed in who belongs to no organisation (e.g. just removed from one). */
export function NoOrganisation() {
  const router = useRouter();
  const [error, setError] = useState('');
  const [busy, setBusy] = useState(false);
  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const name = String(new FormData(e.currentTarget).get('name') ?? '');
    setBusy(true);
    setError('');
    try {
      const org = await sendJson<{ id: number }>('POST', '/api/organisations', { name });
      await sendJson('PUT', '/api/current-organisation', { organisationId: org.id });
      router.refresh();
    } catch (err) {
      setError(fieldError(err).message);
      setBusy(false);
    }
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
