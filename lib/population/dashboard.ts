import 'server-only';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { addDays, dayNumber, DAYS_PER_MONTH, isoDay, todayIso } from '@/lib/lamp-log/dates';
import { LAMP_TECHS, type LampTech } from '@/simulation';

/**
 * The counter's figures for one organisation: how many tests a week, and which lamps it told customers
 * to replace, by technology and by age. Counted in the database (a fixed number of queries whatever the
 * number of tests); owners and staff only (the caller checks `shop-figures`).
 */

/** Weeks shown in the tests-per-week plot, the current one last. */
export const WEEKS = 26;

/** Age bands in months of calendar age at the latest test (the lamp's hours a day vary; the shop asks
 * customers "how old is it?"). */
export const AGE_BANDS = [
  { label: 'under 6 months', from: 0, to: 6 },
  { label: '6–12 months', from: 6, to: 12 },
  { label: '12–18 months', from: 12, to: 18 },
  { label: '18 months or more', from: 18, to: Infinity },
] as const;

export type ShareRow = { label: string; lamps: number; replace: number };

export type CounterFigures = {
  weeks: { weekOf: string; tests: number }[];
  byTechnology: ShareRow[];
  byAge: ShareRow[];
  /** Counter lamps judged (a verdict of keep, test again or replace at their latest test). */
  judged: number;
  tests: number;
};

/** Monday of the UTC week a day falls in. */
export function weekOf(day: string): string {
  const n = Math.floor(dayNumber(day));
  // 1970-01-01 was a Thursday: day 0 is weekday 3 counting from Monday.
  return isoDay(n - ((n + 3) % 7));
}

/** A DATE or DATETIME column as YYYY-MM-DD, whether the driver gave a string or a Date. */
const dayOf = (v: string | Date) => (typeof v === 'string' ? v.slice(0, 10) : v.toISOString().slice(0, 10));

export async function counterFigures(organisationId: number, today = todayIso()): Promise<CounterFigures> {
  const sequelize = getSequelize();
  const firstWeek = addDays(weekOf(today), -7 * (WEEKS - 1));
  const [perDay, latest] = await Promise.all([
    sequelize.query<{ day: string | Date; tests: number }>(
      `SELECT DATE(r.taken_at) AS day, COUNT(*) AS tests
         FROM counter_readings r JOIN counter_lamps l ON l.id = r.counter_lamp_id
        WHERE l.organisation_id = :org AND r.taken_at >= :from
        GROUP BY DATE(r.taken_at)`,
      { replacements: { org: organisationId, from: `${firstWeek} 00:00:00` }, type: QueryTypes.SELECT },
    ),
    // Each counter lamp's latest test: its verdict, the lamp's technology and its age then.
    sequelize.query<{
      tech: LampTech;
      first_used_on: string | Date;
      taken_at: string | Date;
      verdict: string;
    }>(
      `SELECT t.tech, l.first_used_on, r.taken_at, r.verdict
         FROM counter_lamps l
         JOIN lamp_types t ON t.id = l.lamp_type_id
         JOIN counter_readings r ON r.id = (
           SELECT r2.id FROM counter_readings r2 WHERE r2.counter_lamp_id = l.id
            ORDER BY r2.taken_at DESC, r2.id DESC LIMIT 1)
        WHERE l.organisation_id = :org`,
      { replacements: { org: organisationId }, type: QueryTypes.SELECT },
    ),
  ]);
  const byWeek = new Map<string, number>();
  for (const d of perDay) {
    const w = weekOf(dayOf(d.day));
    byWeek.set(w, (byWeek.get(w) ?? 0) + Number(d.tests));
  }
  const weeks = Array.from({ length: WEEKS }, (_, i) => {
    const w = addDays(firstWeek, 7 * i);
    return { weekOf: w, tests: byWeek.get(w) ?? 0 };
  });

  // "no-verdict" (a heat lamp: nothing for a UV meter to judge) is left out of the shares.
  const judged = latest.filter((l) => l.verdict !== 'no-verdict');
  const techs = new Map<string, ShareRow>();
  const ages = AGE_BANDS.map((b) => ({ label: b.label, lamps: 0, replace: 0 }));
  for (const l of judged) {
    const label = LAMP_TECHS[l.tech]?.label ?? l.tech;
    const row = techs.get(label) ?? techs.set(label, { label, lamps: 0, replace: 0 }).get(label)!;
    const replaced = l.verdict === 'replace' ? 1 : 0;
    row.lamps++;
    row.replace += replaced;
    const months = (dayNumber(dayOf(l.taken_at)) - dayNumber(dayOf(l.first_used_on))) / DAYS_PER_MONTH;
    const band = AGE_BANDS.findIndex((b) => months >= b.from && months < b.to);
    const age = ages[Math.max(0, band)]!;
    age.lamps++;
    age.replace += replaced;
  }
  return {
    weeks,
    byTechnology: [...techs.values()].sort((a, b) => b.lamps - a.lamps || a.label.localeCompare(b.label)),
    byAge: ages,
    judged: judged.length,
    tests: weeks.reduce((s, w) => s + w.tests, 0),
  };
}
