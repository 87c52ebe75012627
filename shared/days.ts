/** Calendar days (`YYYY-MM-DD`) as the pages, slips and e-mails write them. Pure. */

export const MONTH_NAMES = [
  'Jan',
  'Feb',
  'Mar',
  'Apr',
  'May',
  'Jun',
  'Jul',
  'Aug',
  'Sep',
  'Oct',
  'Nov',
  'Dec',
];

/** 2025-03-01 → "1 Mar 2025" (UTC, so the date never moves with the viewer's time zone). */
export function formatDay(iso: string | null | undefined): string {
  if (!iso) return '—';
  const d = new Date(iso.length === 10 ? `${iso}T00:00:00Z` : iso);
  if (Number.isNaN(d.getTime())) return iso;
  return `${d.getUTCDate()} ${MONTH_NAMES[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
}

/**
 * A sentence with calendar days written as `YYYY-MM-DD` (the outlook's reasons, stored with the lamp and
 * also used in e-mails) with each day as the pages write days: "13 Dec 2026".
 */
export function readableDays(text: string): string {
  return text.replace(/\b\d{4}-\d{2}-\d{2}\b/g, (iso) => formatDay(iso));
}
