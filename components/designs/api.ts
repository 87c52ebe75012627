'use client';

import type { DesignSummary, ShareView, VariantDetail, VariantSummary } from '@/lib/variants/views';

/** A failed API call, with the server's typed error (code, message, field) for the UI to show. */
export class ApiClientError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
    readonly body?: unknown,
  ) {
    super(message);
    this.name = 'ApiClientError';
  }
}

type ErrorBody = { error?: { code?: string; message?: string; field?: string } };

export async function apiFetch<T>(url: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, ...rest } = init;
  let res: Response;
  try {
    res = await fetch(url, {
      credentials: 'same-origin',
      cache: 'no-store',
      ...rest,
      headers: { ...(json !== undefined ? { 'content-type': 'application/json' } : {}), ...rest.headers },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch {
    throw new ApiClientError(0, 'offline', 'Baskwell cannot be reached. Check the connection and try again.');
  }
  const body = (await res.json().catch(() => null)) as (T & ErrorBody) | null;
  if (!res.ok) {
    const e = body?.error;
    throw new ApiClientError(
      res.status,
      e?.code ?? 'error',
      e?.message ?? `The request failed (${res.status}).`,
      e?.field,
      body,
    );
  }
  return body as T;
}

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
