import { afterAll, describe, expect, it } from 'vitest';
import { computedFor } from '@/lib/variants/computed';
import { benchDesign } from '@/simulation/testing/fixtures';
import { closeEnginePool, EngineTimeoutError, enginePool, runEngineTask } from '.';

afterAll(() => closeEnginePool());

// The real engine worker (worker.ts, loaded through tsx here as in scripts; bundled under Next).
// A worker's first start compiles the engine through tsx, which takes many seconds on a busy machine: the
// tests about results give their tasks and themselves room, so only the time-limit test is about time.
const ROOMY = { timeoutMs: 120_000 };

describe('engine tasks on worker threads', () => {
  it(
    'gives the same figures, bands and species check as computing on this thread',
    { timeout: 150_000 },
    async () => {
      const design = benchDesign(1, 1);
      const here = computedFor(design);
      const there = await runEngineTask('sharedView', { design, field: 'tempC', sheet: null }, ROOMY);
      expect(there.figures).toEqual(here.sim.figures);
      expect(there.scale).toEqual(here.view('tempC').scale);
      // With no species the safety checks still run, as on this thread.
      expect(there.assessment).toEqual(here.assessment(null));
      expect(there.assessment.findings.map((f) => f.id)).toContain('lamp-in-reach');
      // The page's text carries no bands: they travel only with the picture.
      expect(Object.keys(there).sort()).toEqual(['assessment', 'figures', 'scale']);
      const picture = await runEngineTask('fieldPicture', { design, field: 'tempC' }, ROOMY);
      expect(picture.bands).toEqual(here.view('tempC').bands);
      expect(picture.scale).toEqual(here.view('tempC').scale);
      expect(picture.figures).toEqual(here.sim.figures);
    },
  );

  it('returns pictures as bytes', { timeout: 150_000 }, async () => {
    const png = await runEngineTask(
      'fieldPng',
      {
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
      },
      ROOMY,
    );
    expect(png).toBeInstanceOf(Uint8Array);
    expect([...png.subarray(1, 4)].map((c) => String.fromCharCode(c)).join('')).toBe('PNG');
  });

  it(
    'stops a real engine run past its time limit and keeps working after',
    { timeout: 150_000 },
    async () => {
      const started = enginePool().stats.started;
      const slow = runEngineTask(
        'sharedView',
        { design: benchDesign(6, 6), field: 'uvi', sheet: null },
        { timeoutMs: 150 },
      );
      await expect(slow).rejects.toBeInstanceOf(EngineTimeoutError);
      const after = await runEngineTask(
        'sharedView',
        { design: benchDesign(1, 1), field: 'uvi', sheet: null },
        ROOMY,
      );
      expect(after.figures.hotSpotC).toBeGreaterThan(24);
      expect(enginePool().stats.started).toBeGreaterThan(started);
    },
  );

  it('refuses a task name it does not have', async () => {
    await expect(runEngineTask('nope' as 'propose', {} as never)).rejects.toThrow(
      /no engine task is called "nope"/,
    );
  });
});
