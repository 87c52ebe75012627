/**
 * Field values at exact points (evaluated there, not interpolated from a grid).
 */
import { lampUvbFactor } from '../model/resolve';
import type { Scene } from './scene';
import { evalCell, prepareRow } from './kernel';
import { airTempC, HEAT_DEFAULTS, surfaceTempC } from './heat';
import type { Workspace } from './workspace';
import type { ProbeResult, SimOptions } from './types';

export interface LampSamples {
  scene: Scene;
  /** Per lamp (scene order), UVB of the new lamp at each point. */
  uv: Float64Array[];
  /** Total radiant irradiance at each point, W/m². */
  ir: Float64Array;
  /** Local air temperature at each point, °C. */
  air: Float64Array;
}

/**
 * Per-lamp UVB (new lamp, before ageing) and total radiant flux at points, with the local air temperature:
 * everything needed to recombine the values for any age without recomputing geometry.
 */
export function probeSceneByLamp(
  ws: Workspace,
  scene: Scene,
  points: { x: number; y: number }[],
): LampSamples {
  ws.ensure(scene.occluders.length);
  const n = points.length;
  const uv = scene.lamps.map(() => new Float64Array(n));
  const ir = new Float64Array(n);
  const air = new Float64Array(n);
  points.forEach(({ x, y }, p) => {
    scene.lamps.forEach((lamp, k) => {
      if (!prepareRow(lamp, scene.occluders, y, ws.row, ws.scratch)) return;
      evalCell(lamp, ws.row, x, ws.scratch);
      uv[k]![p] = ws.scratch.uv;
      ir[p] = ir[p]! + ws.scratch.ir;
    });
    air[p] = airTempC(y, scene.height, scene.roomC, scene.airRiseK);
  });
  return { scene, uv, ir, air };
}

export function probeScene(
  ws: Workspace,
  scene: Scene,
  points: { x: number; y: number }[],
  opts: SimOptions = {},
): ProbeResult[] {
  const s = probeSceneByLamp(ws, scene, points);
  const factors = scene.lamps.map((l) => lampUvbFactor(l.lamp, opts.addMonths ?? 0));
  const hc = opts.convection ?? HEAT_DEFAULTS.convection;
  return points.map(({ x, y }, p) => {
    let uvb = 0;
    let uvi = 0;
    scene.lamps.forEach((lamp, k) => {
      const u = s.uv[k]![p]! * factors[k]!;
      uvb += u;
      uvi += u * lamp.lamp.uviPerUvb;
    });
    const tempC = surfaceTempC(HEAT_DEFAULTS.absorptance * s.ir[p]!, s.air[p]!, HEAT_DEFAULTS.emissivity, hc);
    return { x, y, uvb, uvi, tempC };
  });
}
