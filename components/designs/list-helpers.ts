import { formatMoment } from '@/lib/time/format';
import type { DesignSummary } from '@/lib/variants/queries';

/** "Copy of X", or "Copy of X (2)" when that name is taken in the design. */
export function copyName(name: string, taken: string[]): string {
  const base = `Copy of ${name}`.slice(0, 120);
  if (!taken.includes(base)) return base;
  for (let n = 2; ; n++) {
    const candidate = `${base.slice(0, 114)} (${n})`;
    if (!taken.includes(candidate)) return candidate;
  }
}

export type DesignSort = 'updated' | 'name' | 'created';

export function sortDesigns(designs: DesignSummary[], sort: DesignSort): DesignSummary[] {
  const out = [...designs];
  if (sort === 'name') out.sort((a, b) => a.name.localeCompare(b.name, undefined, { sensitivity: 'base' }));
  else if (sort === 'created') out.sort((a, b) => b.createdAt.localeCompare(a.createdAt) || b.id - a.id);
  else out.sort((a, b) => b.updatedAt.localeCompare(a.updatedAt) || b.id - a.id);
  return out;
}

/** Where a variant opens for editing, and where two variants are compared. */
export const studioHref = (variantId: number) => `/studio/${variantId}`;
export const compareHref = (a: number, b?: number) => `/compare?a=${a}${b ? `&b=${b}` : ''}`;
export const designHref = (designId: number) => `/designs/${designId}`;

/** "3 min ago", "yesterday", or a date in the viewer's zone: enough to tell recent work apart. */
export function changedAgo(iso: string, now: Date, zone: string): string {
  const s = Math.round((now.getTime() - new Date(iso).getTime()) / 1000);
  if (s < 45) return 'just now';
  const m = Math.round(s / 60);
  if (m < 60) return `${m} min ago`;
  const h = Math.round(m / 60);
  if (h < 24) return `${h} h ago`;
  const d = Math.round(h / 24);
  if (d === 1) return 'yesterday';
  if (d < 7) return `${d} days ago`;
  return formatMoment(iso, zone, 'day');
}
