import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import { dimensionProblem, imageDimensions, MAX_IMAGE_SIDE_PX } from './dimensions';
import { jpegWithMetadata, pngWithMetadata, webpWithMetadata } from '@/tests/fixtures/images';

describe('imageDimensions', () => {
  it('reads the size from the header of each format', () => {
    expect(imageDimensions('image/png', pngWithMetadata().bytes)).toEqual({ width: 4, height: 3 });
    expect(imageDimensions('image/jpeg', jpegWithMetadata())).toEqual({ width: 8, height: 8 });
    const png = new PNG({ width: 7, height: 5 });
    expect(imageDimensions('image/png', PNG.sync.write(png))).toEqual({ width: 7, height: 5 });
    // The VP8X canvas of the WebP fixture is 1 × 1 (zero bytes mean one pixel).
    expect(imageDimensions('image/webp', webpWithMetadata())).toEqual({ width: 1, height: 1 });
  });

  it('refuses a picture that claims 50000 × 50000 pixels, whatever its file size', () => {
    const bytes = Buffer.from(pngWithMetadata().bytes);
    bytes.writeUInt32BE(50_000, 16);
    bytes.writeUInt32BE(50_000, 20);
    const size = imageDimensions('image/png', bytes);
    expect(size).toEqual({ width: 50_000, height: 50_000 });
    expect(dimensionProblem(size)).toMatch(/at most 12000 pixels on a side/);
    expect(dimensionProblem({ width: MAX_IMAGE_SIDE_PX, height: 4000 })).toMatch(/million pixels/);
    expect(dimensionProblem({ width: 4000, height: 3000 })).toBeNull();
  });
});
