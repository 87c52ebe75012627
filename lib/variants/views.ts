import type { Design as DesignFile } from '@/simulation';
import type { Design, ShareLink, User, Variant } from '@/models';
import { readStoredDesign } from './stored-design';
import { shareLinkState, type ShareLinkState } from './tokens';

/** The JSON shapes the API answers with (and the client components read). Dates are ISO strings. */

export type VariantSummary = {
  id: number;
  designId: number;
  name: string;
  version: number;
  updatedAt: string;
};
export type VariantDetail = VariantSummary & {
  design: DesignFile;
  updatedBy: { id: number; name: string } | null;
};
export type DesignSummary = {
  id: number;
  enclosureId: number;
  name: string;
  createdAt: string;
  updatedAt: string;
  variants: VariantSummary[];
};
export type ShareView = {
  id: number;
  variantId: number;
  state: ShareLinkState;
  expiresAt: string | null;
  revokedAt: string | null;
  createdAt: string;
};

const iso = (d: Date | string) => new Date(d).toISOString();

export function variantSummary(v: Variant): VariantSummary {
  return { id: v.id, designId: v.designId, name: v.name, version: v.version, updatedAt: iso(v.updatedAt) };
}

export function variantDetail(v: Variant & { updatedBy?: User | null }): VariantDetail {
  return {
    ...variantSummary(v),
    design: readStoredDesign(v.designJson),
    updatedBy: v.updatedBy ? { id: v.updatedBy.id, name: v.updatedBy.name } : null,
  };
}

export function designSummary(d: Design, variants: Variant[]): DesignSummary {
  // A design "changed" when any of its variants did; the list sorts by that.
  const latest = Math.max(
    new Date(d.updatedAt).getTime(),
    ...variants.map((v) => new Date(v.updatedAt).getTime()),
  );
  return {
    id: d.id,
    enclosureId: d.enclosureId,
    name: d.name,
    createdAt: iso(d.createdAt),
    updatedAt: new Date(latest).toISOString(),
    variants: variants.map(variantSummary),
  };
}

export function shareView(s: ShareLink, now = new Date()): ShareView {
  return {
    id: s.id,
    variantId: s.variantId,
    state: shareLinkState(s, now),
    expiresAt: s.expiresAt ? iso(s.expiresAt) : null,
    revokedAt: s.revokedAt ? iso(s.revokedAt) : null,
    createdAt: iso(s.createdAt),
  };
}
