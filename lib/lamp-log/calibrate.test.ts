import { describe, expect, it } from 'vitest';
import { lampSchema } from '@/simulation';
import { applyCalibration, calibrate, pairedRatio } from './calibrate';
import { readingsOf, t5Lamp, t5LampObject } from '@/tests/fixtures/lamp-log';

const object = t5LampObject();

describe('calibrate', () => {
  const lamp = t5Lamp();
  const at30 = (d: number) => 50 * Math.exp(-d / 600);
  const uvb = readingsOf(lamp, at30, [0, 60, 120, 180, 240], 25);

  it('sets uvbAt30 to the measured output when new (within 5 %), with a fitted decay table and the age', () => {
    const c = calibrate(lamp, uvb, object, '2025-10-01');
    if (!c.ok) throw new Error(c.reason);
    expect(Math.abs((c.fields.uvbAt30 as number) / 50 - 1)).toBeLessThan(0.05);
    const pts = (c.fields.decay as { points: [number, number][] }).points;
    expect(pts[0]).toEqual([0, 1]);
    expect(pts[12]![1]).toBeCloseTo(Math.exp((-12 * 365.25) / 12 / 600), 2);
    expect(c.fields.ageMonths).toBeCloseTo(9, 0);
    expect(c.calibrated).toEqual({ at: '2025-08-29', from: 5 });
    expect(c.changes.find((x) => x.field === 'uvbAt30')?.from).toBe(42.5);
  });

  it('gives a lamp object the engine accepts', () => {
    const c = calibrate(lamp, uvb, object, '2025-10-01');
    if (!c.ok) throw new Error(c.reason);
    expect(lampSchema.safeParse(applyCalibration(object, c.fields)).success).toBe(true);
    // With the note, the lamp says when and from what it was calibrated, in the design file's shape.
    const noted = lampSchema.parse(applyCalibration(object, c.fields, c.calibrated));
    expect(noted.calibration).toEqual({
      at: c.calibrated.at,
      from: `${c.calibrated.from} meter readings`,
    });
    expect(noted.calibration!.at).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(applyCalibration(object, c.fields, { at: '2025-09-30', from: 1 }).calibration).toEqual({
      at: '2025-09-30',
      from: '1 meter reading',
    });
  });

  it('writes the bare lamp into the design when the readings were taken through the lid (the design’s mesh adds it back)', () => {
    const lidded = t5Lamp({ baskingTransmission: 0.6 });
    const bare = uvb.map((r) => ({ ...r, through: 'nothing' as const }));
    const throughLid = uvb.map((r) => ({
      ...r,
      value: r.value * 0.6,
      through: 'lid' as const,
      throughTransmission: 0.6,
    }));
    const a = calibrate(lidded, bare, object, '2025-10-01');
    const b = calibrate(lidded, throughLid, object, '2025-10-01');
    if (!a.ok || !b.ok) throw new Error('no calibration');
    expect(b.fields.uvbAt30).toBe(a.fields.uvbAt30);
    expect(Math.abs((b.fields.uvbAt30 as number) / 50 - 1)).toBeLessThan(0.05);
  });

  it('divides by the reflector gain: readings under a reflector include it', () => {
    const plain = calibrate(lamp, uvb, object, '2025-10-01');
    const withReflector = calibrate(lamp, uvb, { ...object, reflectorGain: 2 }, '2025-10-01');
    if (!plain.ok || !withReflector.ok) throw new Error('no calibration');
    expect((withReflector.fields.uvbAt30 as number) / (plain.fields.uvbAt30 as number)).toBeCloseTo(0.5, 2);
  });

  it('measures UVI per µW/cm² from readings taken together, and uses it for UVI-only lamps', () => {
    const uvi = readingsOf(lamp, (d) => at30(d) * 0.03, [0, 60, 120, 180, 240], 25, 'uvi');
    expect(pairedRatio([...uvb, ...uvi], lamp.type)?.ratio).toBeCloseTo(0.03, 6);
    expect(pairedRatio([...uvb, ...uvi], lamp.type)?.pairs).toBe(5);
    const both = calibrate(lamp, [...uvb, ...uvi], object, '2025-10-01');
    if (!both.ok) throw new Error(both.reason);
    expect(both.fields.uviPerUvb).toBeCloseTo(0.03, 4);
    const onlyUvi = calibrate(lamp, uvi, { ...object, uviPerUvb: 0.03 }, '2025-10-01');
    if (!onlyUvi.ok) throw new Error(onlyUvi.reason);
    expect(Math.abs((onlyUvi.fields.uvbAt30 as number) / 50 - 1)).toBeLessThan(0.05);
  });

  it('with one reading scales the usual curve and says it is uncertain', () => {
    const c = calibrate(lamp, uvb.slice(2, 3), object, '2025-10-01');
    if (!c.ok) throw new Error(c.reason);
    expect(c.fields.decay).toBeUndefined();
    expect(c.notes.join(' ')).toMatch(/Uncertain/);
    expect(c.calibrated.from).toBe(1);
  });

  it('refuses without readings or when the design lamp is another technology', () => {
    expect(calibrate(lamp, [], object, '2025-10-01').ok).toBe(false);
    const wrong = calibrate(lamp, uvb, { ...object, tech: 'compact', form: 'bulb' }, '2025-10-01');
    expect(wrong.ok).toBe(false);
  });
});
