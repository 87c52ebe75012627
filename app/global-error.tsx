'use client';

import type { ErrorBoundaryProps } from '@/components/shell/ErrorPanel';

/** Last resort when the root layout itself fails: plain markup, no app styles can be assumed. */
export default function GlobalError({ reset }: ErrorBoundaryProps) {
  return (
    <html lang="en">
      <body style={{ fontFamily: 'system-ui, sans-serif', padding: '3rem', maxWidth: 640, margin: '0 auto' }}>
        <h1>Baskwell could not load this page</h1>
        <p>Something went wrong on our side. Nothing you saved is lost. Try again in a moment.</p>
        <button type="button" onClick={reset} style={{ padding: '0.5rem 1rem' }}>
          Try again
        </button>
      </body>
    </html>
  );
}
