import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { SignUpForm } from '@/components/auth/SignUpForm';
import { currentUser } from '@/lib/session';

export const metadata: Metadata = { title: 'Create an account' };

export default async function SignUpPage() {
  if (await currentUser()) redirect('/enclosures');
  return (
    <>
      <h1 className="mb-1 text-title">Create an account</h1>
      <p className="mb-6 text-body text-basalt-600">
        Start an organisation for your shop, rescue, zoo or household. Joining someone else&apos;s? Use the
        link in their invitation e-mail instead.
      </p>
      <SignUpForm />
    </>
  );
}
