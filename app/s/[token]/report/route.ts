import { z } from 'zod';
import { ApiError, errorResponse } from '@/lib/api/errors';
import { DomainError } from '@/lib/errors';
import { runEngineTask } from '@/lib/engine-pool';
import { download, fileBase } from '@/lib/reports/build';
import { countExport } from '@/lib/reports/limits';
import { resolveShareToken } from '@/lib/variants/queries';
import { logger } from '@/lib/log';
import { assertComputable } from '@/lib/variants/stored-design';

const query = z.object({
  format: z.enum(['pdf', 'png']).catch('pdf'),
  field: z.enum(['uvi', 'uvb', 'tempC']).catch('uvi'),
});

const gone = () =>
  Response.json(
    { error: { code: 'not_found', message: 'This link does not exist or no longer works.' } },
    { status: 404, headers: { 'Cache-Control': 'no-store' } },
  );

/**
 * The report (or field picture) of a shared variant, for anyone holding a working link. Read-only:
 * no session is used and nothing is written; a revoked or expired link answers 404 like an unknown one.
 */
export async function GET(req: Request, ctx: { params: Promise<{ token: string }> }): Promise<Response> {
  try {
    const { token } = await ctx.params;
    const shared = await resolveShareToken(token);
    if (!shared) return gone();
    const q = query.parse(Object.fromEntries(new URL(req.url).searchParams));
    const subject = {
      variantName: shared.variant.name,
      version: shared.variant.version,
      designName: shared.designName,
      enclosureName: shared.enclosureName,
      organisationName: shared.organisationName,
      exampleData: shared.exampleData,
      design: shared.design,
    };
    const base = fileBase(shared.variant.name);
    assertComputable(shared.design);
    // Per link: the page is public, so the holder of a link is the only "who" there is. The species
    // came with the link.
    await countExport('share', shared.variant.id);
    const species = shared.species;
    if (q.format === 'png') {
      const png = await runEngineTask(
        'fieldPng',
        { subject, field: q.field, months: 0 },
        { signal: req.signal },
      );
      return download(new Uint8Array(png), 'image/png', `${base}-${q.field}.png`);
    }
    const pdf = await runEngineTask(
      'reportPdf',
      { subject, options: { field: q.field, months: 0, species }, now: new Date() },
      { signal: req.signal },
    );
    return download(new Uint8Array(pdf), 'application/pdf', `${base}.pdf`);
  } catch (error) {
    // Busy, too slow, too many downloads: the client is told why and when to come back.
    if (error instanceof DomainError || error instanceof ApiError) return errorResponse(error);
    logger().error({ err: error }, 'shared report failed');
    return Response.json(
      { error: { code: 'internal', message: 'The report could not be made. Try again.' } },
      { status: 500, headers: { 'Cache-Control': 'no-store' } },
    );
  }
}
