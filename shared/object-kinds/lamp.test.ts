import { describe, expect, it } from 'vitest';
import { nameWithWatts } from './lamp';

describe('a lamp’s name with its wattage', () => {
  it('adds the wattage to a name that does not state it', () => {
    expect(nameWithWatts('Basking tube', 24)).toBe('Basking tube · 24 W');
    expect(nameWithWatts('Heat spot', 100)).toBe('Heat spot · 100 W');
  });

  it('leaves a name that already states the same wattage as it is', () => {
    expect(nameWithWatts('Ceramic heat emitter, 100 W (2 of 2)', 100)).toBe(
      'Ceramic heat emitter, 100 W (2 of 2)',
    );
    expect(nameWithWatts('54W T5 tube', 54)).toBe('54W T5 tube');
    expect(nameWithWatts('Spot 7.5 W', 7.5)).toBe('Spot 7.5 W');
  });

  it('still adds it when the name states another figure', () => {
    expect(nameWithWatts('Ceramic heat emitter, 100 W', 150)).toBe('Ceramic heat emitter, 100 W · 150 W');
    expect(nameWithWatts('Spot 1100 W', 100)).toBe('Spot 1100 W · 100 W');
    expect(nameWithWatts('T5 HO 24', 24)).toBe('T5 HO 24 · 24 W');
    expect(nameWithWatts('Wide 24 Watt-less', 24)).toBe('Wide 24 Watt-less · 24 W');
  });
});
