import type { ImageType } from './sniff';
import { stripJpeg } from './strip-jpeg';
import { stripPng } from './strip-png';
import { stripWebp } from './strip-webp';

/** The picture without its metadata (camera, time, place, names), by parsing its container. */
export function stripMetadata(type: ImageType, bytes: Uint8Array): Uint8Array {
  switch (type) {
    case 'image/jpeg':
      return stripJpeg(bytes);
    case 'image/png':
      return stripPng(bytes);
    case 'image/webp':
      return stripWebp(bytes);
  }
}
