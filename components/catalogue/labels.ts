import { LAMP_TECHS, type LampTech as LampTechId } from '@/simulation';
import type { LampTypeDto } from '@/lib/lamp-types/schema';

/** The engine's own name of each technology, so the catalogue and the studio say the same thing. */
export function techLabel(tech: LampTechId): string {
  return LAMP_TECHS[tech].label;
}

export function emitsUv(t: Pick<LampTypeDto, 'uvbAt30'>): boolean {
  return t.uvbAt30 > 0;
}

export const fmt = (v: number, decimals = 1) => (Math.round(v * 10 ** decimals) / 10 ** decimals).toString();

export function months(v: number | null, none: string): string {
  return v === null ? none : `${fmt(v, 1)} months`;
}
