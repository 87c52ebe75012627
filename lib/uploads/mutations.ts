import 'server-only';
import { DomainError } from '@/lib/errors';
import { createHash, randomUUID } from 'node:crypto';

import type { CurrentUser } from '@/lib/auth/session-user';
import { deleteObject, putObject, StorageUnavailableError } from '@/lib/storage/s3';
import { Enclosure, Upload } from '@/models';
import type { Transaction } from 'sequelize';
import { dimensionProblem, imageDimensions } from './dimensions';
import { InvalidImageError } from './errors';
import { describeType, sniffImage } from './sniff';
import { storageUnavailable } from './queries';
import { stripMetadata } from './strip';

/** Storing uploaded files: checked by content, stripped of metadata, kept in the object store. */

const EXT: Record<string, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'text/csv': 'csv',
};

export const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

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

export async function deleteUpload(upload: Upload): Promise<void> {
  try {
    await deleteObject(upload.storageKey);
  } catch (e) {
    if (e instanceof StorageUnavailableError) throw storageUnavailable();
    throw e;
  }
  await upload.destroy();
}
