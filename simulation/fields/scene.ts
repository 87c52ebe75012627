/**
 * A design compiled for computation: lamps with their per-technology defaults resolved and their
 * intensities worked out once, barriers as convex shapes with per-lamp transmissions.
 */
import type { Design, LampObject } from '../model/schema';
import { lampZ, resolveLamp, roomTempC, sectionZ, type ResolvedLamp } from '../model/resolve';
import { compileOccluders, type Occluder } from '../geometry/occluders';
import { beamTan, coneSolidAngle, intensityFromE30 } from '../sources/point';
import { tubeIntensityFromE30, tubeIntensityFromPower } from '../sources/tube';
import { topAirRiseK } from './heat';

/** W/cm² -> W/m² (lengths are in cm). */
const CM2_TO_M2 = 1e4;

export interface LampGeom {
  lamp: ResolvedLamp;
  tube: boolean;
  x: number;
  y: number;
  /**
   * Distance of the lamp in front of (−) or behind (+) the section plane, cm, and its square. Barriers span
   * the whole depth, so shadows are found in the section's projection; only the distances use dz.
   */
  dz: number;
  dz2: number;
  /** Extent along x (a bulb: s1 = s2 = x). */
  s1: number;
  s2: number;
  /** UVB intensity, new, with reflector gain: bulb µW/sr (×cm² → µW/cm² via h/r³); tube per cm of tube. */
  uvI: number;
  /** Radiant (heat) intensity in the same geometry, giving W/m² (for a bulb: inside its beam). */
  irI: number;
  /** Bulb: radiant intensity below the lamp outside its beam (the share not kept in the beam); 0 for tubes. */
  irOut: number;
  /** Bulb beam half-width factor (|dx| ≤ h·beamTan); Infinity for tubes. */
  beamTan: number;
  /** Per occluder: UVB and IR transmission along a path from this lamp. */
  tUv: Float64Array;
  tIr: Float64Array;
}

export interface Scene {
  width: number;
  height: number;
  depth: number;
  /** The plane the fields are computed in, cm from the front. */
  sectionZ: number;
  roomC: number;
  airRiseK: number;
  lamps: LampGeom[];
  occluders: Occluder[];
}

/** @param dz the lamp's distance from the section plane (lamp z − section z), cm. */
export function compileLamp(obj: LampObject, occluders: Occluder[], dz = 0): LampGeom {
  const lamp = resolveLamp(obj);
  const tube = lamp.form === 'tube';
  const gain = lamp.reflectorGain;
  const radiantW = lamp.watts * lamp.radiantFraction;
  let uvI: number;
  let irI: number;
  let irOut = 0;
  if (tube) {
    uvI = tubeIntensityFromE30(lamp.uvbAt30, lamp.length) * gain;
    irI = tubeIntensityFromPower(radiantW, lamp.length) * CM2_TO_M2 * gain;
  } else {
    uvI = intensityFromE30(lamp.uvbAt30) * gain;
    // A point source putting radiant power P into a cone of solid angle Ω has intensity P/Ω; the share
    // not kept in the beam is spread evenly over the lower hemisphere (2π sr).
    const share = lamp.beamHeatShare;
    irOut = ((radiantW * (1 - share)) / (2 * Math.PI)) * CM2_TO_M2;
    irI = ((radiantW * share) / coneSolidAngle(lamp.beamDeg)) * CM2_TO_M2 * gain + irOut * gain;
  }
  const n = occluders.length;
  const tUv = new Float64Array(n);
  const tIr = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const o = occluders[k]!;
    tUv[k] = o.uvbT;
    tIr[k] = o.irT ?? lamp.glassIrTransmission;
  }
  return {
    lamp,
    tube,
    x: lamp.x,
    y: lamp.y,
    dz,
    dz2: dz * dz,
    s1: tube ? lamp.x - lamp.length / 2 : lamp.x,
    s2: tube ? lamp.x + lamp.length / 2 : lamp.x,
    uvI,
    irI,
    irOut,
    beamTan: tube ? Infinity : beamTan(lamp.beamDeg),
    tUv,
    tIr,
  };
}

export function compileScene(design: Design): Scene {
  const occluders = compileOccluders(design);
  const e = design.enclosure;
  const section = sectionZ(e);
  const lamps: LampGeom[] = [];
  for (const o of design.objects) {
    if (o.type === 'lamp') lamps.push(compileLamp(o, occluders, lampZ(o, e) - section));
  }
  return {
    width: e.width,
    height: e.height,
    depth: e.depth,
    sectionZ: section,
    roomC: roomTempC(design),
    airRiseK: topAirRiseK(
      lamps.map((l) => l.lamp),
      e,
    ),
    lamps,
    occluders,
  };
}
