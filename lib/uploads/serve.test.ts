import { describe, expect, it } from 'vitest';
import { servedName, servedType } from './serve';
import { pngWithMetadata } from '@/tests/fixtures/images';

describe('served uploads', () => {
  it('takes the extension from the content, never from the uploaded name', () => {
    const png = pngWithMetadata().bytes;
    const type = servedType({ kind: 'backdrop' }, png);
    expect(type).toBe('image/png');
    expect(servedName({ id: 4, originalName: 'photo.html' }, type)).toBe('photo.png');
    expect(servedName({ id: 4, originalName: 'a"b;.svg' }, type)).toBe('a_b_.png');
    expect(servedName({ id: 4, originalName: null }, type)).toBe('upload-4.png');
    expect(servedName({ id: 5, originalName: 'readings.xlsm' }, 'text/csv')).toBe('readings.csv');
  });

  it('serves bytes that are no known image as a download of unknown type', () => {
    const html = new TextEncoder().encode('<html><script>alert(1)</script></html>');
    expect(servedType({ kind: 'backdrop' }, html)).toBe('application/octet-stream');
    expect(servedType({ kind: 'readings-csv' }, html)).toBe('text/csv');
  });
});
