import { describe, expect, it } from 'vitest';
import { lampTypeInputSchema, lampTypePatchSchema } from './schema';

const tube = {
  name: 'Our T5 tube',
  tech: 't5',
  form: 'tube',
  lengthCm: 55,
  uvbAt30: 40,
  uviPerUvb: 0.04,
  radiantFraction: 0.5,
  beamDeg: 360,
  watts: 24,
};

const firstIssue = (v: unknown) => {
  const r = lampTypeInputSchema.safeParse(v);
  return r.success ? null : { path: r.error.issues[0]!.path.join('.'), message: r.error.issues[0]!.message };
};

describe('lamp type input', () => {
  it('accepts a tube and fills defaults', () => {
    const r = lampTypeInputSchema.parse(tube);
    expect(r.reflectorGain).toBe(1);
    expect(r.halfLifeMonths).toBeNull();
    expect(r.sources).toEqual({});
  });

  it('needs a length for a tube and none for a bulb', () => {
    expect(firstIssue({ ...tube, lengthCm: undefined })).toEqual({
      path: 'lengthCm',
      message: 'A tube needs its length.',
    });
    expect(firstIssue({ ...tube, form: 'bulb' })?.path).toBe('lengthCm');
  });

  it('refuses UVB on a heat-only technology', () => {
    expect(firstIssue({ ...tube, tech: 'ceramic', form: 'bulb', lengthCm: null })?.path).toBe('uvbAt30');
  });

  it('refuses an unknown technology and out-of-range values with their field', () => {
    expect(firstIssue({ ...tube, tech: 'plasma' })?.path).toBe('tech');
    expect(firstIssue({ ...tube, radiantFraction: 1.5 })?.message).toBe(
      'The radiant heat fraction must be at most 1.',
    );
    expect(firstIssue({ ...tube, beamDeg: 0 })?.path).toBe('beamDeg');
  });

  it('refuses a decay table whose months do not increase', () => {
    expect(
      firstIssue({
        ...tube,
        decayPoints: [
          [0, 1],
          [0, 0.9],
        ],
      })?.path,
    ).toBe('decayPoints');
  });

  it('a patch needs at least one known field', () => {
    expect(lampTypePatchSchema.safeParse({}).success).toBe(false);
    expect(lampTypePatchSchema.safeParse({ colour: 'red' }).success).toBe(false);
    expect(lampTypePatchSchema.safeParse({ watts: 30 }).success).toBe(true);
  });
});
