import type { ReactNode } from 'react';
import Link from '@/components/ui/Link';
import { link } from '@/components/ui/styles';

/** The centred line under a sign-in card that leads on ("Remembered it? Sign in", "Go to sign in"). */
export function NextStepLink({ href, lead, children }: { href: string; lead?: string; children: ReactNode }) {
  return (
    <p className={lead ? 'text-center text-body text-basalt-600' : 'text-center text-body'}>
      {lead && `${lead} `}
      <Link href={href} className={link}>
        {children}
      </Link>
    </p>
  );
}
