'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { Select } from '@/components/ui/Select';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { button } from '@/components/ui/styles';

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
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [general, setGeneral] = useState('');
  const [sent, setSent] = useState('');
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const formEl = e.currentTarget;
    const form = new FormData(formEl);
    const email = String(form.get('email') ?? '');
    const role = (roles.length === 1 ? roles[0] : String(form.get('role'))) as Role;
    setBusy(true);
    setErrors({});
    setGeneral('');
    setSent('');
    try {
      await sendJson('POST', '/api/invitations', { organisationId, email, role });
      setSent(`Invitation sent to ${email.trim()}. The link works for 7 days.`);
      formEl.reset();
      router.refresh();
    } catch (error) {
      const { field, message } = fieldError(error);
      if (field === 'email' || field === 'role') setErrors({ [field]: message });
      else setGeneral(message);
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={onSubmit} className="space-y-3" noValidate>
      {general && <Notice tone="error">{general}</Notice>}
      {sent && <Notice tone="success">{sent}</Notice>}
      <div className="flex flex-col gap-3 sm:flex-row sm:items-start">
        <Field
          label="Email"
          name="email"
          type="email"
          required
          className="flex-1"
          error={errors.email}
          placeholder="name@example.com"
        />
        {roles.length > 1 && (
          <Select label="Role" name="role" defaultValue={roles[0]} error={errors.role} className="sm:w-72">
            {roles.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABEL[r]}
              </option>
            ))}
          </Select>
        )}
        <div className="sm:pt-7">
          <button type="submit" className={button.primary} disabled={busy}>
            {busy ? 'Sending…' : submitLabel}
          </button>
        </div>
      </div>
    </form>
  );
}
