import { ownedRoute } from '@/lib/api';
import { neutraliseCsv } from '@/lib/files/csv-safe';
import { servedName, servedType, UPLOAD_CSP } from '@/lib/uploads/serve';
import { deleteUpload } from '@/lib/uploads/mutations';
import { uploadBytes } from '@/lib/uploads/queries';

/**
 * The file itself, only to people who may see its enclosure. Served with the type found in its content
 * and `nosniff`, under a name whose extension is that type's (never the uploaded name's), never from
 * public/, and never kept by any cache (`private, no-store`): once access is withdrawn — the enclosure
 * moved to another keeper, a member removed — a cached copy must not outlive it. Its own policy
 * (`default-src 'none'; sandbox`) also comes from next.config.ts, so the global header cannot replace it.
 * A stored CSV is served with its formula cells neutralised, so opening it in a spreadsheet runs nothing.
 */
export const GET = ownedRoute('upload', 'read', {
  handler: async ({ thing: upload }) => {
    const stored = await uploadBytes(upload);
    const type = servedType(upload, stored);
    const bytes =
      type === 'text/csv'
        ? new TextEncoder().encode(neutraliseCsv(new TextDecoder().decode(stored)))
        : stored;
    const inline = type.startsWith('image/');
    return new Response(Buffer.from(bytes), {
      status: 200,
      headers: {
        'Content-Type': type === 'text/csv' ? 'text/csv; charset=utf-8' : type,
        'Content-Length': String(bytes.byteLength),
        'Content-Disposition': `${inline ? 'inline' : 'attachment'}; filename="${servedName(upload, type)}"`,
        'Cache-Control': 'private, no-store',
        'X-Content-Type-Options': 'nosniff',
        'Content-Security-Policy': UPLOAD_CSP,
        ETag: `"${upload.sha256}"`,
      },
    });
  },
});

export const DELETE = ownedRoute('upload', 'delete', {
  handler: async ({ thing: upload, params }) => {
    await deleteUpload(upload);
    return { ok: true, id: params.id };
  },
});
