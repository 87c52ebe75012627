// Run by db-outage.test.ts in a process of its own (tsx), with DB_PORT pointing where no database
// answers. Calls real route handlers as Next would and prints one JSON line with what came back.
import { encode } from 'next-auth/jwt';
import { newSessionId } from '@/lib/auth/ended-sessions';
import * as enclosures from '@/app/api/enclosures/route';
import * as health from '@/app/api/health/route';
import * as variantItem from '@/app/api/variants/[id]/route';
import { authSecret } from '@/lib/auth/secret';
import { EXAMPLE_DESIGN } from '@/simulation/testing/fixtures';

const ORIGIN = 'http://localhost:3000';
type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

async function measure(name: string, handler: Handler, req: Request, params: Record<string, string> = {}) {
  const t0 = performance.now();
  let outcome: Record<string, unknown>;
  try {
    const res = await handler(req, { params: Promise.resolve(params) });
    const text = await res.text();
    outcome = {
      status: res.status,
      retryAfter: res.headers.get('retry-after'),
      contentType: res.headers.get('content-type'),
      text,
    };
  } catch (e) {
    outcome = { threw: e instanceof Error ? e.message : String(e) };
  }
  return { name, ms: Math.round(performance.now() - t0), ...outcome };
}

async function main() {
  // A session cookie as next-auth would set it: the pipeline must reach the database to check it.
  const token = await encode({
    token: {
      sub: '1',
      uid: 1,
      sv: 1,
      sid: newSessionId(),
      name: 'Outage test',
      email: 'outage@example.com',
      memberships: [],
    },
    secret: authSecret(),
  });
  const headers = { cookie: `next-auth.session-token=${token}`, origin: ORIGIN };
  const results = [
    await measure('GET /api/health', health.GET as Handler, new Request(`${ORIGIN}/api/health`)),
    await measure(
      'GET /api/enclosures',
      enclosures.GET as Handler,
      new Request(`${ORIGIN}/api/enclosures?organisationId=1`, { headers }),
    ),
    await measure(
      'PUT /api/variants/1',
      variantItem.PUT as Handler,
      new Request(`${ORIGIN}/api/variants/1`, {
        method: 'PUT',
        headers: { ...headers, 'content-type': 'application/json' },
        body: JSON.stringify({ design: EXAMPLE_DESIGN, baseVersion: 1 }),
      }),
      { id: '1' },
    ),
  ];
  process.stdout.write(`${JSON.stringify(results)}\n`);
}

main().then(
  () => process.exit(0),
  (e) => {
    console.error(e);
    process.exit(1);
  },
);
