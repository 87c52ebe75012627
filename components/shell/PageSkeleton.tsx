/**
 * The shape of a list page while its data loads, announced to screen readers. Used only by the
 * loading.tsx of pages that never answer "not found": a loading boundary starts the response (status
 * 200) before the page runs, so a page that may call notFound() must not sit below one.
 */
export function PageSkeleton() {
  return (
    <div role="status" aria-live="polite" className="animate-pulse">
      <span className="sr-only">Loading…</span>
      <div className="h-8 w-48 rounded bg-basalt-200" />
      <div className="mt-3 h-4 w-96 max-w-full rounded bg-basalt-200" />
      <div className="mt-8 space-y-3">
        {[0, 1, 2, 3].map((i) => (
          <div key={i} className="h-12 rounded-lg bg-basalt-100" />
        ))}
      </div>
    </div>
  );
}
