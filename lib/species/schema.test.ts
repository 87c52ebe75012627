import { describe, expect, it } from 'vitest';
import { speciesInputSchema, speciesPatchSchema } from './schema';

const valid = {
  commonName: 'Test lizard',
  scientificName: 'Testus lacertus',
  uvZone: 3,
  baskingSurfaceC: { min: 35, max: 40 },
  warmAirC: { min: 28, max: 32 },
  coolAirC: { min: 22, max: 26 },
};

const issues = (v: unknown) => {
  const r = speciesInputSchema.safeParse(v);
  return r.success ? [] : r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
};

describe('species sheet input', () => {
  it('accepts a minimal sheet and fills the optional fields with null', () => {
    const r = speciesInputSchema.parse(valid);
    expect(r.uvbTargetUw).toBeNull();
    expect(r.nightMinC).toBeNull();
    expect(r.sources).toEqual([]);
  });

  it('refuses a UV zone outside 1–4 with a clear message', () => {
    expect(issues({ ...valid, uvZone: 5 })).toEqual([
      { path: 'uvZone', message: 'The UV zone must be 1, 2, 3 or 4.' },
    ]);
    expect(issues({ ...valid, uvZone: 2.5 })[0]?.path).toBe('uvZone');
  });

  it('refuses an upside-down range, naming it', () => {
    const i = issues({ ...valid, baskingSurfaceC: { min: 40, max: 35 } });
    expect(i[0]?.path).toBe('baskingSurfaceC.max');
    expect(i[0]?.message).toMatch(/basking surface/);
  });

  it('refuses a cool side warmer than the warm side', () => {
    const i = issues({ ...valid, coolAirC: { min: 33, max: 34 } });
    expect(i.map((x) => x.path)).toContain('coolAirC.min');
  });

  it('refuses unknown fields and empty names', () => {
    expect(issues({ ...valid, colour: 'green' }).length).toBeGreaterThan(0);
    expect(issues({ ...valid, commonName: '  ' })[0]?.message).toBe('The common name is required.');
  });

  it('requires a citation and a confidence note for each source', () => {
    const i = issues({ ...valid, sources: [{ citation: '', confidence: 'x' }] });
    expect(i[0]?.path).toBe('sources.0.citation');
  });

  it('a patch needs at least one field', () => {
    expect(speciesPatchSchema.safeParse({}).success).toBe(false);
    expect(speciesPatchSchema.safeParse({ uvZone: 2 }).success).toBe(true);
  });

  it('a patch refuses a field with the message a new sheet gets, and fills in no defaults', () => {
    type Parsed = { error?: { issues: { path: PropertyKey[]; message: string }[] } };
    const messageAt = (r: Parsed, field: string) => r.error?.issues.find((i) => i.path[0] === field)?.message;
    expect(messageAt(speciesPatchSchema.safeParse({ nightMinC: 50 }), 'nightMinC')).toBe(
      'The night minimum must be at most 40 °C.',
    );
    const long = { notes: 'x'.repeat(5001) };
    expect(messageAt(speciesPatchSchema.safeParse(long), 'notes')).toBe(
      messageAt(speciesInputSchema.safeParse(long), 'notes'),
    );
    expect(messageAt(speciesPatchSchema.safeParse(long), 'notes')).toBe(
      'Notes can be at most 5000 characters.',
    );
    expect(speciesPatchSchema.parse({ uvZone: 2 })).toEqual({ uvZone: 2 });
  });
});
