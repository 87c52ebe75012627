import 'server-only';
import { loadOwned, type UploadWithEnclosure } from '@/lib/access';
import { DomainError, notFound } from '@/lib/errors';
import { createHash, randomUUID } from 'node:crypto';

import type { CurrentUser } from '@/lib/auth/session-user';
import { deleteObject, getObject, putObject, StorageUnavailableError } from '@/lib/storage/s3';
import { Enclosure, Upload } from '@/models';
import type { Transaction } from 'sequelize';
import { dimensionProblem, imageDimensions } from './dimensions';
import { InvalidImageError } from './errors';
import { describeType, sniffImage } from './sniff';
import { stripMetadata } from './strip';

/** Uploaded files: checked by content, stripped of metadata, kept in the object store, served by id. */

const EXT: Record<string, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'text/csv': 'csv',
};

export const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

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

/** A photo of the real enclosure for the studio's traced backdrop. */
export async function storeBackdrop(
  user: Pick<CurrentUser, 'id'>,
  enclosure: Enclosure,
  bytes: Uint8Array,
  claimedType: string | null,
  originalName: string | null,
  transaction?: Transaction,
): Promise<Upload> {
  const type = sniffImage(bytes);
  if (!type) {
    const claim =
      claimedType && claimedType !== 'application/octet-stream'
        ? ` It says it is ${claimedType}, but`
        : ' It';
    throw new DomainError(
      'unsupported',
      `Only JPEG, PNG or WebP photos can be used.${claim} does not start like any of them.`,
      { code: 'unsupported_media_type', field: 'file' },
    );
  }
  let clean: Uint8Array;
  try {
    const problem = dimensionProblem(imageDimensions(type, bytes));
    if (problem) throw new DomainError('too_large', problem, { code: 'payload_too_large', field: 'file' });
    clean = stripMetadata(type, bytes);
  } catch (e) {
    if (e instanceof InvalidImageError)
      throw new DomainError('unsupported', e.message, { code: 'unsupported_media_type', field: 'file' });
    throw e;
  }
  const key = `org-${enclosure.organisationId}/enclosure-${enclosure.id}/backdrop/${randomUUID()}.${EXT[type]}`;
  return storeAndRecord(
    key,
    clean,
    type,
    {
      kind: 'backdrop',
      ownerId: user.id,
      organisationId: enclosure.organisationId,
      enclosureId: enclosure.id,
      originalName: cleanName(originalName, describeType(type)),
    },
    transaction,
  );
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

/** Keeps an imported readings CSV with the readings made from it (for tracing where they came from). */
export async function storeCsv(
  user: CurrentUser,
  enclosure: Enclosure,
  text: string,
  originalName: string | null,
  transaction: Transaction,
): Promise<Upload> {
  const bytes = new TextEncoder().encode(text);
  const key = `org-${enclosure.organisationId}/enclosure-${enclosure.id}/readings/${randomUUID()}.csv`;
  return storeAndRecord(
    key,
    bytes,
    'text/csv',
    {
      kind: 'readings-csv',
      ownerId: user.id,
      organisationId: enclosure.organisationId,
      enclosureId: enclosure.id,
      originalName: cleanName(originalName, 'readings.csv'),
    },
    transaction,
  );
}

function cleanName(name: string | null, fallback: string): string {
  // Only for display: strip paths and control characters, keep it short.
  const base = (name ?? '').split(/[\\/]/).pop() ?? '';
  const clean = base
    .replace(/[\u0000-\u001f\u007f"]/g, '')
    .trim()
    .slice(0, 200);
  return clean || fallback;
}

async function storeAndRecord(
  key: string,
  bytes: Uint8Array,
  contentType: string,
  row: Pick<Upload, 'kind' | 'ownerId' | 'organisationId' | 'enclosureId' | 'originalName'>,
  transaction?: Transaction,
): Promise<Upload> {
  try {
    await putObject(key, bytes, contentType);
  } catch (e) {
    if (e instanceof StorageUnavailableError) throw storageUnavailable();
    throw e;
  }
  try {
    return await Upload.create(
      { ...row, storageKey: key, contentType, sizeBytes: bytes.byteLength, sha256: sha256(bytes) },
      { transaction },
    );
  } catch (e) {
    // No row, no file: do not leave an orphan object behind.
    await deleteObject(key).catch(() => undefined);
    throw e;
  }
}

/**
 * The upload if this user may see it (`loadOwned`): a backdrop (or CSV) of an enclosure goes with that
 * enclosure's rights; anything without an enclosure is its uploader's and the organisation's owners' and
 * staff's, and only its uploader or an owner deletes it.
 */
export const uploadFor = (
  user: CurrentUser,
  id: number,
  action: 'read' | 'delete',
): Promise<UploadWithEnclosure> => loadOwned('upload', id, user, action);

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

export async function deleteUpload(upload: Upload): Promise<void> {
  try {
    await deleteObject(upload.storageKey);
  } catch (e) {
    if (e instanceof StorageUnavailableError) throw storageUnavailable();
    throw e;
  }
  await upload.destroy();
}
