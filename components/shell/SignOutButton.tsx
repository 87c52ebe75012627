'use client';

import { signOut } from 'next-auth/react';
import { useState } from 'react';
import { button } from '@/components/ui/styles';

export function SignOutButton({
  className = button.quiet,
  label = 'Sign out',
}: {
  className?: string;
  label?: string;
}) {
  const [busy, setBusy] = useState(false);
  return (
    <button
      type="button"
      className={className}
      disabled={busy}
      onClick={() => {
        setBusy(true);
        void signOut({ callbackUrl: '/' });
      }}
    >
      {busy ? 'Signing out…' : label}
    </button>
  );
}
