'use client';

import { useRef, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { Select } from '@/components/ui/Select';
import { button } from '@/components/ui/styles';
import { useApiMutation } from '@/components/ui/useApiMutation';

type Role = 'owner' | 'staff' | 'keeper';

const ROLE_LABEL: Record<Role, string> = {
  keeper: 'Keeper — their own enclosures',
  staff: 'Staff — every enclosure',
  owner: 'Owner — also members and catalogues',
};

/** Sends an invitation e-mail. With one allowed role the role picker is left out. */
export function InviteForm({
  organisationId,
  roles,
  submitLabel = 'Send invitation',
}: {
  organisationId: number;
  roles: Role[];
  submitLabel?: string;
}) {
  const formRef = useRef<HTMLFormElement>(null);
  const invite = useApiMutation(
    ({ email, role }: { email: string; role: Role }) => ({
      method: 'POST',
      url: '/api/invitations',
      body: { organisationId, email, role },
    }),
    { onSuccess: () => formRef.current?.reset() },
  );
  const error = invite.error;
  // A refused e-mail or role is shown beside its field; anything else above the form.
  const field = error?.field === 'email' || error?.field === 'role' ? error.field : null;
  const general = error && !field ? error.message : '';
  const sent = invite.isSuccess
    ? `Invitation sent to ${invite.variables.email.trim()}. The link works for 7 days.`
    : '';

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const email = String(form.get('email') ?? '');
    const role = (roles.length === 1 ? roles[0] : String(form.get('role'))) as Role;
    invite.mutate({ email, role });
  }

  return (
    <form ref={formRef} onSubmit={onSubmit} className="space-y-3" noValidate>
      {general && <Notice tone="error">{general}</Notice>}
      {sent && <Notice tone="success">{sent}</Notice>}
      <div className="flex flex-col gap-3 sm:flex-row sm:items-start">
        <Field
          label="Email"
          name="email"
          type="email"
          required
          className="flex-1"
          error={field === 'email' ? error?.message : undefined}
          placeholder="name@example.com"
        />
        {roles.length > 1 && (
          <Select
            label="Role"
            name="role"
            defaultValue={roles[0]}
            error={field === 'role' ? error?.message : undefined}
            className="sm:w-72"
          >
            {roles.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABEL[r]}
              </option>
            ))}
          </Select>
        )}
        <div className="sm:pt-7">
          <button type="submit" className={button.primary} disabled={invite.isPending}>
            {invite.isPending ? 'Sending…' : submitLabel}
          </button>
        </div>
      </div>
    </form>
  );
}
