import { controlSummary } from '@/simulation';

/** The standing caution on every page: what the numbers are, and who has the last word. */
export function SafetyNote() {
  return (
    <footer className="border-t border-basalt-200 bg-white">
      <div className="mx-auto max-w-6xl px-4 py-5 text-caption text-basalt-600 sm:px-6">
        <p>
          <strong className="font-semibold text-basalt-800">Safety.</strong> Every figure Baskwell shows is an
          estimate: verify it in the enclosure with a UV meter and a thermometer before an animal lives with
          it. UV lamps can injure eyes and skin; lamps within reach can burn, and heat sources can start fires
          — guard them, and control each lamp the way its type allows. {controlSummary()} Defer to a
          reptile-experienced vet, the lamp maker&apos;s instructions and local electrical and fire codes.
        </p>
      </div>
    </footer>
  );
}
