'use client';

import { apiFetch } from '@/components/ui/api-client';
import type { DesignSummary, ShareView, VariantDetail, VariantSummary } from '@/lib/variants/queries';

export type Page<T> = { items: T[]; nextCursor: string | null };

export const designsApi = {
  list: (enclosureId: number, q: string, cursor?: string | null) =>
    apiFetch<Page<DesignSummary>>(
      `/api/enclosures/${enclosureId}/designs?limit=50${q ? `&q=${encodeURIComponent(q)}` : ''}${
        cursor ? `&cursor=${cursor}` : ''
      }`,
    ),
  get: (id: number) => apiFetch<{ design: DesignSummary }>(`/api/designs/${id}`),
  create: (enclosureId: number, name: string) =>
    apiFetch<{ design: DesignSummary; variant: VariantSummary }>(`/api/enclosures/${enclosureId}/designs`, {
      method: 'POST',
      json: { name },
    }),
  rename: (id: number, name: string) =>
    apiFetch<{ design: DesignSummary }>(`/api/designs/${id}`, { method: 'PATCH', json: { name } }),
  remove: (id: number) => apiFetch<{ ok: true }>(`/api/designs/${id}`, { method: 'DELETE' }),
};

export const variantsApi = {
  get: (id: number) => apiFetch<{ variant: VariantDetail }>(`/api/variants/${id}`),
  create: (designId: number, body: { name: string; fromVariantId?: number; design?: unknown }) =>
    apiFetch<{ variant: VariantSummary }>(`/api/designs/${designId}/variants`, {
      method: 'POST',
      json: body,
    }),
  rename: (id: number, name: string) =>
    apiFetch<{ variant: VariantSummary }>(`/api/variants/${id}`, { method: 'PATCH', json: { name } }),
  remove: (id: number) => apiFetch<{ ok: true }>(`/api/variants/${id}`, { method: 'DELETE' }),
};

export type CreatedShare = ShareView & { token: string; url: string };

export const sharesApi = {
  list: (variantId: number) => apiFetch<Page<ShareView>>(`/api/variants/${variantId}/shares?limit=100`),
  create: (variantId: number, expiresInDays?: number) =>
    apiFetch<{ share: CreatedShare }>(`/api/variants/${variantId}/shares`, {
      method: 'POST',
      json: expiresInDays ? { expiresInDays } : {},
    }),
  revoke: (id: number) => apiFetch<{ share: ShareView }>(`/api/shares/${id}`, { method: 'DELETE' }),
};
