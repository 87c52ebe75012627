'use client';

import { useRouter } from 'next/navigation';
import type { FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { TextArea } from '@/components/ui/TextArea';
import { button } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';
import type { CustomerDto } from '@/lib/customers/queries';

/** Adds a customer or changes one. Consent to reminder e-mails is a plain yes/no; the server dates it. */
export function CustomerForm({
  organisationId,
  customer,
}: {
  organisationId: number;
  customer: CustomerDto | null;
}) {
  const router = useRouter();
  const write = useApiMutation<Record<string, unknown>, { customer: CustomerDto }>(
    (body) =>
      customer
        ? { method: 'PATCH', url: `/api/customers/${customer.id}`, body }
        : { method: 'POST', url: '/api/customers', body: { organisationId, ...body } },
    { onSuccess: (saved) => router.push(`/customers/${saved.customer.id}`) },
  );
  // Still busy once saved: the page is on its way to the customer.
  const busy = write.isPending || write.isSuccess;
  const error = write.error;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const str = (k: string) => String(form.get(k) ?? '').trim();
    const body = {
      name: str('name'),
      email: str('email') || null,
      phone: str('phone') || null,
      notes: str('notes') || null,
      reminderConsent: form.get('reminderConsent') === 'on',
    };
    write.mutate(body);
  }

  const err = (f: string) => (error?.field === f ? error.message : null);
  return (
    <form
      onSubmit={submit}
      className="max-w-xl space-y-4"
      aria-label={customer ? 'Change customer' : 'New customer'}
      noValidate
    >
      <Field
        label="Name"
        name="name"
        required
        autoComplete="off"
        defaultValue={customer?.name ?? ''}
        error={err('name')}
      />
      <Field
        label="E-mail (optional)"
        name="email"
        type="email"
        inputMode="email"
        autoComplete="off"
        defaultValue={customer?.email ?? ''}
        error={err('email')}
      />
      <Field
        label="Phone (optional)"
        name="phone"
        type="tel"
        inputMode="tel"
        autoComplete="off"
        defaultValue={customer?.phone ?? ''}
        error={err('phone')}
      />
      <TextArea
        label="Notes (optional)"
        name="notes"
        rows={3}
        defaultValue={customer?.notes ?? ''}
        error={err('notes')}
      />
      <label className="flex items-start gap-2 text-body text-basalt-800">
        <input
          type="checkbox"
          name="reminderConsent"
          className="mt-1 h-5 w-5"
          defaultChecked={Boolean(customer?.reminderConsentAt)}
        />
        <span>
          The customer agrees to reminder e-mails about re-testing their lamps. The date is recorded; every
          e-mail carries a one-click link to stop them.
        </span>
      </label>
      {error && <Notice tone="error">{error.message}</Notice>}
      <div className="flex gap-2">
        <button type="submit" className={button.primary} disabled={busy}>
          {busy ? 'Saving…' : customer ? 'Save changes' : 'Add customer'}
        </button>
        <button type="button" className={button.secondary} onClick={() => router.back()}>
          Cancel
        </button>
      </div>
    </form>
  );
}
