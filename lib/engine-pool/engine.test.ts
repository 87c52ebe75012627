import { afterAll, describe, expect, it } from 'vitest';
import { computedFor } from '@/lib/variants/computed';
import { benchDesign } from '@/simulation/testing/fixtures';
import { closeEnginePool, EngineTimeoutError, enginePool, runEngineTask } from '.';

afterAll(() => closeEnginePool());

// The real engine worker (worker.ts, loaded through tsx here as in scripts; bundled under Next).
describe('engine tasks on worker threads', () => {
  it('gives the same figures, bands and species check as computing on this thread', async () => {
    const design = benchDesign(1, 1);
    const here = computedFor(design);
    const there = await runEngineTask('sharedView', { design, field: 'tempC', sheet: null });
    expect(there.figures).toEqual(here.sim.figures);
    expect(there.scale).toEqual(here.view('tempC').scale);
    expect(there.bands).toEqual(here.view('tempC').bands);
    expect(there.assessment).toBeNull();
  });

  it('returns pictures as bytes', async () => {
    const png = await runEngineTask('fieldPng', {
      subject: {
        variantName: 'v',
        version: 1,
        designName: 'd',
        enclosureName: 'e',
        organisationName: 'o',
        design: benchDesign(1, 1),
      },
      field: 'uvi',
      months: 0,
    });
    expect(png).toBeInstanceOf(Uint8Array);
    expect([...png.subarray(1, 4)].map((c) => String.fromCharCode(c)).join('')).toBe('PNG');
  });

  it('stops a real engine run past its time limit and keeps working after', async () => {
    const started = enginePool().stats.started;
    const slow = runEngineTask(
      'sharedView',
      { design: benchDesign(6, 6), field: 'uvi', sheet: null },
      { timeoutMs: 150 },
    );
    await expect(slow).rejects.toBeInstanceOf(EngineTimeoutError);
    const after = await runEngineTask('sharedView', { design: benchDesign(1, 1), field: 'uvi', sheet: null });
    expect(after.figures.hotSpotC).toBeGreaterThan(24);
    expect(enginePool().stats.started).toBeGreaterThan(started);
  });

  it('refuses a task name it does not have', async () => {
    await expect(runEngineTask('nope' as 'propose', {} as never)).rejects.toThrow(
      /no engine task is called "nope"/,
    );
  });
});
