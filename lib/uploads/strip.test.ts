import { describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import { InvalidImageError } from './errors';
import { sniffImage } from './sniff';
import { stripMetadata } from './strip';
import { jpegWithMetadata, pngChunk, pngWithMetadata, webpWithMetadata } from '@/tests/fixtures/images';

const text = (b: Uint8Array) => Buffer.from(b).toString('latin1');

describe('sniffImage', () => {
  it('recognises JPEG, PNG and WebP by their first bytes', () => {
    expect(sniffImage(jpegWithMetadata())).toBe('image/jpeg');
    expect(sniffImage(pngWithMetadata().bytes)).toBe('image/png');
    expect(sniffImage(webpWithMetadata())).toBe('image/webp');
  });

  it('refuses anything else, whatever it is called', () => {
    expect(sniffImage(new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg"/>'))).toBeNull();
    expect(sniffImage(new TextEncoder().encode('GIF89a....'))).toBeNull();
    expect(sniffImage(new TextEncoder().encode('RIFF\0\0\0\0WAVEfmt '))).toBeNull();
    expect(sniffImage(new Uint8Array([0xff, 0xd8]))).toBeNull();
    expect(sniffImage(new Uint8Array())).toBeNull();
  });
});

describe('stripMetadata — JPEG', () => {
  const input = jpegWithMetadata();
  const out = stripMetadata('image/jpeg', input);

  it('drops Exif, XMP and comments', () => {
    expect(text(out)).not.toContain('Exif');
    expect(text(out)).not.toContain('xmpmeta');
    expect(text(out)).not.toContain('a comment');
    expect(text(out)).not.toContain('GPS');
  });

  it('keeps JFIF, the colour profile, the tables, the frame and the scan data byte for byte', () => {
    expect(text(out)).toContain('JFIF');
    expect(text(out)).toContain('ICC_PROFILE');
    const tail = [0x12, 0xff, 0x00, 0x34, 0xff, 0xd0, 0x56, 0xff, 0xd9];
    expect([...out.subarray(out.length - tail.length)]).toEqual(tail);
    expect(out.length).toBeLessThan(input.length);
    expect(sniffImage(out)).toBe('image/jpeg');
  });

  it('is idempotent', () => {
    expect([...stripMetadata('image/jpeg', out)]).toEqual([...out]);
  });

  it('refuses a truncated file and a file with no picture in it', () => {
    expect(() => stripMetadata('image/jpeg', input.subarray(0, 40))).toThrow(InvalidImageError);
    expect(() => stripMetadata('image/jpeg', new Uint8Array([0xff, 0xd8, 0xff, 0xd9]))).toThrow(
      InvalidImageError,
    );
    expect(() => stripMetadata('image/jpeg', new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0x00]))).toThrow(
      InvalidImageError,
    );
  });
});

describe('stripMetadata — PNG', () => {
  const { bytes, pixels } = pngWithMetadata();
  const out = stripMetadata('image/png', bytes);

  it('drops tEXt, iTXt, zTXt and eXIf chunks', () => {
    for (const s of ['tEXt', 'iTXt', 'eXIf', 'Test Keeper', 'Example Road'])
      expect(text(out)).not.toContain(s);
  });

  it('leaves a valid PNG with the same pixels (CRCs checked by the decoder)', () => {
    const decoded = PNG.sync.read(Buffer.from(out), { checkCRC: true } as never);
    expect(decoded.width).toBe(4);
    expect(decoded.height).toBe(3);
    expect(Buffer.from(decoded.data).equals(pixels)).toBe(true);
  });

  it('refuses a PNG cut short or missing IHDR', () => {
    expect(() => stripMetadata('image/png', bytes.subarray(0, bytes.length - 6))).toThrow(InvalidImageError);
    const broken = Buffer.from(bytes);
    broken.write('XXXX', 12, 'latin1');
    expect(() => stripMetadata('image/png', broken)).toThrow(InvalidImageError);
  });
});

describe('stripMetadata — WebP', () => {
  const input = webpWithMetadata();
  const out = stripMetadata('image/webp', input);
  const view = new DataView(out.buffer, out.byteOffset, out.byteLength);

  it('drops the EXIF and XMP chunks and clears their VP8X flags, keeping the others', () => {
    expect(text(out)).not.toContain('EXIF');
    expect(text(out)).not.toContain('XMP ');
    expect(text(out)).not.toContain('Test Keeper');
    expect(text(out)).toContain('VP8L');
    expect(out[20]).toBe(0x10); // alpha flag kept, EXIF and XMP flags cleared
  });

  it('rewrites the RIFF size to the new length', () => {
    expect(view.getUint32(4, true)).toBe(out.length - 8);
    expect(sniffImage(out)).toBe('image/webp');
  });

  it('refuses a WebP whose chunks run past the end or that holds no picture', () => {
    const cut = Buffer.from(input.subarray(0, 40));
    expect(() => stripMetadata('image/webp', cut)).toThrow(InvalidImageError);
    const empty = Buffer.from('RIFF\x04\0\0\0WEBP', 'latin1');
    expect(() => stripMetadata('image/webp', Buffer.concat([empty, Buffer.alloc(8)]))).toThrow(
      InvalidImageError,
    );
  });
});

describe('stripMetadata — anything not needed to draw the picture', () => {
  const script = new TextEncoder().encode('<html><script>alert(document.cookie)</script></html>');

  it('drops an unknown PNG chunk (an htMl chunk carrying a script) and whatever follows IEND', () => {
    const { bytes, pixels } = pngWithMetadata();
    const ihdrEnd = 8 + 12 + bytes.readUInt32BE(8);
    const hostile = Buffer.concat([
      bytes.subarray(0, ihdrEnd),
      pngChunk('htMl', script),
      pngChunk('prVt', script),
      bytes.subarray(ihdrEnd),
      Buffer.from(script),
    ]);
    const out = stripMetadata('image/png', hostile);
    expect(text(out)).not.toContain('script');
    expect(text(out)).not.toContain('htMl');
    const decoded = PNG.sync.read(Buffer.from(out), { checkCRC: true } as never);
    expect(Buffer.from(decoded.data).equals(pixels)).toBe(true);
  });

  it('drops JPEG application segments other than JFIF, ICC and Adobe, and bytes after the end marker', () => {
    const input = jpegWithMetadata();
    const seg = (marker: number) => new Uint8Array([0xff, marker, 0, script.length + 2, ...script]);
    const hostile = new Uint8Array([
      ...input.subarray(0, 2),
      ...seg(0xe5),
      ...seg(0xef),
      ...input.subarray(2),
      ...script,
    ]);
    const out = stripMetadata('image/jpeg', hostile);
    expect(text(out)).not.toContain('script');
    expect([...out.subarray(-2)]).toEqual([0xff, 0xd9]);
  });

  it('drops unknown WebP chunks', () => {
    const input = webpWithMetadata();
    const extra = Buffer.alloc(8 + script.length);
    extra.write('HTML', 0, 'latin1');
    extra.writeUInt32LE(script.length, 4);
    Buffer.from(script).copy(extra, 8);
    const hostile = Buffer.concat([input, extra]);
    hostile.writeUInt32LE(hostile.length - 8, 4);
    const out = stripMetadata('image/webp', hostile);
    expect(text(out)).not.toContain('script');
    expect(text(out)).toContain('VP8L');
  });
});
