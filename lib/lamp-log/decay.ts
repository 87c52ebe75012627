import { decayFactor, ORDINARY_HOURS_PER_DAY, techDecay, type DecayCurve, type LampTech } from '@/simulation';
import { DAYS_PER_MONTH } from './dates';

/**
 * The technology's usual decay curve for one installed lamp, as a function of days since first use.
 * Lamps wear by hours lit, and the catalogue curves are per calendar month of ordinary use
 * (ORDINARY_HOURS_PER_DAY, the engine's lifetime table); a lamp lit fewer hours ages more slowly.
 */

export type DecaySource = {
  tech: LampTech;
  halfLifeMonths: number | null;
  decayPoints: [number, number][] | null;
  /** The shop's measured curve when adopted for the type (lib/population): it replaces the catalogue's. */
  adoptedCurve?: { points: [number, number][]; lamps: number } | null;
};

export function catalogueCurve(t: DecaySource): DecayCurve {
  if (t.adoptedCurve && t.adoptedCurve.points.length > 0) return { points: t.adoptedCurve.points };
  if (t.decayPoints && t.decayPoints.length > 0) return { points: t.decayPoints };
  if (t.halfLifeMonths !== null) return { halfLifeMonths: t.halfLifeMonths };
  return techDecay(t.tech);
}

export function defaultDecayFor(t: DecaySource, hoursPerDay: number): (days: number) => number {
  const curve = catalogueCurve(t);
  const pace = hoursPerDay / ORDINARY_HOURS_PER_DAY;
  return (days: number) => decayFactor(curve, (days / DAYS_PER_MONTH) * pace);
}

/** Which curve a lamp's ageing follows, in the words the pages show beside the figures. */
export function ageingSource(t: DecaySource): string {
  if (t.adoptedCurve && t.adoptedCurve.points.length > 0) return measuredCurveNote(t.adoptedCurve.lamps);
  return 'Ageing: the catalogue’s curve for this type.';
}

/** The words for ageing by the shop's adopted curve; the studio names the type, a lamp's own page does not. */
export function measuredCurveNote(lamps: number, typeName?: string): string {
  return `Ageing: your shop’s measured curve for ${typeName ?? 'this type'}, ${lamps} lamp${lamps === 1 ? '' : 's'}.`;
}
