import { applicableCautions, type CautionInput } from '@/shared/cautions';

/**
 * The cautions that apply to a design, a lamp type or a lamp, each with its source. Those the assessment
 * found a matching problem for come first and stand out. Server- and client-safe (no hooks).
 */
export function CautionList({ title = 'Safety', ...input }: CautionInput & { title?: string }) {
  const items = applicableCautions(input).sort((a, b) => Number(b.urgent) - Number(a.urgent));
  return (
    <section aria-label={title} className="space-y-2">
      <h2 className="text-lead font-semibold text-basalt-900">{title}</h2>
      <ul className="space-y-2">
        {items.map(({ caution, urgent }) => (
          <li
            key={caution.id}
            className={`rounded-md border px-4 py-3 text-body ${
              urgent
                ? 'border-ember-300 bg-ember-50 text-ember-900'
                : 'border-basalt-200 bg-white text-basalt-800'
            }`}
          >
            <p className="font-semibold">
              {urgent && <span className="mr-1">Check this:</span>}
              {caution.title}
            </p>
            <p className="mt-1">{caution.text}</p>
            <p className="mt-1 text-caption text-basalt-500">Source: {caution.source}</p>
          </li>
        ))}
      </ul>
      <p className="text-caption text-basalt-500">
        These notes do not replace a reptile-experienced vet, the lamp maker’s instructions or local
        electrical and fire codes.
      </p>
    </section>
  );
}
