import { createElement } from 'react';
import { FieldSvg } from '@/components/designs/FieldSvg';
import { staticSvg } from '@/components/designs/static-svg';
import { ApiError, errorResponse } from '@/lib/api/errors';
import { DomainError } from '@/lib/errors';
import { runEngineTask } from '@/lib/engine-pool';
import { logger } from '@/lib/log';
import {
  PICTURE_CACHE_CONTROL,
  drawnPicture,
  matchesEtag,
  parsePictureParams,
  pictureCache,
  pictureKey,
} from '@/lib/variants/share-picture';
import { findShare } from '@/lib/variants/queries';
import { readStoredDesign } from '@/lib/variants/stored-design';
import { hotSpotMarker } from '@/shared/designs/figures';
import { designWorkProblem, physicsOf } from '@/simulation';

export const dynamic = 'force-dynamic';

const gone = () =>
  new Response('This picture does not exist or its link no longer works.', {
    status: 404,
    headers: { 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store' },
  });

/**
 * One field picture of a shared variant at one version (lib/variants/share-picture): SVG, cacheable for
 * ever, revalidated by ETag. The link is checked on every request, 304s included, so a revoked or
 * expired link stops serving its pictures at once; a version other than the current one is not served
 * (its address would promise a drawing the server no longer has).
 */
export async function GET(
  req: Request,
  ctx: { params: Promise<{ token: string; version: string; file: string }> },
): Promise<Response> {
  const { token, version, file } = await ctx.params;
  const wanted = parsePictureParams(version, file);
  if (!wanted) return gone();
  const shared = await findShare(token);
  if (!shared || shared.variant.version !== wanted.version) return gone();
  try {
    // A picture is drawn only from what the key names: a held one needs no parsing of the design.
    const key = pictureKey(shared.designJson, wanted.field);
    let picture = pictureCache().get(key);
    if (!picture) {
      // Without its photo backdrop: a visitor with the link may not read the enclosure's uploads.
      const design = physicsOf(readStoredDesign(shared.designJson));
      if (designWorkProblem(design)) return gone();
      const { scale, bands, figures } = await runEngineTask(
        'fieldPicture',
        { design, field: wanted.field },
        { signal: req.signal },
      );
      // The name of the variant is the page's alt text, not part of the drawing: a rename keeps the
      // version, and the picture must not carry the old name for ever.
      const svg = staticSvg(
        createElement(FieldSvg, {
          design,
          bands,
          scale,
          title: scale.label,
          markers: hotSpotMarker(figures),
        }),
      );
      picture = drawnPicture(svg);
      pictureCache().set(key, picture);
    }
    const headers = {
      ETag: picture.etag,
      'Cache-Control': PICTURE_CACHE_CONTROL,
      'X-Content-Type-Options': 'nosniff',
    };
    if (matchesEtag(req.headers.get('if-none-match'), picture.etag)) {
      return new Response(null, { status: 304, headers });
    }
    return new Response(picture.svg, {
      headers: { ...headers, 'Content-Type': 'image/svg+xml; charset=utf-8' },
    });
  } catch (error) {
    // The engine busy or too slow: the client is told why and when to come back.
    if (error instanceof DomainError || error instanceof ApiError) return errorResponse(error);
    logger().error({ err: error }, 'shared picture failed');
    return new Response('The picture could not be drawn. Try again.', {
      status: 500,
      headers: { 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store' },
    });
  }
}
