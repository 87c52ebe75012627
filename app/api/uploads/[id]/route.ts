import { route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { deleteUpload, uploadBytes, uploadFor } from '@/lib/uploads/service';

/**
 * The file itself, only to people who may see its enclosure. Served with the type found in its content
 * and `nosniff`, never from public/, never cached by shared caches.
 */
export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const upload = await uploadFor(user, params.id, 'read');
    const bytes = await uploadBytes(upload);
    const inline = upload.contentType.startsWith('image/');
    const name = (upload.originalName ?? `upload-${upload.id}`).replace(/[^\w.\- ]/g, '_');
    return new Response(Buffer.from(bytes), {
      status: 200,
      headers: {
        'Content-Type': upload.contentType,
        'Content-Length': String(bytes.byteLength),
        'Content-Disposition': `${inline ? 'inline' : 'attachment'}; filename="${name}"`,
        'Cache-Control': 'private, max-age=3600',
        'X-Content-Type-Options': 'nosniff',
        'Content-Security-Policy': "default-src 'none'; sandbox",
        ETag: `"${upload.sha256}"`,
      },
    });
  },
});

export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const upload = await uploadFor(user, params.id, 'delete');
    await deleteUpload(upload);
    return { ok: true, id: params.id };
  },
});
