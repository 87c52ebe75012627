'use client';

import { useState } from 'react';
import Link from '@/components/ui/Link';
import { button, link } from '@/components/ui/styles';

/**
 * A first-visit hint on the enclosures page of the demo organisation: where to look first. Put away with
 * "Got it"; a cookie keeps it away in this browser (the server then no longer renders it).
 */
export function FirstDesignHint({
  cookie,
  designHref,
  compareHref,
}: {
  cookie: string;
  designHref: string;
  compareHref: string | null;
}) {
  const [open, setOpen] = useState(true);
  if (!open) return null;
  const dismiss = () => {
    document.cookie = `${cookie}=1; path=/; max-age=31536000; samesite=lax`;
    setOpen(false);
  };
  return (
    <section
      aria-labelledby="first-hint-title"
      data-testid="first-design-hint"
      className="mb-6 flex flex-wrap items-start gap-4 rounded-md border border-sky-200 bg-sky-50 px-4 py-3 text-body text-sky-900"
    >
      <div className="min-w-0 flex-1">
        <h2 id="first-hint-title" className="font-semibold">
          New here? Start with the desert enclosure’s design
        </h2>
        <p className="mt-1">
          The example desert vivarium has two variants: the keeper’s current set-up and an improved one.{' '}
          <Link href={designHref} className={link}>
            Open the desert enclosure’s design
          </Link>
          {compareHref && (
            <>
              , or{' '}
              <Link href={compareHref} className={link}>
                compare the two variants
              </Link>
            </>
          )}
          . Everything in this organisation is invented example data.
        </p>
      </div>
      <button type="button" onClick={dismiss} className={button.secondary}>
        Got it
      </button>
    </section>
  );
}
