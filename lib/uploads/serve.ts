import type { Upload } from '@/models';
import { sniffImage } from './sniff';

/**
 * How a stored upload is handed out. The route's own policy: nothing loads, scripts never run (sandbox),
 * and no page may frame it; next.config.ts sends the same for these paths, since its global header would
 * otherwise replace this one.
 */
export const UPLOAD_CSP = "default-src 'none'; sandbox; frame-ancestors 'none'";

const EXT: Record<string, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'text/csv': 'csv',
  'application/octet-stream': 'bin',
};

/** The type judged from the bytes themselves (images), or the one readings CSVs always have. */
export function servedType(upload: Pick<Upload, 'kind'>, bytes: Uint8Array): string {
  if (upload.kind === 'readings-csv') return 'text/csv';
  return sniffImage(bytes) ?? 'application/octet-stream';
}

/** The uploaded name's stem (for people to recognise) with the served type's extension, header-safe. */
export function servedName(upload: Pick<Upload, 'id' | 'originalName'>, type: string): string {
  const stem = (upload.originalName ?? '')
    .replace(/\.[^.]*$/, '')
    .replace(/[^\w\- ]/g, '_')
    .trim()
    .slice(0, 100);
  return `${stem || `upload-${upload.id}`}.${EXT[type] ?? 'bin'}`;
}
