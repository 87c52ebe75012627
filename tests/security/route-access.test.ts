// Every route handler under app/api (next-auth's own excepted) is made by the lib/api pipeline and its
// handler reaches the one permission check, `can` in lib/permissions.ts — directly, through `allow`, or
// through a loader such as `variantFor` that calls it. The same for server actions. A new route that
// skips the check fails here, naming the file and method. See access-graph.ts for how calls are followed.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { AccessGraph, ROOT, filesUnder, type HandlerReport } from './access-graph';

/** next-auth serves sign-in, sign-out and its CSRF token itself: it has no organisation data. */
const EXCLUDED_FILES = ['app/api/auth/[...nextauth]/route.ts'];

/**
 * Handlers open to people without a session (`auth: false`), each with the reason no `can` applies.
 * Anything public that is not listed here fails, and so does a listed entry that is no longer public.
 */
const PUBLIC_HANDLERS: Record<string, string> = {
  'app/api/sign-up/route.ts POST':
    'creates a new account with a new organisation of its own; touches nothing that exists (rate-limited)',
  'app/api/sign-up/confirm/route.ts POST':
    'the unguessable, single-use, 2-hour token from the e-mailed link is the permission; it only confirms that account',
  'app/api/sign-up/resend/route.ts POST':
    'e-mails a new confirmation link to the address if an account there waits for one; answers the same either way (rate-limited)',
  'app/api/health/route.ts GET':
    'a load balancer probe: answers { ok }, the database state and when each background job last ran (or 503 when the database is down); no organisation’s data',
  'app/api/password-reset/route.ts POST':
    'e-mails a link to the address if an account has it; answers the same either way, reads nothing back (rate-limited)',
  'app/api/password-reset/complete/route.ts POST':
    'the unguessable, single-use, 30-minute token from the e-mailed link is the permission',
  'app/api/unsubscribe/route.ts GET':
    'the signed token from the e-mailed link names one customer and only withdraws their consent to reminder e-mails; shows no data',
  'app/api/invitations/accept/route.ts POST':
    'the unguessable, single-use, expiring invitation token is the permission; the e-mail must match',
};

const key = (r: HandlerReport) => `${r.file} ${r.method}`;

function routeFiles(): string[] {
  return filesUnder('app/api', (name) => /^route\.(ts|tsx|js|mjs)$/.test(name));
}

function serverActionFiles(): string[] {
  const candidates = ['app', 'components', 'lib'].flatMap((dir) =>
    filesUnder(dir, (name) => /\.(ts|tsx)$/.test(name) && !/\.test\.tsx?$/.test(name)),
  );
  return candidates.filter((f) => /['"]use server['"]/.test(readFileSync(path.join(ROOT, f), 'utf8')));
}

describe('route handlers under app/api', () => {
  const graph = new AccessGraph();
  const files = routeFiles();
  const checked = files.filter((f) => !EXCLUDED_FILES.includes(f));
  const reports = checked.flatMap((f) => graph.routeHandlers(f));

  it('finds the route files and their handlers', () => {
    // What the check covered; ROUTE_ACCESS_VERBOSE=1 prints each handler's chain of calls to can().
    const verbose = process.env.ROUTE_ACCESS_VERBOSE === '1';
    console.info(
      `route-access: ${checked.length} route files, ${reports.length} handlers\n` +
        reports
          .map((r) => `  ${key(r).padEnd(52)} ${verbose ? (r.accessPath?.join(' → ') ?? '(public)') : ''}`)
          .join('\n'),
    );
    expect(files).toEqual(expect.arrayContaining(EXCLUDED_FILES));
    expect(checked.length).toBeGreaterThan(20);
    expect(reports.length).toBeGreaterThan(40);
    // Spot checks that the scan sees what it should (a broken walk would find nothing to fail on).
    expect(reports.map(key)).toEqual(
      expect.arrayContaining([
        'app/api/variants/[id]/route.ts PUT',
        'app/api/enclosures/route.ts POST',
        'app/api/species/[id]/route.ts DELETE',
        'app/api/lamps/[id]/readings/route.ts POST',
      ]),
    );
    // Every route file exports at least one handler.
    for (const f of checked)
      expect(
        reports.some((r) => r.file === f),
        f,
      ).toBe(true);
  });

  it('every handler is created by route() from lib/api (or a factory of the pipeline that calls it)', () => {
    const outside = reports.filter((r) => !r.viaPipeline).map((r) => `${key(r)}: ${r.problem}`);
    expect(outside).toEqual([]);
  });

  it('every handler with a session reaches can() from lib/permissions', () => {
    const unchecked = reports.filter((r) => !r.public && !r.accessPath).map((r) => `${key(r)}: ${r.problem}`);
    expect(unchecked).toEqual([]);
  });

  it('only the listed handlers are public, and each listed one still is', () => {
    const publicOnes = reports.filter((r) => r.public).map(key);
    expect(publicOnes.sort()).toEqual(Object.keys(PUBLIC_HANDLERS).sort());
  });
});

describe('server actions', () => {
  it('every server action reaches can() from lib/permissions', () => {
    const graph = new AccessGraph();
    const files = serverActionFiles();
    const reports = files.flatMap((f) => graph.serverActions(f));
    console.info(`route-access: ${files.length} files with server actions, ${reports.length} actions`);
    // A file that mentions 'use server' but declares no action is a mistake worth seeing too.
    for (const f of files)
      expect(
        reports.some((r) => r.file === f),
        `${f} has no server action`,
      ).toBe(true);
    expect(reports.filter((r) => !r.accessPath).map((r) => `${key(r)}: ${r.problem}`)).toEqual([]);
  });
});

// The checker itself, on made-up files beside the real ones: it must fail where a route skips the check.
describe('the checker', () => {
  const fake = (overlay: Record<string, string>) => new AccessGraph(overlay);
  const one = (graph: AccessGraph, file: string, method: string) => {
    const r = graph.routeHandlers(file).find((x) => x.method === method);
    if (!r) throw new Error(`no ${method} in ${file}`);
    return r;
  };

  it('flags a handler that never calls can()', () => {
    const g = fake({
      'app/api/zz-fake/route.ts': `
        import { route } from '@/lib/api';
        import { Enclosure } from '@/models';
        export const GET = route({ handler: async () => Enclosure.findAll() });`,
    });
    const r = one(g, 'app/api/zz-fake/route.ts', 'GET');
    expect(r.viaPipeline).toBe(true);
    expect(r.accessPath).toBeNull();
    expect(r.problem).toMatch(/never reaches can/);
  });

  it('flags a handler written by hand, or by another factory', () => {
    const g = fake({
      'app/api/zz-fake/route.ts': `
        import { can } from '@/lib/permissions';
        const wrap = (f: unknown) => f;
        export async function GET() { can(null, 'read', { kind: 'organisation', id: 1 }); return Response.json({}); }
        export const POST = wrap(async () => Response.json({}));`,
    });
    expect(one(g, 'app/api/zz-fake/route.ts', 'GET').problem).toMatch(/not created by route/);
    expect(one(g, 'app/api/zz-fake/route.ts', 'POST').problem).toMatch(/created by wrap\(\)/);
  });

  it('does not accept a look-alike can() or allow() defined elsewhere', () => {
    const g = fake({
      'app/api/zz-fake/route.ts': `
        import { route } from '@/lib/api';
        const can = (..._a: unknown[]) => true;
        function allow() { return can(); }
        export const GET = route({ handler: async ({ user }) => { allow(); return { user }; } });`,
    });
    expect(one(g, 'app/api/zz-fake/route.ts', 'GET').accessPath).toBeNull();
  });

  it('follows loaders in lib, local helpers, aliases and re-exports to can()', () => {
    const g = fake({
      'lib/zz-fake/access.ts': `
        import { allow } from '@/lib/api';
        export async function thingFor(user: unknown, id: number) { allow(user as never, 'read', { kind: 'species', organisationId: id }); return id; }`,
      'lib/zz-fake/index.ts': `export { thingFor as loadThing } from './access';`,
      'app/api/zz-fake/route.ts': `
        import { route } from '@/lib/api';
        import { loadThing } from '@/lib/zz-fake';
        async function load(user: unknown) { return loadThing(user, 1); }
        export const PATCH = route({ handler: async ({ user }) => load(user) });
        export const PUT = PATCH;`,
    });
    const put = one(g, 'app/api/zz-fake/route.ts', 'PUT');
    expect(put.problem).toBeUndefined();
    expect(put.accessPath).toEqual([
      'app/api/zz-fake/route.ts#load',
      'lib/zz-fake/access.ts#thingFor',
      'lib/access.ts#allow',
      'lib/permissions.ts#can',
    ]);
  });

  it('counts the load ownedRoute makes before its handler, and only while it makes it', () => {
    const route = `
      import { ownedRoute } from '@/lib/api';
      export const GET = ownedRoute('lamp', 'read', { handler: async ({ thing }) => thing });`;
    const real = one(fake({ 'app/api/zz-fake/route.ts': route }), 'app/api/zz-fake/route.ts', 'GET');
    expect(real.viaPipeline).toBe(true);
    expect(real.accessPath).toEqual(
      expect.arrayContaining(['lib/access.ts#loadOwned', 'lib/access.ts#allow', 'lib/permissions.ts#can']),
    );
    // The same factory without its load: the handler, which asks nothing, is flagged.
    const g = fake({
      'app/api/zz-fake/route.ts': route,
      'lib/api/route.ts': `
        export function route(spec: unknown) { return spec; }
        export function ownedRoute(_kind: string, _action: string, spec: unknown) { return route(spec); }`,
    });
    expect(one(g, 'app/api/zz-fake/route.ts', 'GET').problem).toMatch(/never reaches can/);
  });

  it("follows csvImportRoute's handler to can()", () => {
    const g = fake({
      'app/api/zz-fake/route.ts': `
        import { allow } from '@/lib/api';
        import { csvImportRoute } from '@/lib/api/csv-import';
        export const POST = csvImportRoute({}, async ({ user }) => { allow(user, 'create', { kind: 'customer', organisationId: 1 }); });
        export const PUT = csvImportRoute({}, async () => ({ ok: true }));`,
    });
    expect(one(g, 'app/api/zz-fake/route.ts', 'POST').accessPath).toContain('lib/permissions.ts#can');
    expect(one(g, 'app/api/zz-fake/route.ts', 'PUT').problem).toMatch(/never reaches can/);
  });

  it('marks auth: false handlers public (the allow-list above then decides)', () => {
    const g = fake({
      'app/api/zz-fake/route.ts': `
        import { route } from '@/lib/api';
        export const POST = route({ auth: false, handler: async () => ({ ok: true }) });`,
    });
    const r = one(g, 'app/api/zz-fake/route.ts', 'POST');
    expect(r.public).toBe(true);
    expect(r.accessPath).toBeNull();
  });

  it('checks the exported functions of a use-server file and inline actions', () => {
    const g = fake({
      'app/zz-fake/actions.ts': `'use server';
        import { designFor } from '@/lib/variants/access';
        export async function rename(user: never, id: number) { await designFor(user, id, 'update'); }
        export async function wipe() { return 1; }`,
      'app/zz-fake/form.tsx': `
        export default function Form() {
          async function save() { 'use server'; return 2; }
          return save;
        }`,
    });
    const actions = g.serverActions('app/zz-fake/actions.ts');
    expect(actions.map((a) => [a.method, Boolean(a.accessPath)])).toEqual([
      ['action rename', true],
      ['action wipe', false],
    ]);
    const inline = g.serverActions('app/zz-fake/form.tsx');
    expect(inline).toHaveLength(1);
    expect(inline[0]?.problem).toMatch(/never reaches can/);
  });
});
