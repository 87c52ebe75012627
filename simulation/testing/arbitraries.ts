/** fast-check arbitraries of valid designs, for property tests. */
import fc from 'fast-check';
import type { Design, DesignObject, LampObject } from '../model/schema';
import { LAMP_TECH_IDS } from '../model/techs';

const num = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((v) => Math.round(v * 100) / 100 + 0); // + 0 turns -0 into 0, as JSON does;

export interface ArbOptions {
  width?: number;
  height?: number;
  /** Which object kinds to draw from. */
  kinds?: DesignObject['type'][];
  maxObjects?: number;
  /** Enclosure depth, cm (default 45); lamps and the section plane are drawn within it. */
  depth?: number;
}

export function arbLamp(width = 120, height = 60, depth = 45): fc.Arbitrary<Omit<LampObject, 'id'>> {
  return fc
    .record(
      {
        type: fc.constant('lamp' as const),
        tech: fc.constantFrom(...LAMP_TECH_IDS),
        form: fc.constantFrom('tube' as const, 'bulb' as const),
        x: num(0, width),
        y: num(height * 0.3, height + 10),
        z: num(0, depth),
        length: num(5, 100),
        uvbAt30: num(0, 300),
        reflectorGain: num(1, 3),
        beamDeg: num(1, 360),
        watts: num(0, 150),
        ageMonths: num(0, 24),
        calibration: fc.record({
          at: fc
            .date({ min: new Date('2020-01-01'), max: new Date('2030-12-31'), noInvalidDate: true })
            .map((d) => d.toISOString().slice(0, 10)),
          from: fc.integer({ min: 1, max: 50 }).map((n) => `${n} readings`),
        }),
      },
      { requiredKeys: ['type', 'tech', 'form', 'x', 'y', 'length'] },
    )
    .map((l) => l as Omit<LampObject, 'id'>);
}

export function arbObject(width = 120, height = 60, depth = 45): fc.Arbitrary<Omit<DesignObject, 'id'>> {
  const seg = {
    x1: num(-5, width + 5),
    y1: num(-5, height + 5),
    x2: num(-5, width + 5),
    y2: num(-5, height + 5),
  };
  const box = { x: num(0, width), y: num(0, height), width: num(1, 40), height: num(1, 30) };
  return fc.oneof(
    arbLamp(width, height, depth),
    fc.record(
      { type: fc.constant('screen' as const), ...seg, uvbTransmission: num(0, 1) },
      { requiredKeys: ['type', 'x1', 'y1', 'x2', 'y2'] },
    ),
    fc.record(
      { type: fc.constant('glass' as const), ...seg, uvbTransmission: num(0, 1) },
      { requiredKeys: ['type', 'x1', 'y1', 'x2', 'y2'] },
    ),
    fc.record({ type: fc.constant('perch' as const), ...seg, thickness: num(0.5, 8) }),
    fc.record({ type: fc.constant('ledge' as const), ...box }),
    fc.record({ type: fc.constant('hide' as const), ...box }),
    fc.record(
      { type: fc.constant('foliage' as const), ...box, uvbTransmission: num(0, 1) },
      { requiredKeys: ['type', 'x', 'y', 'width', 'height'] },
    ),
  ) as fc.Arbitrary<Omit<DesignObject, 'id'>>;
}

export function withIds(objects: Omit<DesignObject, 'id'>[]): DesignObject[] {
  return objects.map((o, i) => ({ ...o, id: `o${i}` }) as DesignObject);
}

export function arbDesign(opts: ArbOptions = {}): fc.Arbitrary<Design> {
  const width = opts.width ?? 120;
  const height = opts.height ?? 60;
  const depth = opts.depth ?? 45;
  const kinds = opts.kinds;
  const obj = kinds
    ? arbObject(width, height, depth).filter((o) => kinds.includes(o.type))
    : arbObject(width, height, depth);
  return fc
    .record(
      {
        objects: fc.array(obj, { maxLength: opts.maxObjects ?? 8 }),
        roomTempC: num(10, 35),
        sectionZ: num(0, depth),
        notes: fc.string({ maxLength: 40 }),
      },
      { requiredKeys: ['objects'] },
    )
    .map(({ objects, roomTempC, sectionZ, notes }) => {
      const d: Design = {
        format: 'baskwell.design',
        version: 2,
        enclosure: {
          width,
          height,
          depth,
          ...(sectionZ === undefined ? {} : { sectionZ }),
          ...(roomTempC === undefined ? {} : { roomTempC }),
        },
        objects: withIds(objects),
      };
      if (notes !== undefined) d.notes = notes;
      return d;
    });
}
