import type { Metadata } from 'next';
import { ResetPasswordForm } from '@/components/auth/ResetPasswordForm';

export const metadata: Metadata = { title: 'Choose a new password', referrer: 'no-referrer' };

export default function ResetPasswordPage() {
  return (
    <>
      <h1 className="mb-1 text-title">Choose a new password</h1>
      <p className="mb-6 text-body text-basalt-600">
        Setting it signs you out on every device; then sign in with the new password.
      </p>
      <ResetPasswordForm />
    </>
  );
}
