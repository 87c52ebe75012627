/**
 * What a file is, judged by its first bytes (its "magic number"), never by its name or the type the
 * browser claimed. Only the image formats a backdrop may be are recognised.
 */
export type ImageType = 'image/jpeg' | 'image/png' | 'image/webp';

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

const startsWith = (b: Uint8Array, sig: readonly number[], at = 0) =>
  b.length >= at + sig.length && sig.every((v, i) => b[at + i] === v);
const ascii = (s: string) => [...s].map((c) => c.charCodeAt(0));

export function sniffImage(bytes: Uint8Array): ImageType | null {
  // JPEG: SOI marker FF D8 followed by the next marker's FF (ISO/IEC 10918-1, Annex B).
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return 'image/jpeg';
  // PNG: the 8-byte signature (ISO/IEC 15948 §5.2).
  if (startsWith(bytes, PNG_SIGNATURE)) return 'image/png';
  // WebP: a RIFF container whose form type is "WEBP" (RFC 9649 §2.5).
  if (startsWith(bytes, ascii('RIFF')) && startsWith(bytes, ascii('WEBP'), 8)) return 'image/webp';
  return null;
}

export const IMAGE_TYPES: readonly ImageType[] = ['image/jpeg', 'image/png', 'image/webp'];

export function describeType(t: string): string {
  return t === 'image/jpeg' ? 'JPEG' : t === 'image/png' ? 'PNG' : t === 'image/webp' ? 'WebP' : t;
}
