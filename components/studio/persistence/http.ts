// Persistence against the variants API:
//   GET /api/variants/{id}  → { variant: { id, name, version, design, updatedAt } }
//   PUT /api/variants/{id}  { design, baseVersion } → 200 { variant: { id, version, updatedAt } }
//                                                  | 409 { error: { code: 'stale' }, current: { version, design } }
// 503 and network failures mean "offline": the autosave keeps the local copy and retries.
import { z } from 'zod';
import { parseDesign } from '@/simulation';
import {
  OfflineError,
  SaveRejectedError,
  type Loaded,
  type SaveResult,
  type StudioPersistence,
} from './types';

const getBody = z.object({
  variant: z.object({ id: z.coerce.string(), version: z.number().int().min(0), design: z.unknown() }),
});
const putOk = z.object({ variant: z.object({ version: z.number().int().min(0) }) });
const putStale = z.object({ current: z.object({ version: z.number().int().min(0), design: z.unknown() }) });
const errorBody = z.object({ error: z.object({ message: z.string().optional() }).optional() });

async function request(url: string, init: RequestInit, fetchImpl: typeof fetch): Promise<Response> {
  let res: Response;
  try {
    res = await fetchImpl(url, { ...init, credentials: 'same-origin', cache: 'no-store' });
  } catch {
    throw new OfflineError();
  }
  // 502/503/504: the server or its database is down for now.
  if (res.status === 502 || res.status === 503 || res.status === 504)
    throw new OfflineError(`Server unavailable (${res.status})`);
  return res;
}

async function messageOf(res: Response, fallback: string): Promise<string> {
  try {
    const body = errorBody.safeParse(await res.json());
    return body.success && body.data.error?.message ? body.data.error.message : fallback;
  } catch {
    return fallback;
  }
}

function rejection(status: number): string {
  if (status === 401)
    return 'Your session has ended — sign in again to save (your changes are kept on this device).';
  if (status === 403 || status === 404) return 'You can no longer save this design.';
  if (status === 400 || status === 422) return 'The server did not accept the design.';
  return `Saving failed (${status}).`;
}

export function httpPersistence(
  variantId: string,
  fetchImpl: typeof fetch = (...a) => fetch(...a),
): StudioPersistence {
  const url = `/api/variants/${encodeURIComponent(variantId)}`;
  return {
    key: `variant:${variantId}`,

    async load(): Promise<Loaded> {
      const res = await request(url, { method: 'GET', headers: { accept: 'application/json' } }, fetchImpl);
      if (!res.ok) throw new SaveRejectedError(await messageOf(res, rejection(res.status)), res.status);
      const body = getBody.safeParse(await res.json());
      if (!body.success) throw new Error('The server sent an unexpected answer.');
      const parsed = parseDesign(body.data.variant.design);
      if (!parsed.ok)
        throw new Error(`The stored design is not valid: ${parsed.error.path} ${parsed.error.message}`);
      return { design: parsed.design, version: body.data.variant.version };
    },

    async save(design, baseVersion): Promise<SaveResult> {
      const res = await request(
        url,
        {
          method: 'PUT',
          headers: { 'content-type': 'application/json', accept: 'application/json' },
          body: JSON.stringify({ design, baseVersion }),
        },
        fetchImpl,
      );
      if (res.status === 409) {
        const body = putStale.safeParse(await res.json().catch(() => null));
        const parsed = body.success ? parseDesign(body.data.current.design) : null;
        if (!body.success || !parsed?.ok)
          throw new SaveRejectedError('Someone else saved this design; reload to see it.', 409);
        return { conflict: { version: body.data.current.version, design: parsed.design } };
      }
      if (!res.ok) throw new SaveRejectedError(await messageOf(res, rejection(res.status)), res.status);
      const body = putOk.safeParse(await res.json().catch(() => null));
      if (!body.success) throw new OfflineError('The server sent an unexpected answer.');
      return { version: body.data.variant.version };
    },
  };
}
