/**
 * The arithmetic floor of a field computation, for the benchmark (scripts/bench.ts): every lamp's closed
 * form — the engine's own tube and bulb formulas — at every cell, with no barriers, no heat and no
 * allocation. No engine that evaluates these fields cell by cell can go below it; the bench prints the
 * engine's time over this one, measured in the same run.
 */
import type { Design } from '../model/schema';
import { compileScene, type LampGeom } from '../fields/scene';
import { gridSize } from '../fields/types';
import { tubeG } from '../sources/tube';

/** Sums each lamp's unshadowed UVB at every cell into `out` (the radiant field has the same geometry). */
export function floorFill(
  lamps: readonly LampGeom[],
  nx: number,
  ny: number,
  cell: number,
  out: Float64Array,
) {
  out.fill(0);
  for (const l of lamps) {
    for (let j = 0; j < ny; j++) {
      const qy = (j + 0.5) * cell;
      const h = l.y - qy;
      if (!(h > 0)) continue;
      const d2 = h * h + l.dz2;
      const d = Math.sqrt(d2);
      const base = j * nx;
      if (l.tube) {
        // The tube's closed form at the line's distance d, with the cosine h/d (sources/tube.ts).
        const scale = (l.uvI * h) / (2 * d2);
        for (let i = 0; i < nx; i++) {
          const qx = (i + 0.5) * cell;
          out[base + i] = out[base + i]! + (tubeG(l.s2 - qx, d) - tubeG(l.s1 - qx, d)) * scale;
        }
      } else {
        // A point source: I·h / r³.
        const ih = l.uvI * h;
        for (let i = 0; i < nx; i++) {
          const dx = (i + 0.5) * cell - l.x;
          const r2 = d2 + dx * dx;
          out[base + i] = out[base + i]! + ih / (r2 * Math.sqrt(r2));
        }
      }
    }
  }
}

/** What floorFill needs for a design at a cell size, made once (outside the timing). */
export function floorSetup(design: Design, cellCm: number) {
  const scene = compileScene(design);
  const { nx, ny } = gridSize(design.enclosure.width, design.enclosure.height, cellCm);
  const edges = scene.occluders.reduce((n, o) => n + (o.xs.length > 2 ? o.xs.length : 1), 0);
  return { lamps: scene.lamps, nx, ny, edges, out: new Float64Array(nx * ny) };
}
