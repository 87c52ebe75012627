import { describe, expect, it } from 'vitest';
import { EXAMPLE_DATA_LABEL, EXAMPLE_DATA_NOTE } from './example-data';

describe('example data words', () => {
  it('start the note with the label, so the mark reads the same everywhere', () => {
    expect(EXAMPLE_DATA_NOTE.startsWith(`${EXAMPLE_DATA_LABEL}:`)).toBe(true);
    // The PDF's standard font has no characters outside WinAnsi: keep the note plain.
    expect(EXAMPLE_DATA_NOTE).toMatch(/^[\x20-\x7e]+$/);
  });
});
