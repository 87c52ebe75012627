import type { ReactNode } from 'react';
import { BrandMark } from '@/components/shell/BrandMark';
import { QueryProvider } from '@/components/ui/QueryProvider';

/** Sign-in, sign-up and invitation pages: one narrow card on a calm background. */
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main id="main" className="flex flex-1 flex-col items-center px-4 py-12">
      <div className="mb-8">
        <BrandMark />
      </div>
      <div className="w-full max-w-md rounded-xl border border-basalt-200 bg-white p-6 shadow-sm sm:p-8">
        <QueryProvider>{children}</QueryProvider>
      </div>
    </main>
  );
}
