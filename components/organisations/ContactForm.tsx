'use client';

import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { button, card } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { organisationContactBody } from '@/lib/organisations/schemas';

type Draft = { contactPhone: string; contactEmail: string; contactAddress: string };

/**
 * How customers reach the shop (each optional; empty clears it). Checked with the API's own schema
 * before sending, so a mistake shows beside its field; a field the server refuses shows there too.
 */
export function ContactForm({ organisationId, initial }: { organisationId: number; initial: Draft }) {
  const [draft, setDraft] = useState<Draft>(initial);
  const [refused, setRefused] = useState<Record<string, string>>({});
  const save = useApiMutation(
    (body: Draft) => ({ method: 'PATCH', url: `/api/organisations/${organisationId}`, body }),
    { onSuccess: () => setRefused({}) },
  );
  const serverField = save.error?.field;
  const error = (f: keyof Draft) => refused[f] ?? (serverField === f ? save.error!.message : null);

  function submit(e: FormEvent) {
    e.preventDefault();
    const checked = organisationContactBody.safeParse(draft);
    if (!checked.success) {
      const byField: Record<string, string> = {};
      for (const issue of checked.error.issues) byField[String(issue.path[0] ?? '')] ??= issue.message;
      setRefused(byField);
      return;
    }
    setRefused({});
    save.mutate(draft);
  }

  const field = (f: keyof Draft) => ({
    name: f,
    value: draft[f],
    error: error(f),
    onChange: (e: { target: { value: string } }) => {
      save.reset();
      setDraft((d) => ({ ...d, [f]: e.target.value }));
    },
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Shop contact" className={`${card} max-w-xl space-y-4 p-5`}>
      <h2 className="text-lead font-semibold text-basalt-900">Shop contact</h2>
      <p className="text-body text-basalt-600">
        Each is optional; leave one empty to keep it off the slips and e-mails.
      </p>
      <Field label="Address (one line)" autoComplete="street-address" {...field('contactAddress')} />
      <Field label="Phone" type="tel" inputMode="tel" autoComplete="tel" {...field('contactPhone')} />
      <Field label="E-mail" type="email" inputMode="email" autoComplete="email" {...field('contactEmail')} />
      {save.error && !serverField && <Notice tone="error">{save.error.message}</Notice>}
      {save.isSuccess && <Notice tone="success">Saved: the next slips and e-mails show it.</Notice>}
      <button type="submit" className={`${button.primary} min-h-11`} disabled={save.isPending}>
        {save.isPending ? 'Saving…' : 'Save contact'}
      </button>
    </form>
  );
}
