import { describe, expect, it } from 'vitest';
import { designFileName } from './download';

describe('designFileName', () => {
  it('makes a plain file name from a studio title', () => {
    expect(designFileName('Desert vivarium · Main plan · Variant A', 'unsaved')).toBe(
      'desert-vivarium-main-plan-variant-a-unsaved.baskwell.json',
    );
    expect(designFileName('···', 'unsaved')).toBe('design-unsaved.baskwell.json');
  });
});
