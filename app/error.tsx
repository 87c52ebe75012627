'use client';

import { ErrorPanel, type ErrorBoundaryProps } from '@/components/shell/ErrorPanel';

/** Catches what a page throws outside the signed-in area. */
export default function RootError({ error, reset }: ErrorBoundaryProps) {
  return (
    <main id="main" className="mx-auto w-full max-w-2xl flex-1 px-4 py-16">
      <ErrorPanel error={error} reset={reset} />
    </main>
  );
}
