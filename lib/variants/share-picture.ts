import 'server-only';
import { createHash } from 'node:crypto';
import type { FieldName } from '@/simulation';
import { Lru } from './lru';

/**
 * A share page's field picture lives at its own address, one per link, variant version and field:
 *   /s/<token>/picture/<version>/<field>.svg
 * What it shows can only change with the variant's version, so the address is cacheable for ever
 * (`immutable`, an ETag for revalidation) and the share page's HTML stays small. The route checks the
 * link on every request, so a revoked or expired link stops serving its pictures at once.
 */
export const PICTURE_FIELDS = ['uvi', 'uvb', 'tempC'] as const satisfies readonly FieldName[];

export const PICTURE_CACHE_CONTROL = 'public, max-age=31536000, immutable';

export function sharePicturePath(token: string, version: number, field: FieldName): string {
  return `/s/${token}/picture/${version}/${field}.svg`;
}

/** The version and field of a picture address's last two segments, or null when they are not one. */
export function parsePictureParams(
  version: string,
  file: string,
): { version: number; field: FieldName } | null {
  const m = /^(uvi|uvb|tempC)\.svg$/.exec(file);
  if (!m || !/^[1-9]\d{0,9}$/.test(version)) return null;
  return { version: Number(version), field: m[1] as FieldName };
}

export type DrawnPicture = { svg: string; etag: string };

/** The cache key of a picture: what it is drawn from, the stored design (the same design gives the same picture). */
export function pictureKey(designJson: string, field: FieldName): string {
  return `${field}:${createHash('sha256').update(designJson).digest('base64url')}`;
}

/** A strong ETag of the drawn markup itself: a new look of the same design is a new tag. */
export function drawnPicture(svg: string): DrawnPicture {
  return { svg, etag: `"${createHash('sha256').update(svg).digest('base64url').slice(0, 27)}"` };
}

/** Whether an If-None-Match header names this ETag (a list, weak forms and `*` included). */
export function matchesEtag(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch
    .split(',')
    .map((t) => t.trim().replace(/^W\//, ''))
    .some((t) => t === '*' || t === etag);
}

// The drawn markup by what it is drawn from (pictureKey): one link is opened by many people, and its picture is the same for all of
// them. About 20–80 kB a picture; pictures of every link and field share these entries.
const KEY = Symbol.for('baskwell.variants.share-pictures');
const holder = globalThis as typeof globalThis & { [KEY]?: Lru<string, DrawnPicture> };
export function pictureCache(): Lru<string, DrawnPicture> {
  return (holder[KEY] ??= new Lru<string, DrawnPicture>(64));
}
