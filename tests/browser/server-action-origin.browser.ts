// The guided start's server actions keep the route handlers' origin rule on the real production server:
// called with a signed-in session cookie and no Origin header (as a forged request made with a stolen
// cookie arrives), the action refuses with the reason; with our own Origin the same call gets past that
// check (it then fails on the empty form, which is the control). The action ids come from the build's
// server reference manifest, so the calls are the ones the page's own button makes.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORDS, demoSignIn } from '@/lib/demo/scenario';
import { BASE_URL, signInCookie } from './harness';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const MANIFEST = path.join(
  ROOT,
  process.env.NEXT_DIST_DIR ?? '.next',
  'server',
  'server-reference-manifest.json',
);

type Manifest = { node: Record<string, { filename: string; exportedName: string }> };

function actionId(exportedName: string): string {
  const manifest = JSON.parse(readFileSync(MANIFEST, 'utf8')) as Manifest;
  const found = Object.entries(manifest.node).find(
    ([, v]) => v.filename.endsWith('enclosures/new/actions.ts') && v.exportedName === exportedName,
  );
  if (!found) throw new Error(`no server action ${exportedName} in ${MANIFEST}`);
  return found[0];
}

async function callAction(
  id: string,
  cookie: string,
  origin?: string,
): Promise<{ status: number; text: string }> {
  const res = await fetch(`${BASE_URL}/enclosures/new`, {
    method: 'POST',
    headers: {
      'next-action': id,
      accept: 'text/x-component',
      'content-type': 'text/plain;charset=UTF-8',
      cookie,
      ...(origin ? { origin } : {}),
    },
    body: JSON.stringify([{}]),
  });
  return { status: res.status, text: await res.text() };
}

describe('server actions and the Origin header', () => {
  it('refuses a cookie-carrying action call without Origin, and lets our own through', async () => {
    const cookie = await signInCookie(demoSignIn('staff').email, DEMO_PASSWORDS.staff);
    for (const name of ['proposeAction', 'createAction']) {
      const id = actionId(name);
      const forged = await callAction(id, cookie);
      expect(forged.text, name).toMatch(/did not say which site it came from/);
      const own = await callAction(id, cookie, new URL(BASE_URL).origin);
      expect(own.text, name).not.toMatch(/did not say which site it came from/);
      // Past the origin check, the empty form is refused by the schema: the action really ran.
      expect(own.text, name).toMatch(/"ok":false/);
    }
  });
});
