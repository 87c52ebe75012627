// The security headers every response carries come from next.config.ts headers(): checked here without
// building anything; tests/browser/headers.browser.ts checks them on the running server.
import { describe, expect, it } from 'vitest';
import config from '@/next.config';
import { EXPECTED_HEADERS } from './expected-headers';

describe('next.config.ts headers()', () => {
  it('sends every security header on every path', async () => {
    expect(config.headers).toBeTypeOf('function');
    const rules = await config.headers!();
    // One rule matching everything: pages, API routes, static files.
    const everywhere = rules.filter((r) => r.source === '/:path*' && !r.has && !r.missing);
    expect(everywhere).toHaveLength(1);
    const sent = new Map(everywhere[0]!.headers.map((h) => [h.key.toLowerCase(), h.value]));
    for (const [name, pattern] of Object.entries(EXPECTED_HEADERS)) {
      expect(sent.get(name), name).toMatch(pattern);
    }
  });

  it('no other rule overrides them with a weaker value', async () => {
    const rules = await config.headers!();
    for (const rule of rules.filter((r) => r.source !== '/:path*')) {
      for (const h of rule.headers) {
        const pattern = EXPECTED_HEADERS[h.key.toLowerCase()];
        if (pattern) expect(h.value, `${rule.source}: ${h.key}`).toMatch(pattern);
      }
    }
  });
});
