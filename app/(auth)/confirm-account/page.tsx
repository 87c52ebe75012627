import type { Metadata } from 'next';
import { ConfirmAccount } from '@/components/auth/ConfirmAccount';

export const metadata: Metadata = { title: 'Confirm your account', referrer: 'no-referrer' };

export default function ConfirmAccountPage() {
  return (
    <>
      <h1 className="mb-1 text-title">Confirm your account</h1>
      <p className="mb-6 text-body text-basalt-600">
        The link from the e-mail proves the address is yours; then sign in with the password you chose.
      </p>
      <ConfirmAccount />
    </>
  );
}
