/**
 * The field a studio page sends with its HTML, so the studio opens with the design's field on screen
 * instead of a blank canvas while its own engine worker starts. Computed on an engine thread
 * (lib/variants/studio-first-field.ts), never on the server's event loop.
 */
import 'server-only';
import { cookies } from 'next/headers';
import { runEngineTask } from '@/lib/engine-pool';
import { logger } from '@/lib/log';
import { designWorkProblem, type Design } from '@/simulation';
import type { StudioPicture } from '@/shared/designs/studio-field';
import { parseStudioView, STUDIO_VIEW_COOKIE } from '@/shared/designs/studio-view-cookie';

/**
 * The picture for this viewer's studio (the field and opacity they chose last, from the studio's cookie),
 * or null when they hide fields, the design is beyond what the server computes, or the engine fails or
 * is busy: the studio then simply waits for its own worker.
 */
export async function studioPictureFor(design: Design): Promise<StudioPicture | null> {
  const view = parseStudioView((await cookies()).get(STUDIO_VIEW_COOKIE)?.value);
  if (view.field === null || designWorkProblem(design)) return null;
  try {
    const first = await runEngineTask('studioFirstField', { design, field: view.field });
    return first ? { ...first, opacity: view.opacity } : null;
  } catch (e) {
    logger().warn({ err: e }, 'studio first field not drawn');
    return null;
  }
}
