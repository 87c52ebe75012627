/**
 * Effective values of a design's optional fields: the object's own value, else the documented default.
 */
import type { Design, Enclosure, FoliageObject, GlassObject, LampObject, ScreenObject } from './schema';
import { decayFactor, LAMP_TECHS, type DecayCurve } from './techs';
import { techDecay } from './lifetime';
import {
  DEFAULT_FOLIAGE_UVB_TRANSMISSION,
  DEFAULT_GLASS_UVB_TRANSMISSION,
  DEFAULT_SCREEN_UVB_TRANSMISSION,
} from './materials';

export const DEFAULT_ROOM_TEMP_C = 24;

export interface ResolvedLamp {
  id: string;
  tech: LampObject['tech'];
  form: 'tube' | 'bulb';
  x: number;
  y: number;
  /** Tube length, cm; 0 for a bulb. */
  length: number;
  uvbAt30: number;
  uviPerUvb: number;
  reflectorGain: number;
  beamDeg: number;
  watts: number;
  ageMonths: number;
  radiantFraction: number;
  glassIrTransmission: number;
  beamHeatShare: number;
  decay: DecayCurve;
}

export function resolveLamp(lamp: LampObject): ResolvedLamp {
  const d = LAMP_TECHS[lamp.tech];
  return {
    id: lamp.id,
    tech: lamp.tech,
    form: lamp.form,
    x: lamp.x,
    y: lamp.y,
    length: lamp.form === 'tube' ? (lamp.length ?? 0) : 0,
    uvbAt30: lamp.uvbAt30 ?? d.uvbAt30,
    uviPerUvb: lamp.uviPerUvb ?? d.uviPerUvb,
    reflectorGain: lamp.reflectorGain ?? 1,
    beamDeg: lamp.beamDeg ?? d.beamDeg,
    watts: lamp.watts ?? d.watts,
    ageMonths: lamp.ageMonths ?? 0,
    radiantFraction: lamp.radiantFraction ?? d.radiantFraction,
    glassIrTransmission: d.glassIrTransmission,
    beamHeatShare: d.beamHeatShare,
    decay: lamp.decay ?? techDecay(lamp.tech),
  };
}

/** UVB output factor of a lamp after its own age plus `addMonths`. Heat output is taken not to age. */
export function lampUvbFactor(lamp: ResolvedLamp, addMonths = 0): number {
  return decayFactor(lamp.decay, lamp.ageMonths + addMonths);
}

/** The plane the side view shows, cm from the front (default: half the depth). */
export function sectionZ(enclosure: Enclosure): number {
  return enclosure.sectionZ ?? enclosure.depth / 2;
}

/** How far from the front a lamp hangs, cm (default: half the depth). */
export function lampZ(lamp: Pick<LampObject, 'z'>, enclosure: Enclosure): number {
  return lamp.z ?? enclosure.depth / 2;
}

export function roomTempC(design: Design): number {
  return design.enclosure.roomTempC ?? DEFAULT_ROOM_TEMP_C;
}

export function barrierUvbTransmission(o: ScreenObject | GlassObject | FoliageObject): number {
  if (o.uvbTransmission !== undefined) return o.uvbTransmission;
  if (o.type === 'screen') return DEFAULT_SCREEN_UVB_TRANSMISSION;
  if (o.type === 'glass') return DEFAULT_GLASS_UVB_TRANSMISSION;
  return DEFAULT_FOLIAGE_UVB_TRANSMISSION;
}

/** Infrared transmission; glass without its own value depends on the lamp (near- vs long-wave infrared). */
export function barrierIrTransmission(
  o: ScreenObject | GlassObject | FoliageObject,
  lamp: ResolvedLamp,
): number {
  if (o.irTransmission !== undefined) return o.irTransmission;
  if (o.type === 'glass') return lamp.glassIrTransmission;
  return barrierUvbTransmission(o);
}
