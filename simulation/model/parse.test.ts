import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseDesign, migrateDesign } from './parse';
import { designSchema, type Design } from './schema';
import { lampZ, sectionZ } from './resolve';
import { DESIGN_MIGRATIONS } from './migrations';
import { EXAMPLE_DESIGN } from '../testing/fixtures';
import { arbDesign } from '../testing/arbitraries';

const clone = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

describe('parseDesign', () => {
  it('accepts the example design file unchanged', () => {
    const r = parseDesign(clone(EXAMPLE_DESIGN));
    expect(r).toEqual({ ok: true, design: EXAMPLE_DESIGN });
  });

  it('refuses an enclosure under a centimetre (1e-320 would be drawn as nothing)', () => {
    for (const width of [1e-320, 0.5]) {
      const d = clone(EXAMPLE_DESIGN);
      d.enclosure.width = width;
      const r = parseDesign(d);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error.path).toBe('enclosure.width');
        expect(r.error.message).toMatch(/at least 1 cm/);
      }
    }
    const d = clone(EXAMPLE_DESIGN);
    d.enclosure.depth = 1;
    expect(parseDesign(d).ok).toBe(true);
  });

  it('names the path of a wrong type', () => {
    const d = clone(EXAMPLE_DESIGN) as unknown as { objects: Record<string, unknown>[] };
    d.objects[0]!.uvbAt30 = 'lots';
    const r = parseDesign(d);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.path).toBe('objects[0].uvbAt30');
      expect(r.error.message).toMatch(/expected number/);
    }
  });

  it('rejects an unknown field, naming it', () => {
    const d = clone(EXAMPLE_DESIGN) as unknown as { objects: Record<string, unknown>[] };
    d.objects[3]!.colour = 'brown';
    const r = parseDesign(d);
    expect(r).toEqual({ ok: false, error: { path: 'objects[3].colour', message: 'unknown field' } });
    const top = { ...clone(EXAMPLE_DESIGN), extra: 1 };
    expect(parseDesign(top)).toEqual({ ok: false, error: { path: 'extra', message: 'unknown field' } });
  });

  it('rejects an unknown object type at its type field', () => {
    const d = clone(EXAMPLE_DESIGN) as unknown as { objects: Record<string, unknown>[] };
    d.objects[2]!.type = 'door';
    const r = parseDesign(d);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.path).toBe('objects[2].type');
  });

  it('requires a length for a tube', () => {
    const d = clone(EXAMPLE_DESIGN) as unknown as { objects: Record<string, unknown>[] };
    delete d.objects[0]!.length;
    const r = parseDesign(d);
    expect(r).toEqual({ ok: false, error: { path: 'objects[0].length', message: 'a tube needs a length' } });
  });

  it('rejects duplicate ids', () => {
    const d = clone(EXAMPLE_DESIGN);
    d.objects[4] = { ...d.objects[4]!, id: 'uv1' };
    const r = parseDesign(d);
    expect(r).toEqual({ ok: false, error: { path: 'objects[4].id', message: 'duplicate id "uv1"' } });
  });

  it('checks ranges: sizes, transmissions, beam angle', () => {
    const bad: [string, (d: ReturnType<typeof clone<typeof EXAMPLE_DESIGN>>) => void][] = [
      ['enclosure.width', (d) => (d.enclosure.width = 0)],
      ['enclosure.height', (d) => (d.enclosure.height = 5000)],
      [
        'objects[2].uvbTransmission',
        (d) => ((d.objects[2] as { uvbTransmission: number }).uvbTransmission = 1.2),
      ],
      ['objects[0].beamDeg', (d) => ((d.objects[0] as { beamDeg: number }).beamDeg = 0.5)],
      ['objects[0].reflectorGain', (d) => ((d.objects[0] as { reflectorGain: number }).reflectorGain = 0.5)],
      ['objects[3].thickness', (d) => ((d.objects[3] as { thickness: number }).thickness = -1)],
    ];
    for (const [path, mutate] of bad) {
      const d = clone(EXAMPLE_DESIGN);
      mutate(d);
      const r = parseDesign(d);
      expect(r.ok ? '' : r.error.path).toBe(path);
    }
  });

  it('accepts pinned probes, notes and names; rejects duplicate probe ids', () => {
    const d = {
      ...clone(EXAMPLE_DESIGN),
      notes: 'Customer wants a second basking spot.',
      probes: [
        { id: 'p1', x: 40, y: 38, label: 'top of branch' },
        { id: 'p2', x: 110, y: 1 },
      ],
    };
    d.objects[0] = { ...d.objects[0]!, name: 'Main UV tube' };
    expect(parseDesign(d).ok).toBe(true);
    d.probes[1]!.id = 'p1';
    const r = parseDesign(d);
    expect(r.ok ? '' : r.error.path).toBe('probes[1].id');
  });

  it('rejects a wrong format and a newer version with a clear message', () => {
    const r1 = parseDesign({ ...clone(EXAMPLE_DESIGN), format: 'other' });
    expect(r1.ok ? '' : r1.error.path).toBe('format');
    const r2 = parseDesign({ ...clone(EXAMPLE_DESIGN), version: 7 });
    expect(r2).toEqual({ ok: false, error: { path: 'version', message: expect.stringMatching(/newer/) } });
  });

  it('keeps a lamp’s calibration note, absent by default', () => {
    expect(EXAMPLE_DESIGN.objects.some((o) => 'calibration' in o)).toBe(false);
    const plain = parseDesign(clone(EXAMPLE_DESIGN));
    expect(plain.ok && plain.design.objects[0]).not.toHaveProperty('calibration');

    const d = clone(EXAMPLE_DESIGN) as unknown as { objects: Record<string, unknown>[] };
    d.objects[0]!.calibration = { at: '2026-11-30', from: '6 readings' };
    const r = parseDesign(clone(d));
    expect(r.ok && r.design.objects[0]).toMatchObject({
      calibration: { at: '2026-11-30', from: '6 readings' },
    });
    // Through JSON and parse again, as a download and upload would.
    const again = r.ok ? parseDesign(JSON.parse(JSON.stringify(r.design))) : r;
    expect(again).toEqual(r);
    // Date and time are accepted too.
    d.objects[0]!.calibration = { at: '2026-11-30T09:15:00Z', from: 'readings' };
    expect(parseDesign(clone(d)).ok).toBe(true);
  });

  it('rejects a malformed calibration note, naming the field', () => {
    const d = clone(EXAMPLE_DESIGN) as unknown as { objects: Record<string, unknown>[] };
    d.objects[0]!.calibration = { at: '30/11/2026', from: '6 readings' };
    expect(parseDesign(clone(d))).toEqual({
      ok: false,
      error: { path: 'objects[0].calibration.at', message: 'expected an ISO date (YYYY-MM-DD)' },
    });
    d.objects[0]!.calibration = { at: '2026-11-30', from: '' };
    const empty = parseDesign(clone(d));
    expect(!empty.ok && empty.error.path).toBe('objects[0].calibration.from');
    d.objects[0]!.calibration = { at: '2026-11-30', from: 'readings', by: 'me' };
    expect(parseDesign(clone(d))).toEqual({
      ok: false,
      error: { path: 'objects[0].calibration.by', message: 'unknown field' },
    });
    d.objects[0]!.calibration = { at: '2026-11-30', from: 6 };
    const numeric = parseDesign(clone(d));
    expect(!numeric.ok && numeric.error.path).toBe('objects[0].calibration.from');
  });

  it('runs migrations from older versions before validating', () => {
    // A pretend version 0 that called the room temperature "ambientC".
    const v0 = {
      ...clone(EXAMPLE_DESIGN),
      version: 0,
      enclosure: { width: 50, height: 40, depth: 30, ambientC: 22 },
    };
    const migrations = {
      ...DESIGN_MIGRATIONS,
      0: (doc: Record<string, unknown>) => {
        const { ambientC, ...enc } = doc.enclosure as Record<string, unknown>;
        return { ...doc, version: 1, enclosure: { ...enc, roomTempC: ambientC } };
      },
    };
    const r = parseDesign(v0, migrations);
    expect(r.ok && r.design.enclosure).toEqual({ width: 50, height: 40, depth: 30, roomTempC: 22 });
    expect(migrateDesign(v0).ok).toBe(false); // no such step registered in the real registry
  });

  it('survives a schema round trip unchanged (property)', () => {
    fc.assert(
      fc.property(arbDesign(), (design) => {
        const once = designSchema.parse(clone(design));
        const twice = designSchema.parse(JSON.parse(JSON.stringify(once)));
        expect(twice).toEqual(design);
        expect(once).toEqual(design);
      }),
      { numRuns: 200 },
    );
  });
});

describe('version 2: depth', () => {
  const v1 = (): Record<string, unknown> => ({ ...clone(EXAMPLE_DESIGN), version: 1 });

  it('loads a version-1 file as version 2, keeping every field and adding none', () => {
    const input = v1();
    const r = parseDesign(input);
    expect(r).toEqual({ ok: true, design: { ...clone(EXAMPLE_DESIGN), version: 2 } });
    expect(input.version).toBe(1); // the caller's object is not changed
    if (!r.ok) return;
    expect(r.design.enclosure).not.toHaveProperty('sectionZ');
    expect(r.design.objects.some((o) => 'z' in o)).toBe(false);
  });

  it('defaults the section plane and every lamp to half the depth', () => {
    const r = parseDesign(v1());
    if (!r.ok) throw new Error(r.error.message);
    expect(sectionZ(r.design.enclosure)).toBe(30);
    for (const o of r.design.objects) if (o.type === 'lamp') expect(lampZ(o, r.design.enclosure)).toBe(30);
    const set = { ...r.design.enclosure, sectionZ: 12 };
    expect(sectionZ(set)).toBe(12);
    expect(lampZ({ z: 55 }, set)).toBe(55);
    expect(lampZ({}, { ...set, depth: 45 })).toBe(22.5);
  });

  it('round-trips the section plane and a lamp’s depth through JSON', () => {
    const d = clone(EXAMPLE_DESIGN);
    d.enclosure.sectionZ = 15;
    (d.objects[0] as { z?: number }).z = 50;
    (d.objects[1] as { z?: number }).z = 0;
    const r = parseDesign(clone(d));
    expect(r).toEqual({ ok: true, design: d });
    const again = r.ok ? parseDesign(JSON.parse(JSON.stringify(r.design))) : r;
    expect(again).toEqual(r);
    // A version-1 file's upgrade round-trips as well.
    const up = parseDesign(v1());
    expect(up.ok && parseDesign(JSON.parse(JSON.stringify(up.design)))).toEqual(up);
  });

  it('names the field of a bad depth', () => {
    const cases: [string, (d: Design) => void, RegExp][] = [
      ['enclosure.sectionZ', (d) => (d.enclosure.sectionZ = -1), />=0/],
      [
        'enclosure.sectionZ',
        (d) => (d.enclosure.sectionZ = 61),
        /within the enclosure's depth \(0 to 60 cm\)/,
      ],
      ['objects[1].z', (d) => ((d.objects[1] as { z?: number }).z = 60.5), /within the enclosure's depth/],
      ['objects[0].z', (d) => ((d.objects[0] as { z?: unknown }).z = 'back'), /expected number/],
      ['objects[2].z', (d) => ((d.objects[2] as { z?: number }).z = 10), /unknown field/],
    ];
    for (const [path, mutate, message] of cases) {
      const d = clone(EXAMPLE_DESIGN);
      mutate(d);
      const r = parseDesign(d);
      expect(r.ok ? '' : r.error.path).toBe(path);
      expect(r.ok ? '' : r.error.message).toMatch(message);
    }
    // A lamp at the very back, and the plane at the very front, are fine.
    const edge = clone(EXAMPLE_DESIGN);
    edge.enclosure.sectionZ = 0;
    (edge.objects[0] as { z?: number }).z = 60;
    expect(parseDesign(edge).ok).toBe(true);
  });

  it('refuses a version it does not know with the version field named', () => {
    expect(parseDesign({ ...v1(), version: 3 })).toEqual({
      ok: false,
      error: { path: 'version', message: 'version 3 is newer than this app reads (2)' },
    });
    expect(parseDesign({ ...v1(), version: 0 })).toEqual({
      ok: false,
      error: { path: 'version', message: 'cannot upgrade from version 0' },
    });
  });
});
