'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useRef } from 'react';
import { Notice } from '@/components/ui/Notice';
import { fieldError } from '@/components/ui/api-client';
import { useApiMutation } from '@/components/ui/useApiMutation';
import { useLinkToken } from './link-token';
import { NextStepLink } from './NextStepLink';

/**
 * Confirms a new account with the e-mailed link as soon as the page opens, then goes to sign-in, which
 * says the account is confirmed. A link that has lapsed or was used says so and points to a new one.
 */
export function ConfirmAccount() {
  const router = useRouter();
  const token = useLinkToken();
  const { mutate: confirm, error } = useApiMutation(
    (token: string) => ({ method: 'POST', url: '/api/sign-up/confirm', body: { token } }),
    { refresh: false, onSuccess: () => router.replace('/sign-in?done=account-confirmed') },
  );
  const failed = error ? fieldError(error).message : '';
  // The link works once: a second post (a re-render, React's development double effects) would fail it.
  const posted = useRef(false);

  useEffect(() => {
    if (!token || posted.current) return;
    posted.current = true;
    confirm(token);
  }, [token, confirm]);

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
      <NextStepLink href="/sign-in">Go to sign in</NextStepLink>
    </div>
  );
}
