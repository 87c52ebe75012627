import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, parseDesign, type DesignObject } from '@/simulation';
import { drawingTop } from './drawing';
import { isBox, isSegment, kindOf, OBJECT_KINDS, OBJECT_TYPES, type RasterPen } from '.';

const FIELDS = ['type', 'name', 'form', 'tool', 'place', 'draw', 'centre', 'bounds', 'snap', 'svg', 'raster'];

describe('the object kinds', () => {
  it('has one complete record for every kind the engine knows, under its own type', () => {
    // The example design holds one of every kind the engine's schema accepts.
    const engineKinds = [...new Set(EXAMPLE_DESIGN.objects.map((o) => o.type))].sort();
    expect([...OBJECT_TYPES].sort()).toEqual(engineKinds);
    for (const type of OBJECT_TYPES) {
      const kind = OBJECT_KINDS[type];
      expect(Object.keys(kind).sort(), type).toEqual(expect.arrayContaining(FIELDS.sort()));
      expect(kind.type).toBe(type);
      expect(kind.name.length, type).toBeGreaterThan(0);
      expect(kind.tool.key).toMatch(/^[A-Z]$/);
    }
    // One key a tool: the keyboard can reach each kind.
    expect(new Set(OBJECT_TYPES.map((t) => OBJECT_KINDS[t].tool.key)).size).toBe(OBJECT_TYPES.length);
  });

  it('places and draws objects of its own kind that the engine accepts', () => {
    for (const type of OBJECT_TYPES) {
      const kind = kindOf(type);
      const placed = kind.place(EXAMPLE_DESIGN, 'n1', kind.centre(EXAMPLE_DESIGN));
      const drawn = kind.draw('n2', { x: 20, y: 10 }, { x: 50, y: 30 });
      expect(placed.type, type).toBe(type);
      expect(drawn?.type, type).toBe(type);
      const parsed = parseDesign({ ...EXAMPLE_DESIGN, objects: [placed, drawn as DesignObject] });
      expect(parsed.ok, type).toBe(true);
    }
  });

  it('says which shape each kind is held as', () => {
    const byForm = (f: (o: DesignObject) => boolean) => EXAMPLE_DESIGN.objects.filter(f).map((o) => o.type);
    expect(byForm(isSegment).sort()).toEqual(['glass', 'perch', 'screen']);
    expect(byForm(isBox).sort()).toEqual(['foliage', 'hide', 'ledge']);
  });

  it('bounds a perch by its branch thickness and a box by its rectangle', () => {
    const perch = { type: 'perch', id: 'b', x1: 10, y1: 20, x2: 50, y2: 20, thickness: 4 } as const;
    expect(kindOf('perch').bounds(perch)).toEqual({ x: 8, y: 18, width: 44, height: 4 });
    const ledge = { type: 'ledge', id: 'l', x: 5, y: 0, width: 30, height: 15 } as const;
    expect(kindOf('ledge').bounds(ledge)).toEqual({ x: 5, y: 0, width: 30, height: 15 });
  });

  it('draws every kind in the report raster with the pen it is given', () => {
    const calls: string[] = [];
    const pen: RasterPen = {
      pxPerCm: 2,
      ink: [0, 0, 0],
      line: () => void calls.push('line'),
      box: () => void calls.push('box'),
    };
    for (const o of EXAMPLE_DESIGN.objects) {
      const before = calls.length;
      kindOf(o.type).raster(o, pen);
      expect(calls.length, o.id).toBeGreaterThan(before);
    }
  });

  it('makes room above the lid for lamps on it', () => {
    expect(drawingTop(EXAMPLE_DESIGN)).toBe(66);
  });
});
