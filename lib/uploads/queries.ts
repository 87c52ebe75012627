import 'server-only';
import { DomainError, notFound } from '@/lib/errors';
import { getObject, StorageUnavailableError } from '@/lib/storage/s3';
import { Upload } from '@/models';

/** Reading uploaded files: their records and their bytes from the object store. */

export function storageUnavailable(): DomainError {
  return new DomainError(
    'unavailable',
    'The file store cannot be reached right now. Nothing was saved; try again shortly.',
    { retryAfterS: 5 },
  );
}

export function uploadJson(u: Upload) {
  return {
    id: u.id,
    kind: u.kind,
    enclosureId: u.enclosureId,
    contentType: u.contentType,
    sizeBytes: u.sizeBytes,
    sha256: u.sha256,
    originalName: u.originalName,
    url: `/api/uploads/${u.id}`,
    createdAt: u.createdAt.toISOString(),
  };
}

/** An enclosure's uploads (of one kind, or all), newest first. The caller has checked that the person may read the enclosure. */
export async function uploadsOf(
  enclosureId: number,
  kind: Upload['kind'] | undefined,
  limit: number,
): Promise<Upload[]> {
  return Upload.findAll({
    where: { enclosureId, ...(kind ? { kind } : {}) },
    order: [['id', 'DESC']],
    limit,
  });
}

/** An enclosure's photos, newest first. */
export const backdropsOf = (enclosureId: number, limit: number) => uploadsOf(enclosureId, 'backdrop', limit);

export async function uploadBytes(upload: Upload): Promise<Uint8Array> {
  try {
    const bytes = await getObject(upload.storageKey);
    if (!bytes) throw notFound('The file');
    return bytes;
  } catch (e) {
    if (e instanceof StorageUnavailableError) throw storageUnavailable();
    throw e;
  }
}
