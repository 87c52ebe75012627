/**
 * Command line run of the light-and-heat engine.
 *
 *   npm run --silent simulate -- <design.json> [--at X,Y ...] [--cell CM] [--species FILE] [--months N]
 *
 * Prints ONE JSON object: probe readings (at --at points, else at the design's pinned probes), a summary
 * of each field, and the assessment findings — the species check with --species, and without it the
 * safety checks (reach, eyes, hot surfaces) against general limits. Bad input exits with code 2 and a
 * one-line message naming the field. Every figure is an estimate to verify with a meter and thermometer.
 */
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import {
  assess,
  computeFields,
  firstIssue,
  monthsUntilUnmet,
  parseDesign,
  probe,
  speciesSheetSchema,
  type FieldGrid,
  type SpeciesSheet,
} from '../simulation';

/** Bad input: reported on one line with exit code 2. */
export class UsageError extends Error {}

const USAGE = 'usage: simulate <design.json> [--at X,Y ...] [--cell CM] [--species FILE] [--months N]';

interface Args {
  designPath: string;
  at: { x: number; y: number }[];
  cellCm?: number;
  speciesPath?: string;
  months: number;
}

function parsePoint(s: string): { x: number; y: number } {
  const m = /^\s*(-?\d+(?:\.\d+)?(?:e-?\d+)?)\s*,\s*(-?\d+(?:\.\d+)?(?:e-?\d+)?)\s*$/i.exec(s);
  if (!m) throw new UsageError(`--at: expected X,Y in cm, got "${s}"`);
  return { x: Number(m[1]), y: Number(m[2]) };
}

function parseNumber(flag: string, s: string | undefined, min: number, max: number): number {
  if (s === undefined || s.startsWith('--')) throw new UsageError(`${flag}: expected a number`);
  const v = Number(s);
  if (!Number.isFinite(v) || s.trim() === '') throw new UsageError(`${flag}: expected a number, got "${s}"`);
  if (v < min || v > max) throw new UsageError(`${flag}: expected a number from ${min} to ${max}, got ${v}`);
  return v;
}

export function parseArgs(argv: string[]): Args {
  const args: Args = { designPath: '', at: [], months: 0 };
  const positional: string[] = [];
  for (let k = 0; k < argv.length; k++) {
    const a = argv[k]!;
    if (a === '--at') {
      const next = argv[k + 1];
      if (next === undefined || next.startsWith('--')) throw new UsageError('--at: expected X,Y in cm');
      // Accept "--at 1,2 3,4" as well as repeated "--at 1,2 --at 3,4".
      while (argv[k + 1] !== undefined && !argv[k + 1]!.startsWith('--') && /,/.test(argv[k + 1]!)) {
        args.at.push(parsePoint(argv[++k]!));
      }
      if (args.at.length === 0) throw new UsageError(`--at: expected X,Y in cm, got "${next}"`);
    } else if (a === '--cell') {
      args.cellCm = parseNumber('--cell', argv[++k], 0.05, 100);
    } else if (a === '--months') {
      args.months = parseNumber('--months', argv[++k], 0, 600);
    } else if (a === '--species') {
      const p = argv[++k];
      if (p === undefined || p.startsWith('--')) throw new UsageError('--species: expected a file');
      args.speciesPath = p;
    } else if (a.startsWith('--')) {
      throw new UsageError(`unknown flag ${a}`);
    } else {
      positional.push(a);
    }
  }
  if (positional.length !== 1)
    throw new UsageError(positional.length === 0 ? USAGE : `unexpected argument "${positional[1]}"`);
  args.designPath = positional[0]!;
  return args;
}

function readJson(path: string, what: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    throw new UsageError(`cannot read ${what} file "${path}"`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    const reason = e instanceof Error ? e.message.split('\n')[0] : 'parse error';
    throw new UsageError(`${what} file "${path}" is not valid JSON (${reason})`);
  }
}

function stats(a: Float32Array) {
  let min = Infinity;
  let max = -Infinity;
  let sum = 0;
  for (let k = 0; k < a.length; k++) {
    const v = a[k]!;
    if (v < min) min = v;
    if (v > max) max = v;
    sum += v;
  }
  return { min, max, mean: sum / a.length };
}

function summary(grid: FieldGrid, ms: number) {
  return {
    uvb: stats(grid.uvb),
    uvi: stats(grid.uvi),
    tempC: stats(grid.tempC),
    cells: grid.nx * grid.ny,
    nx: grid.nx,
    ny: grid.ny,
    cellCm: grid.cellCm,
    ms: Math.round(ms * 100) / 100,
    note: 'Estimates: verify with a UV meter and a thermometer.',
  };
}

export function run(argv: string[]): Record<string, unknown> {
  const args = parseArgs(argv);
  const parsed = parseDesign(readJson(args.designPath, 'design'));
  if (!parsed.ok) throw new UsageError(`${parsed.error.path || 'design'}: ${parsed.error.message}`);
  const design = parsed.design;
  let species: SpeciesSheet | undefined;
  if (args.speciesPath) {
    const s = speciesSheetSchema.safeParse(readJson(args.speciesPath, 'species'));
    if (!s.success) {
      const e = firstIssue(s.error);
      throw new UsageError(`species.${e.path}: ${e.message}`);
    }
    species = s.data;
  }
  const opts = { cellCm: args.cellCm, addMonths: args.months };
  const t0 = performance.now();
  let grid: FieldGrid;
  try {
    grid = computeFields(design, opts);
  } catch (e) {
    if (e instanceof RangeError) throw new UsageError(`--cell: ${e.message}`);
    throw e;
  }
  const ms = performance.now() - t0;
  const points = args.at.length ? args.at : (design.probes ?? []).map((p) => ({ x: p.x, y: p.y }));
  const out: Record<string, unknown> = { probes: probe(design, points, opts), summary: summary(grid, ms) };
  const a = assess(design, species, { ...opts, grid });
  out.assessment = a.findings;
  out.overall = a.overall;
  if (species) out.monthsUntilUnmet = monthsUntilUnmet(design, species);
  return out;
}

export function main(argv: string[]) {
  try {
    process.stdout.write(`${JSON.stringify(run(argv))}\n`);
  } catch (e) {
    if (e instanceof UsageError) {
      process.stderr.write(`error: ${e.message.replace(/\s+/g, ' ')}\n`);
      process.exit(2);
    }
    process.stderr.write('error: the simulation failed unexpectedly\n');
    process.exit(1);
  }
}

// Run when executed (tsx scripts/simulate.ts), not when imported by tests.
if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) main(process.argv.slice(2));
