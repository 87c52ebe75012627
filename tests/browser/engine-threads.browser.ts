// The engine's worker threads in the production build (next build + next start, Turbopack bundling the
// worker file): the heaviest design the server accepts is exported while the health check keeps
// answering within 200 ms, and the share page and a refused over-bound design work through the same
// threads. A correctness property of the event loop, not a speed benchmark.
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORDS, demoSignIn } from '@/lib/demo/scenario';
import { benchDesign, heaviestAllowedDesign } from '@/simulation/testing/fixtures';
import { expectNotStalled } from '../helpers/not-stalled';
import { BASE_URL, signInCookie } from './harness';

const ORIGIN = new URL(BASE_URL).origin;

async function api(cookie: string, method: string, path: string, body?: unknown) {
  const res = await fetch(`${BASE_URL}${path}`, {
    method,
    headers: { cookie, origin: ORIGIN, ...(body ? { 'content-type': 'application/json' } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  const type = res.headers.get('content-type') ?? '';
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of several routes, each checked here
  const json: any = type.includes('json') ? await res.json() : null;
  return { res, json };
}

describe('engine threads in the production build', () => {
  it('keeps /api/health within 200 ms during the heaviest allowed export; share page and bound work', async () => {
    const cookie = await signInCookie(demoSignIn('staff').email, DEMO_PASSWORDS.staff);
    const session = await api(cookie, 'GET', '/api/auth/session');
    const organisationId = session.json.user.memberships[0].organisationId as number;
    const enclosure = await api(cookie, 'POST', '/api/enclosures', {
      organisationId,
      name: `Engine threads ${Date.now()}`,
      widthCm: 120,
      heightCm: 60,
      depthCm: 60,
    });
    expect(enclosure.res.status).toBe(201);
    const enclosureId = enclosure.json.id ?? enclosure.json.enclosure.id;

    const tooMuch = await api(cookie, 'POST', `/api/enclosures/${enclosureId}/designs`, {
      name: 'Too much',
      design: benchDesign(10, 10),
    });
    expect(tooMuch.res.status).toBe(422);
    expect(tooMuch.json.error.message).toContain('the limit is 300 million');

    const made = await api(cookie, 'POST', `/api/enclosures/${enclosureId}/designs`, {
      name: 'Heaviest allowed',
      design: heaviestAllowedDesign(),
    });
    expect(made.res.status).toBe(201);
    const variantId = made.json.variant.id as number;

    // Starts the threads (a worker's first start loads the bundle), and loads the health route's module
    // (a production server loads a route's code on its first request).
    expect((await fetch(`${BASE_URL}/api/health`)).status).toBe(200);
    const warm = await api(cookie, 'GET', `/api/variants/${variantId}/export?format=png&months=24`);
    expect(warm.res.status).toBe(200);
    expect(warm.res.headers.get('content-type')).toBe('image/png');

    let done = false;
    const running = api(cookie, 'GET', `/api/variants/${variantId}/export?format=pdf&months=0`).finally(
      () => {
        done = true;
      },
    );
    const during: number[] = [];
    while (!done) {
      const t0 = performance.now();
      const health = await fetch(`${BASE_URL}/api/health`);
      const ms = performance.now() - t0;
      expect(health.status).toBe(200);
      if (!done) during.push(ms);
      await new Promise((r) => setTimeout(r, 25));
    }
    const pdf = await running;
    expect(pdf.res.status).toBe(200);
    expect(pdf.res.headers.get('content-type')).toBe('application/pdf');
    expectNotStalled(during);

    const share = await api(cookie, 'POST', `/api/variants/${variantId}/shares`, {});
    expect(share.res.status).toBe(201);
    const page = await fetch(`${BASE_URL}/s/${share.json.share.token}`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('Basking UV Index (highest on a surface)');
    expect(html).toContain('Heaviest allowed');
  });
});
