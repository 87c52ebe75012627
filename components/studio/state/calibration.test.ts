import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../examples/exampleDesign';
import type { LampObject } from './types';
import { calibrationDate, calibrationLabel, keepCalibrationTrue } from './calibration';

// The example's T5 tube, as the lamp log leaves it after a calibration.
const lamp: LampObject = {
  ...(exampleDesign().objects[0] as LampObject),
  uvbAt30: 48.2,
  uviPerUvb: 0.037,
  calibration: { at: '2026-11-30', from: '6 meter readings' },
};

describe('calibration mark', () => {
  it('reads the calendar day as written', () => {
    expect(calibrationDate('2026-11-30')).toBe('30 Nov 2026');
    expect(calibrationDate('2026-01-05T23:30:00-05:00')).toBe('5 Jan 2026');
    expect(calibrationDate('soon')).toBe('soon');
    expect(calibrationLabel(lamp)).toBe('calibrated 30 Nov 2026');
    const { calibration: _c, ...plain } = lamp;
    expect(calibrationLabel(plain)).toBeNull();
  });

  it('stays when the lamp is moved, aged or given a reflector', () => {
    const moved = { ...lamp, x: 70, ageMonths: 3, reflectorGain: 2 };
    expect(keepCalibrationTrue(lamp, moved)).toEqual(moved);
  });

  it('goes when a calibrated figure is changed by hand', () => {
    for (const change of [
      { uvbAt30: 60 },
      { uviPerUvb: 0.05 },
      { tech: 't8' as const },
      { decay: { halfLifeMonths: 6 } },
    ]) {
      const edited = keepCalibrationTrue(lamp, { ...lamp, ...change });
      expect(edited).not.toHaveProperty('calibration');
      expect(edited).toMatchObject(change);
    }
  });
});
