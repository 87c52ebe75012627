/**
 * Dates and times of moments (a reading taken, a mail received, a link's expiry) shown in the viewer's
 * time zone. The zone is always passed in: the server and the browser format the same moment in the
 * same zone, so a page rendered on the server and hydrated in the browser reads the same.
 * Calendar days stored as `YYYY-MM-DD` (a lamp's first use, a planned replacement) are not moments and
 * are never shifted; see `formatDay` in the lamp log.
 */

export type TimeShown = 'day' | 'time' | 'datetime';

/** The zone used before the browser has said which one it is in. */
export const FALLBACK_ZONE = 'UTC';

/** The cookie in which the browser tells the server its time zone, so the first paint is right. */
export const ZONE_COOKIE = 'baskwell_tz';

/** The zone name if this runtime knows it (an IANA name such as `America/New_York`), otherwise null. */
export function knownZone(zone: string | null | undefined): string | null {
  if (!zone || zone.length > 64 || !/^[A-Za-z0-9_+\-/]+$/.test(zone)) return null;
  try {
    return new Intl.DateTimeFormat('en-GB', { timeZone: zone }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

const OPTIONS: Record<TimeShown, Intl.DateTimeFormatOptions> = {
  day: { day: 'numeric', month: 'short', year: 'numeric' },
  time: { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' },
  datetime: {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  },
};

const formatters = new Map<string, Intl.DateTimeFormat>();
function formatter(zone: string, shown: TimeShown): Intl.DateTimeFormat {
  const key = `${zone}|${shown}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat('en-GB', { ...OPTIONS[shown], timeZone: knownZone(zone) ?? FALLBACK_ZONE });
    formatters.set(key, f);
  }
  return f;
}

/** "3 Dec 2026", "17:05" or "3 Dec 2026, 17:05" for a moment, in `zone`; '—' when there is none. */
export function formatMoment(
  value: string | Date | null | undefined,
  zone: string,
  shown: TimeShown,
): string {
  if (value === null || value === undefined || value === '') return '—';
  const d = typeof value === 'string' ? new Date(value) : value;
  if (Number.isNaN(d.getTime())) return typeof value === 'string' ? value : '—';
  return formatter(zone, shown).format(d);
}

/** The calendar day (`YYYY-MM-DD`) a moment falls on in `zone`: "today" for a date field. */
export function dayInZone(moment: Date, zone: string): string {
  const parts = new Intl.DateTimeFormat('en-GB', {
    timeZone: knownZone(zone) ?? FALLBACK_ZONE,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).formatToParts(moment);
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')}`;
}
