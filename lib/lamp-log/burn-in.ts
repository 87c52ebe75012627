import { addDays } from './dates';

/**
 * Burn-in: a new UV lamp loses output fastest over its first hundred or so hours, so the readings that
 * describe its working life start after that. Practice is to burn a lamp in and take the baseline reading
 * then, with the lamp on for several minutes first (common practice, no published source).
 */
export const BURN_IN_HOURS = 100;

/** Days of use that make up the burn-in at this many hours a day. */
export function burnInDays(hoursPerDay: number): number {
  return BURN_IN_HOURS / Math.max(0.5, hoursPerDay);
}

/** The first day the baseline reading may be taken: the day after the burn-in's last hour. */
export function baselineDueOn(firstUsedOn: string, hoursPerDay: number): string {
  return addDays(firstUsedOn, Math.ceil(burnInDays(hoursPerDay)));
}

/** Whether a reading `days` after first use falls in the burn-in. */
export const inBurnIn = (days: number, hoursPerDay: number) => days < burnInDays(hoursPerDay);
