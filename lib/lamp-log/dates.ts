/** Calendar days as whole UTC days, so "due on" dates do not move with the server's time zone. */

export const DAY_MS = 86_400_000;
export const DAYS_PER_MONTH = 365.25 / 12;

const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;

/** Days since 1970-01-01 of a YYYY-MM-DD date or an instant (its UTC day, with the time as a fraction). */
export function dayNumber(d: string | Date): number {
  if (typeof d === 'string') {
    if (!ISO_DAY.test(d)) return new Date(d).getTime() / DAY_MS;
    const [y, m, day] = d.split('-').map(Number) as [number, number, number];
    return Date.UTC(y, m - 1, day) / DAY_MS;
  }
  return d.getTime() / DAY_MS;
}

export function isoDay(dayNum: number): string {
  return new Date(Math.floor(dayNum) * DAY_MS).toISOString().slice(0, 10);
}

export function todayIso(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

export function addDays(iso: string, days: number): string {
  return isoDay(dayNumber(iso) + days);
}
