import { describe, expect, it } from 'vitest';
import { fileStem } from './file-name';

describe('fileStem', () => {
  it('keeps letters, digits and single dashes, accents folded', () => {
    expect(fileStem('Rock under the tube', 'variant')).toBe('rock-under-the-tube');
    expect(fileStem('Café – Plan B_2', 'variant')).toBe('cafe-plan-b-2');
    expect(fileStem('Desert vivarium · Main plan', 'design')).toBe('desert-vivarium-main-plan');
  });

  it('falls back when nothing is left and cuts long names', () => {
    expect(fileStem('···', 'design')).toBe('design');
    expect(fileStem('a'.repeat(100), 'variant')).toHaveLength(60);
    expect(fileStem('a'.repeat(100), 'design', 80)).toHaveLength(80);
  });
});
