import { decayFactor, LAMP_TECHS, type DecayCurve, type LampTech } from '@/simulation';
import { DAYS_PER_MONTH } from './dates';

/**
 * The technology's usual decay curve for one installed lamp, as a function of days since first use.
 * Lamps wear by hours lit, and the catalogue curves are per calendar month of ordinary use, taken as
 * about 12 hours a day (common practice, no published source); a lamp lit fewer hours ages more slowly.
 */
export const REFERENCE_HOURS_PER_DAY = 12;

export type DecaySource = {
  tech: LampTech;
  halfLifeMonths: number | null;
  decayPoints: [number, number][] | null;
};

export function catalogueCurve(t: DecaySource): DecayCurve {
  if (t.decayPoints && t.decayPoints.length > 0) return { points: t.decayPoints };
  if (t.halfLifeMonths !== null) return { halfLifeMonths: t.halfLifeMonths };
  return LAMP_TECHS[t.tech].decay;
}

export function defaultDecayFor(t: DecaySource, hoursPerDay: number): (days: number) => number {
  const curve = catalogueCurve(t);
  const pace = hoursPerDay / REFERENCE_HOURS_PER_DAY;
  return (days: number) => decayFactor(curve, (days / DAYS_PER_MONTH) * pace);
}
