import { EXAMPLE_DATA_LABEL, EXAMPLE_DATA_NOTE } from '@/shared/example-data';

/**
 * The mark of invented example data (the demo organisations): a banner over a page or table, or a small
 * badge beside a name.
 */
export function ExampleDataMark({ compact = false }: { compact?: boolean }) {
  if (compact) {
    return (
      <span
        className="ml-2 inline-block rounded border border-sand-300 bg-sand-50 px-1.5 py-0.5 align-middle text-caption font-semibold text-sand-900"
        title={EXAMPLE_DATA_NOTE}
        data-testid="example-data"
      >
        {EXAMPLE_DATA_LABEL}
      </span>
    );
  }
  return (
    <p
      className="mb-4 rounded-md border border-sand-300 bg-sand-50 px-4 py-2 text-body font-medium text-sand-900"
      data-testid="example-data"
    >
      {EXAMPLE_DATA_NOTE}
    </p>
  );
}
