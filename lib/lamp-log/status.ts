/** A lamp's status in the lamp log. Pure and tiny, so client code can import it without the fit. */

export const STATUSES = ['replace', 'test-soon', 'fine', 'heat-only', 'retired'] as const;
export type Status = (typeof STATUSES)[number];

export const STATUS_LABEL: Record<Status, string> = {
  fine: 'Fine',
  'test-soon': 'Test soon',
  replace: 'Replace',
  retired: 'Retired',
  'heat-only': 'No UV (heat)',
};

/** Most urgent first: the lamp log's default order and the stored `status_rank`. */
export const STATUS_RANK: Record<Status, number> = {
  replace: 0,
  'test-soon': 1,
  fine: 2,
  'heat-only': 3,
  retired: 4,
};

export const isStatus = (v: unknown): v is Status => (STATUSES as readonly unknown[]).includes(v);
