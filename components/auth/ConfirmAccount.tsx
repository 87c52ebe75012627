'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useRef, useState } from 'react';
import Link from '@/components/ui/Link';
import { Notice } from '@/components/ui/Notice';
import { fieldError, sendJson } from '@/components/ui/api-client';
import { link } from '@/components/ui/styles';
import { useLinkToken } from './link-token';

/**
 * Confirms a new account with the e-mailed link as soon as the page opens, then goes to sign-in, which
 * says the account is confirmed. A link that has lapsed or was used says so and points to a new one.
 */
export function ConfirmAccount() {
  const router = useRouter();
  const token = useLinkToken();
  const [failed, setFailed] = useState('');
  // The link works once: a second post (a re-render, React's development double effects) would fail it.
  const posted = useRef(false);

  useEffect(() => {
    if (!token || posted.current) return;
    posted.current = true;
    sendJson('POST', '/api/sign-up/confirm', { token })
      .then(() => router.replace('/sign-in?done=account-confirmed'))
      .catch((err: unknown) => setFailed(fieldError(err).message));
  }, [token, router]);

  if (token === undefined || (token && !failed)) {
    return (
      <p className="text-body text-basalt-600" role="status">
        Confirming your account…
      </p>
    );
  }
  return (
    <div className="space-y-4">
      <Notice tone="error">
        {failed || 'This link is incomplete. Copy the whole link from the e-mail, or ask for a new one.'}
      </Notice>
      <p className="text-body text-basalt-600">
        Already confirmed? Just sign in. If not, try to sign in anyway: the sign-in page then offers to send a
        new confirmation link.
      </p>
      <p className="text-center text-body">
        <Link href="/sign-in" className={link}>
          Go to sign in
        </Link>
      </p>
    </div>
  );
}
