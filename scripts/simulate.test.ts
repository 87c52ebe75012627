import { describe, expect, it, beforeAll } from 'vitest';
import { spawn } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { EXAMPLE_DESIGN } from '../simulation/testing/fixtures';
import { run, UsageError } from './simulate';

const ROOT = path.resolve(__dirname, '..');
let dir = '';
const file = (name: string) => path.join(dir, name);

/** Run the CLI as a user would (a separate process), collecting exit code and output. */
function cli(...args: string[]): Promise<{ code: number | null; out: string; err: string }> {
  return new Promise((resolve) => {
    const p = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'scripts/simulate.ts'), ...args], {
      cwd: ROOT,
    });
    let out = '';
    let err = '';
    p.stdout.on('data', (d) => (out += d));
    p.stderr.on('data', (d) => (err += d));
    p.on('close', (code) => resolve({ code, out, err }));
  });
}

beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'baskwell-cli-'));
  writeFileSync(
    file('design.json'),
    JSON.stringify({ ...EXAMPLE_DESIGN, probes: [{ id: 'p', x: 40, y: 30 }] }),
  );
  writeFileSync(
    file('species.json'),
    JSON.stringify({ name: 'Test dragon', uvZone: 4, baskingSurfaceC: [40, 45], coolEndC: [24, 28] }),
  );
  const bad = JSON.parse(JSON.stringify(EXAMPLE_DESIGN));
  bad.objects[0].uvbAt30 = 'high';
  writeFileSync(file('bad.json'), JSON.stringify(bad));
  writeFileSync(file('broken.json'), '{ "format": ');
  writeFileSync(
    file('badspecies.json'),
    JSON.stringify({ name: 'x', uvZone: 9, baskingSurfaceC: [1, 2], coolEndC: [1, 2] }),
  );
});

describe('simulate CLI (separate processes)', () => {
  it('prints one JSON object, and exits 2 with one line on bad input', async () => {
    const [good, bad, flag] = await Promise.all([
      cli(
        file('design.json'),
        '--at',
        '40,30',
        '--at',
        '90,18.01',
        '--cell',
        '2',
        '--species',
        file('species.json'),
        '--months',
        '3',
      ),
      cli(file('bad.json')),
      cli(file('design.json'), '--cell', 'abc'),
    ]);
    expect(good.code).toBe(0);
    expect(good.out.trim().split('\n')).toHaveLength(1);
    const o = JSON.parse(good.out);
    expect(o.probes).toHaveLength(2);
    expect(Object.keys(o.probes[0]).sort()).toEqual(['tempC', 'uvb', 'uvi', 'x', 'y']);
    expect(o.probes[0].uvb).toBeGreaterThan(0);
    expect(o.summary.cells).toBe(60 * 30);
    for (const f of ['uvb', 'uvi', 'tempC'])
      expect(Object.keys(o.summary[f]).sort()).toEqual(['max', 'mean', 'min']);
    expect(typeof o.summary.ms).toBe('number');
    expect(o.assessment.map((f: { id: string }) => f.id)).toContain('basking-uvi');

    for (const [r, message] of [
      [bad, /^error: objects\[0\]\.uvbAt30: expected number/],
      [flag, /^error: --cell: expected a number/],
    ] as const) {
      expect(r.code).toBe(2);
      expect(r.out).toBe('');
      expect(r.err.trim().split('\n')).toHaveLength(1);
      expect(r.err.trim()).toMatch(message);
      expect(r.err).not.toMatch(/at .*\.ts:\d+/); // no stack trace
    }
  }, 180_000); // three process starts; generous for a busy shared machine
});

describe('simulate CLI (in process)', () => {
  it('reads pinned probes when no --at is given and runs the safety checks alone without --species', () => {
    const o = run([file('design.json'), '--cell', '4']);
    expect(o.probes).toHaveLength(1);
    const ids = (o.assessment as { id: string }[]).map((f) => f.id).sort();
    expect(ids).toEqual(['eye-safety', 'hot-surface', 'lamp-in-reach']);
    expect(o.monthsUntilUnmet).toBeUndefined();
  });

  it('accepts several points after one --at', () => {
    const o = run([file('design.json'), '--cell', '4', '--at', '1,1', '2,2', '3,3']);
    expect(o.probes).toHaveLength(3);
  });

  it.each([
    [['broken.json'], /^design file .* is not valid JSON/],
    [['missing.json'], /^cannot read design file/],
    [['design.json', '--at', '5'], /^--at: expected X,Y/],
    [['design.json', '--months', '-1'], /^--months: expected a number from 0/],
    [['design.json', '--cell', '0.01'], /^--cell: expected a number from 0.05/],
    [['design.json', '--frobnicate'], /^unknown flag --frobnicate/],
    [['design.json', '--species', 'badspecies.json'], /^species\.uvZone/],
    [['design.json', 'other.json'], /^unexpected argument/],
    [[], /^usage/],
  ])('rejects %j with a message naming the problem', (args, message) => {
    const argv = args.map((a) => (a.endsWith('.json') ? file(a) : a));
    expect(() => run(argv)).toThrow(UsageError);
    expect(() => run(argv)).toThrow(message);
  });
});
