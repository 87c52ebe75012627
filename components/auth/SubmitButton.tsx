import type { ReactNode } from 'react';
import { button } from '@/components/ui/styles';

/** The full-width button that sends a sign-in card's form, saying what it is doing while it waits. */
export function SubmitButton({
  busy,
  busyLabel,
  children,
}: {
  busy: boolean;
  busyLabel: string;
  children: ReactNode;
}) {
  return (
    <button type="submit" className={`${button.primary} w-full`} disabled={busy}>
      {busy ? busyLabel : children}
    </button>
  );
}
