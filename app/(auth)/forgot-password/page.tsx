import type { Metadata } from 'next';
import { ForgotPasswordForm } from '@/components/auth/ForgotPasswordForm';

export const metadata: Metadata = { title: 'Forgot your password?' };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="mb-1 text-title">Forgot your password?</h1>
      <p className="mb-6 text-body text-basalt-600">
        Enter the e-mail address of your account. We will send it a link to choose a new password.
      </p>
      <ForgotPasswordForm />
    </>
  );
}
