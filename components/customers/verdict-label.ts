/** A verdict in the words the customer is told. */
export const VERDICT_LABEL: Record<string, string> = {
  keep: 'Keep it',
  'test-again': 'Test again',
  replace: 'Replace it',
  'no-verdict': 'No verdict',
};
