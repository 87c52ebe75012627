/** Shown while a signed-in page loads its data: the shape of a page, announced to screen readers. */
export default function Loading() {
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
