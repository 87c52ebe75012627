import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN } from '@/simulation';
import { DesignShapes, drawingTop, fieldLook, SKETCH_LOOK } from './DesignShapes';

// The share pages, the compare page and the guided start draw objects through DesignShapes. The
// snapshots were taken before the object kinds moved into one record each, so a kind that draws
// itself differently from before fails here, attribute by attribute.
describe('DesignShapes', () => {
  const design = EXAMPLE_DESIGN;
  const draw = (look: Parameters<typeof DesignShapes>[0]['look']) =>
    renderToStaticMarkup(<DesignShapes objects={design.objects} look={look} />);

  it('draws every kind of the example (tube and bulb lamps) as before, as a sketch', () => {
    expect(new Set(design.objects.map((o) => o.type)).size).toBe(7);
    expect(draw(SKETCH_LOOK)).toMatchSnapshot();
  });

  it('draws every kind as before over a computed field', () => {
    expect(draw(fieldLook(0.7))).toMatchSnapshot();
  });

  it('makes room above the lid for the lamps resting on it', () => {
    // The heat bulb's emitting point is 2 cm above the 60 cm lid; 4 cm more shows its whole mark.
    expect(drawingTop(design)).toBe(66);
    expect(drawingTop({ enclosure: { height: 60 }, objects: [] })).toBe(60);
  });
});
