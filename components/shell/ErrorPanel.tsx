'use client';

import Link from '@/components/ui/Link';
import { button } from '@/components/ui/styles';

/** What Next hands an error boundary (`error.tsx`, `global-error.tsx`): the error and a way to try again. */
export type ErrorBoundaryProps = { error: Error & { digest?: string }; reset: () => void };

/**
 * What people see when a page fails. Server errors reach the browser without their message (Next hides it
 * in production), so the text is written for the likely causes rather than echoing internals.
 */
export function ErrorPanel({ error, reset }: ErrorBoundaryProps) {
  return (
    <div role="alert" className="rounded-lg border border-ember-200 bg-white p-6 shadow-sm">
      <h1 className="text-title text-ember-800">This page could not be shown</h1>
      <p className="mt-2 text-body text-basalt-700">
        Something went wrong while loading it — most often the database is briefly unreachable. Nothing you
        saved is lost. Try again in a few seconds.
      </p>
      {error.digest && (
        <p className="mt-2 text-caption text-basalt-500">
          If it keeps happening, give this reference to whoever runs Baskwell: <code>{error.digest}</code>
        </p>
      )}
      <div className="mt-5 flex gap-2">
        <button type="button" className={button.primary} onClick={reset}>
          Try again
        </button>
        <Link href="/enclosures" className={button.secondary}>
          Go to enclosures
        </Link>
      </div>
    </div>
  );
}
