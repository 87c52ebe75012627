// Calls the real route handler functions with real Requests carrying a real session cookie (the shared
// helper's), as a browser would after signing in. Unlike tests/api/http.ts it leaves non-JSON bodies
// unread, so export tests can read the PNG or PDF bytes themselves.
import { inflateSync } from 'node:zlib';
import * as designVariantsRoute from '@/app/api/designs/[id]/variants/route';
import * as enclosureDesignsRoute from '@/app/api/enclosures/[id]/designs/route';
import * as exportRoute from '@/app/api/variants/[id]/export/route';
import * as variantRoute from '@/app/api/variants/[id]/route';
import * as sharesRoute from '@/app/api/variants/[id]/shares/route';
import * as sharedReportRoute from '@/app/s/[token]/report/route';
import type { User } from '@/models';
import { ORIGIN, sessionCookie } from './http';

export { ORIGIN, sessionCookie };

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

export type Call = {
  status: number;
  body: any; // eslint-disable-line @typescript-eslint/no-explicit-any -- JSON of many shapes, checked by each test
  res: Response;
};

/** Calls `handler` as Next would for `method path` with optional user session and JSON body. */
export async function call(
  handler: Handler,
  opts: {
    method?: string;
    path: string;
    params?: Record<string, string | number>;
    user?: User | null;
    body?: unknown;
  },
): Promise<Call> {
  const headers = new Headers({ origin: ORIGIN });
  if (opts.user) headers.set('cookie', await sessionCookie(opts.user));
  if (opts.body !== undefined) headers.set('content-type', 'application/json');
  const req = new Request(`${ORIGIN}${opts.path}`, {
    method: opts.method ?? 'GET',
    headers,
    body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
  });
  const params = Object.fromEntries(Object.entries(opts.params ?? {}).map(([k, v]) => [k, String(v)]));
  const res = await handler(req, { params: Promise.resolve(params) });
  const type = res.headers.get('content-type') ?? '';
  const body = type.includes('application/json') ? await res.json() : null;
  return { status: res.status, body, res };
}

/** `method` of a route about the thing `id` names, at `path`, as `user` sends `body`. */
const onThing = (handler: Handler, method: string, path: string, id: number, user: User, body?: unknown) =>
  call(handler, { method, path, params: { id }, user, body });

/**
 * A new design with its first variant, made through the route as `user` would; throws unless it is made,
 * so a test's set-up cannot silently go on without one.
 */
export async function postDesign(
  user: User,
  enclosureId: number,
  body: { name: string; variantName?: string; design?: unknown },
): Promise<{ designId: number; variantId: number }> {
  const path = `/api/enclosures/${enclosureId}/designs`;
  const made = await onThing(enclosureDesignsRoute.POST, 'POST', path, enclosureId, user, body);
  if (made.status !== 201) throw new Error(`postDesign: ${made.status} ${JSON.stringify(made.body)}`);
  return { designId: made.body.design.id as number, variantId: made.body.variant.id as number };
}

/** A variant's download (`format=json`, `format=png&months=24` …) as `user` asks for it. */
export const exportVariant = (user: User, variantId: number, query: string) =>
  onThing(exportRoute.GET, 'GET', `/api/variants/${variantId}/export?${query}`, variantId, user);

/** A share link of a variant, asked for through the route as `user` (the reply carries its token). */
export const postShare = (user: User, variantId: number, body: unknown = {}) =>
  onThing(sharesRoute.POST, 'POST', `/api/variants/${variantId}/shares`, variantId, user, body);

/** A save of a variant (`{ design, baseVersion }` …) through the route, as `user` sends it. */
export const putVariant = (user: User, variantId: number, body: unknown) =>
  onThing(variantRoute.PUT, 'PUT', `/api/variants/${variantId}`, variantId, user, body);

/** A new variant of a design (`{ name, design }` or `{ name, fromVariantId }`), as `user` asks for it. */
export const postVariant = (user: User, designId: number, body: unknown) =>
  onThing(designVariantsRoute.POST, 'POST', `/api/designs/${designId}/variants`, designId, user, body);

/** The public report download of a share link, as an anonymous visitor (no session) asks for it. */
export const sharedReport = (token: string, format = 'pdf') =>
  call((req, ctx) => sharedReportRoute.GET(req, ctx as { params: Promise<{ token: string }> }), {
    path: `/s/${token}/report?format=${format}`,
    params: { token },
  });

/**
 * The text drawn in a PDF made by pdf-lib with the standard fonts: each content stream is inflated and
 * its `<hex> Tj` operators decoded from WinAnsi.
 */
export function pdfDrawnText(pdf: Uint8Array): string {
  const bytes = Buffer.from(pdf);
  const out: string[] = [];
  let at = 0;
  for (;;) {
    const start = bytes.indexOf('stream', at, 'latin1');
    if (start < 0) break;
    let from = start + 'stream'.length;
    if (bytes[from] === 0x0d) from++;
    if (bytes[from] === 0x0a) from++;
    const end = bytes.indexOf('endstream', from, 'latin1');
    if (end < 0) break;
    at = end + 'endstream'.length;
    let content: string;
    try {
      content = inflateSync(bytes.subarray(from, end)).toString('latin1');
    } catch {
      content = bytes.subarray(from, end).toString('latin1');
    }
    for (const m of content.matchAll(/<([0-9a-fA-F]*)>\s*Tj/g))
      out.push(winAnsiDecode(Buffer.from(m[1]!, 'hex')));
  }
  return out.join('\n');
}

// WinAnsi is Latin-1 except for 0x80–0x9F, where it keeps typographic marks (PDF 32000, annex D).
const WIN_ANSI_HIGH: Record<number, string> = {
  0x80: '€',
  0x85: '…',
  0x91: '‘',
  0x92: '’',
  0x93: '“',
  0x94: '”',
  0x95: '•',
  0x96: '–',
  0x97: '—',
  0x99: '™',
};
function winAnsiDecode(bytes: Buffer): string {
  let s = '';
  for (const b of bytes) s += WIN_ANSI_HIGH[b] ?? String.fromCharCode(b);
  return s;
}
