import { char, id, oneOf, ref, string, table, timestamps, unsigned } from './columns';

export const UPLOAD_KINDS = ['backdrop', 'readings-csv'] as const;
export type UploadKind = (typeof UPLOAD_KINDS)[number];

/**
 * A file someone uploaded, kept in the object store under `storageKey` (never under public/).
 * `contentType` is what the bytes are (detected from their content), not what the browser claimed.
 */
export class Upload extends table('uploads', {
  id: id(),
  kind: oneOf(UPLOAD_KINDS),
  ownerId: ref(),
  organisationId: ref(),
  enclosureId: ref().nullable(),
  storageKey: string(200),
  contentType: string(60),
  sizeBytes: unsigned(),
  sha256: char(64),
  originalName: string(200).nullable(),
  ...timestamps(),
}) {}
