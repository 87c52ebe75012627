/**
 * The studio's field choice in a cookie, so the server can draw the field the studio will show when it
 * opens (the choice itself lives in the browser's storage; the studio copies it here on every change).
 * Value: the field's name and the opacity in hundredths ("uvi.75"), or "off" when fields are hidden.
 */
import type { FieldName } from '@/simulation';

export const STUDIO_VIEW_COOKIE = 'baskwell.studio.view';

export type StudioView = { field: FieldName; opacity: number } | { field: null };

/** What a studio shows before anything is chosen (the session's defaults). */
export const DEFAULT_STUDIO_VIEW: StudioView = { field: 'uvi', opacity: 0.75 };

const FIELDS: readonly FieldName[] = ['uvi', 'uvb', 'tempC'];

export function formatStudioView(v: StudioView): string {
  return v.field === null ? 'off' : `${v.field}.${Math.round(v.opacity * 100)}`;
}

/** The cookie's view, or the default for a missing or malformed value. */
export function parseStudioView(raw: string | undefined): StudioView {
  if (raw === 'off') return { field: null };
  const m = /^(uvi|uvb|tempC)\.(\d{1,3})$/.exec(raw ?? '');
  if (!m) return DEFAULT_STUDIO_VIEW;
  const opacity = Number(m[2]) / 100;
  if (!FIELDS.includes(m[1] as FieldName) || opacity < 0.1 || opacity > 1) return DEFAULT_STUDIO_VIEW;
  return { field: m[1] as FieldName, opacity };
}
