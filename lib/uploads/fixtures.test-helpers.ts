// Builders of small image files for the upload tests (test-only; not imported by the app).
import { PNG } from 'pngjs';

const CRC_TABLE = (() => {
  const t = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    t[n] = c >>> 0;
  }
  return t;
})();

export function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (const b of bytes) c = (CRC_TABLE[(c ^ b) & 0xff] as number) ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

const enc = (s: string) => new TextEncoder().encode(s);

export function pngChunk(type: string, data: Uint8Array): Buffer {
  const out = Buffer.alloc(12 + data.length);
  out.writeUInt32BE(data.length, 0);
  out.write(type, 4, 'latin1');
  Buffer.from(data).copy(out, 8);
  out.writeUInt32BE(crc32(out.subarray(4, 8 + data.length)), 8 + data.length);
  return out;
}

/** A 4×3 PNG with a text chunk naming a person and an eXIf chunk, both right after IHDR. */
export function pngWithMetadata(): { bytes: Buffer; pixels: Buffer } {
  const png = new PNG({ width: 4, height: 3 });
  for (let i = 0; i < png.data.length; i++) png.data[i] = (i * 37) & 0xff;
  const plain = PNG.sync.write(png);
  const ihdrEnd = 8 + 12 + plain.readUInt32BE(8);
  const bytes = Buffer.concat([
    plain.subarray(0, ihdrEnd),
    pngChunk('tEXt', enc('Author\0Test Keeper')),
    pngChunk('iTXt', enc('Comment\0\0\0\0\0at home, 12 Example Road')),
    pngChunk('eXIf', enc('MM\0*GPS-DATA')),
    plain.subarray(ihdrEnd),
  ]);
  return { bytes, pixels: Buffer.from(png.data) };
}

function seg(marker: number, payload: Uint8Array): Uint8Array {
  const out = new Uint8Array(4 + payload.length);
  out[0] = 0xff;
  out[1] = marker;
  out[2] = ((payload.length + 2) >> 8) & 0xff;
  out[3] = (payload.length + 2) & 0xff;
  out.set(payload, 4);
  return out;
}

/** A structurally complete baseline JPEG (markers in the usual order) with Exif, XMP and a comment. */
export function jpegWithMetadata(): Uint8Array {
  const parts = [
    new Uint8Array([0xff, 0xd8]),
    seg(0xe0, enc('JFIF\0\x01\x01\0\0\x01\0\x01\0\0')),
    seg(0xe1, enc('Exif\0\0MM\0*GPS 51.5N 0.1W')),
    seg(0xe1, enc('http://ns.adobe.com/xap/1.0/\0<x:xmpmeta>Test Keeper</x:xmpmeta>')),
    seg(0xe2, enc('ICC_PROFILE\0\x01\x01colour')),
    seg(0xfe, enc('a comment with a name')),
    seg(0xdb, new Uint8Array(65)),
    seg(0xc0, new Uint8Array([8, 0, 8, 0, 8, 1, 1, 0x11, 0])),
    seg(0xc4, new Uint8Array(20)),
    seg(0xda, new Uint8Array([1, 1, 0, 0, 0x3f, 0])),
    // Entropy-coded data: a stuffed FF00 and a restart marker must survive as they are.
    new Uint8Array([0x12, 0xff, 0x00, 0x34, 0xff, 0xd0, 0x56]),
    new Uint8Array([0xff, 0xd9]),
  ];
  const out = new Uint8Array(parts.reduce((s, p) => s + p.length, 0));
  let o = 0;
  for (const p of parts) {
    out.set(p, o);
    o += p.length;
  }
  return out;
}

function riffChunk(fourcc: string, data: Uint8Array): Buffer {
  const pad = data.length & 1;
  const out = Buffer.alloc(8 + data.length + pad);
  out.write(fourcc, 0, 'latin1');
  out.writeUInt32LE(data.length, 4);
  Buffer.from(data).copy(out, 8);
  return out;
}

/** An extended WebP (VP8X with the EXIF and XMP flags set) with both metadata chunks present. */
export function webpWithMetadata(): Buffer {
  const vp8x = new Uint8Array(10);
  vp8x[0] = 0x08 | 0x04 | 0x10; // EXIF, XMP, alpha
  const body = Buffer.concat([
    riffChunk('VP8X', vp8x),
    riffChunk('VP8L', enc('\x2f-fake-lossless-bitstream')), // odd length: padded
    riffChunk('EXIF', enc('MM\0*GPS 51.5N')),
    riffChunk('XMP ', enc('<x:xmpmeta>Test Keeper</x:xmpmeta>')),
  ]);
  const head = Buffer.alloc(12);
  head.write('RIFF', 0, 'latin1');
  head.writeUInt32LE(4 + body.length, 4);
  head.write('WEBP', 8, 'latin1');
  return Buffer.concat([head, body]);
}
