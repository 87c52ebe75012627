#!/usr/bin/env node
// `npm run load -- [URL] [--rate N] [--duration S] [--connections N] [--share-only]`: a fixed-rate load run with
// autocannon against a running production server (`npm start`, or `next start` on a build). It signs in
// as a demo staff member (next-auth's CSRF token, then the credentials callback), makes a throw-away
// design of its own, and measures, one after another at the same request rate:
//   the cheapest routes (/api/health: one `SELECT 1`; /api/auth/csrf: no database),
//   the design read GET /api/variants/[id], the design save PUT /api/variants/[id] (carrying the version
//   forward; 409s from saves that crossed are counted apart), the public share page /s/<token>, and
//   its field picture (an SVG at its own cacheable address), fetched whole and revalidated (304).
// Then, one at a time once warm, the PNG and PDF reports of that design (made on the engine threads).
// --share-only: the baseline and the share page alone (two builds compared run after run in a minute).
// Prints a table (requests/s, p50, p99, and p50/p99 as a multiple of the cheapest route's) and one final
// JSON line; removes its design at the end. Figures, not a pass/fail test: the machine decides them.
// Bounded: each scenario sends at most rate × duration requests and stops after `duration` seconds; the
// whole run gives up after a watchdog (scenarios × (duration + 30 s) + 2 min). The date, the machine's
// load average before and after, and its CPU count are printed with the figures: they are what the
// figures depend on.
//
// URL: the first argument, else LOAD_BASE_URL, else APP_URL, else http://localhost:3000.
// Account: LOAD_EMAIL / LOAD_PASSWORD, else the demo scenario's first staff member.
import autocannon from 'autocannon';
import os from 'node:os';
import { pathToFileURL } from 'node:url';
import path from 'node:path';
import { loadEnv } from './lib/env.mjs';
import { runFigures } from './lib/paced.mjs';

const DEMO_STAFF = { email: 'idris.penhallow@example.com', password: 'demo-staff-pass' };

// A typical desert set-up (a UVB tube and a heat lamp under a mesh lid, a branch, a ledge, a hide): a
// save the size people really make, so the load is what a save really carries.
const DESIGN = {
  format: 'baskwell.design',
  version: 2,
  enclosure: { width: 120, height: 60, depth: 60, roomTempC: 24 },
  objects: [
    { type: 'lamp', id: 'uv1', tech: 't5', form: 'tube', x: 40, y: 62, length: 55, uvbAt30: 60 },
    { type: 'lamp', id: 'heat1', tech: 'halogen', form: 'bulb', x: 90, y: 62, uvbAt30: 0, watts: 75 },
    { type: 'screen', id: 'lid', x1: 0, y1: 60, x2: 120, y2: 60, uvbTransmission: 0.6 },
    { type: 'perch', id: 'b1', x1: 20, y1: 20, x2: 70, y2: 38, thickness: 4 },
    { type: 'ledge', id: 'r1', x: 75, y: 0, width: 30, height: 18 },
    { type: 'hide', id: 'h1', x: 5, y: 0, width: 25, height: 14 },
  ],
};

function parseArgs(argv, env) {
  const opts = {
    url: env.LOAD_BASE_URL || env.APP_URL || 'http://localhost:3000',
    rate: 100,
    duration: 10,
    connections: 10,
  };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    const num = () => {
      const v = Number(a.includes('=') ? a.slice(a.indexOf('=') + 1) : argv[++i]);
      if (!Number.isFinite(v) || v <= 0) throw new Error(`${a} needs a positive number`);
      return v;
    };
    if (a.startsWith('--rate')) opts.rate = num();
    else if (a.startsWith('--duration')) opts.duration = num();
    else if (a.startsWith('--connections')) opts.connections = Math.round(num());
    else if (a === '--share-only') opts.shareOnly = true;
    else if (a === '--help' || a === '-h') opts.help = true;
    else if (!a.startsWith('-')) opts.url = a;
    else throw new Error(`unknown option ${a} (--rate N, --duration S, --connections N, --share-only)`);
  }
  opts.url = opts.url.replace(/\/+$/, '');
  return opts;
}

/** A tiny cookie jar: enough for next-auth's CSRF and session cookies. */
class Jar {
  cookies = new Map();
  take(res) {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const i = pair.indexOf('=');
      this.cookies.set(pair.slice(0, i).trim(), pair.slice(i + 1).trim());
    }
  }
  header() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }
}

export async function api(base, jar, method, p, body) {
  const res = await fetch(`${base}${p}`, {
    method,
    redirect: 'manual',
    headers: {
      cookie: jar.header(),
      origin: base,
      ...(body === undefined ? {} : { 'content-type': 'application/json' }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
    signal: AbortSignal.timeout(15_000),
  });
  jar.take(res);
  const text = await res.text();
  let json = null;
  try {
    json = JSON.parse(text);
  } catch {
    /* not JSON */
  }
  if (!res.ok) throw new Error(`${method} ${p} answered ${res.status}: ${text.slice(0, 200)}`);
  return json;
}

/** Signs in the way a script can (STACK-NOTES: CSRF token, then the credentials callback with json=true). */
export async function signIn(base, email, password) {
  const jar = new Jar();
  const { csrfToken } = await api(base, jar, 'GET', '/api/auth/csrf');
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { cookie: jar.header(), 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true' }),
    signal: AbortSignal.timeout(15_000),
  });
  jar.take(res);
  await res.body?.cancel();
  if (![...jar.cookies.keys()].some((k) => k.endsWith('next-auth.session-token'))) {
    throw new Error(`signing in as ${email} failed (${res.status}): is the demo scenario seeded?`);
  }
  const session = await api(base, jar, 'GET', '/api/auth/session');
  return { jar, user: session?.user };
}

const SCENARIOS = 7;
// Reports timed one after another: a few warm-ups, then these (inside the per-link download limit).
const REPORT_WARM_UPS = 2;
const REPORT_RUNS = 8;

/** Times `runs` downloads of `url` one after another, after warm-ups; median, p90 and max in ms. */
async function timeSequential(url, runs) {
  const once = async () => {
    const t0 = performance.now();
    const res = await fetch(url, { signal: AbortSignal.timeout(60_000) });
    const bytes = (await res.arrayBuffer()).byteLength;
    if (!res.ok) throw new Error(`${url.replace(/\/s\/[^/]+/, '/s/<token>')} answered ${res.status}`);
    return { ms: performance.now() - t0, bytes };
  };
  for (let i = 0; i < REPORT_WARM_UPS; i++) await once();
  const times = [];
  let bytes = 0;
  for (let i = 0; i < runs; i++) {
    const r = await once();
    times.push(r.ms);
    bytes = r.bytes;
  }
  times.sort((a, b) => a - b);
  const at = (q) => Math.round(times[Math.min(times.length - 1, Math.ceil(q * times.length) - 1)]);
  return { runs, medianMs: at(0.5), p90Ms: at(0.9), maxMs: Math.round(times.at(-1)), bytes };
}

/** Runs autocannon at a fixed rate for a fixed time; resolves its results. */
function cannon(opts, spec) {
  // overallRate caps the requests at rate × duration; duration ends the scenario. It sends each second's
  // share of every connection together at the second's start (bursts, a harder test than requests
  // evenly spaced; `npm run bench:scale` spaces them evenly, scripts/lib/paced.mjs).
  return autocannon({
    url: opts.url,
    connections: opts.connections,
    overallRate: opts.rate,
    duration: opts.duration,
    timeout: 10,
    ...spec,
  });
}

export const loadAverage = () =>
  os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');

/** The conditions a run's JSON line starts with: when, on how many CPUs, the load, the rate asked. */
export const runConditions = (started, loadBefore, loadAfter, opts) => ({
  at: started.toISOString(),
  cpus: os.cpus().length,
  loadAverageBefore: loadBefore,
  loadAverageAfter: loadAfter,
  rate: opts.rate,
  durationS: opts.duration,
});

/** A few sequential requests first (`times`, default 10), so the run does not measure cold code paths. */
export async function warmUp(base, jar, p, method = 'GET', body, times = 10) {
  for (let i = 0; i < times; i++) {
    await fetch(`${base}${p}`, {
      method,
      headers: { cookie: jar.header(), ...(body ? { 'content-type': 'application/json' } : {}) },
      body,
      signal: AbortSignal.timeout(15_000),
    }).then((r) => r.arrayBuffer());
  }
}

function row(name, r, extra = {}) {
  return { name, ...runFigures(r), max: r.latency.max, errors: r.errors, timeouts: r.timeouts, ...extra };
}

function printTable(rows, baseline, rate) {
  const header = ['scenario', 'req/s', 'p50 ms', 'p99 ms', 'p50 ×', 'p99 ×', 'status codes'];
  // Below 90 % of the asked rate the server (or the machine) was saturated: latencies then include queueing.
  const lines = rows.map((r) => [
    r.name,
    r.skipped ? '-' : `${r.rps < rate * 0.9 ? '*' : ''}${r.rps.toFixed(1)}`,
    r.skipped ? '-' : String(r.p50),
    r.skipped ? '-' : String(r.p99),
    r.skipped || !baseline ? '-' : (r.p50 / Math.max(baseline.p50, 1)).toFixed(2),
    r.skipped || !baseline ? '-' : (r.p99 / Math.max(baseline.p99, 1)).toFixed(2),
    r.skipped ? r.skipped : codesText(r.codes),
  ]);
  printColumns(header, lines);
}

/** Status codes as `200×480 503×2`. */
export const codesText = (codes) =>
  Object.entries(codes)
    .map(([c, n]) => `${c}×${n}`)
    .join(' ');

/** Prints text rows under a header: the first and last columns left-aligned, the figures between right-aligned. */
export function printColumns(header, lines) {
  const widths = header.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i].length)));
  const last = header.length - 1;
  const fmt = (cells) =>
    cells.map((c, i) => (i === 0 || i === last ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ');
  console.log(fmt(header));
  console.log(widths.map((w) => '-'.repeat(w)).join('  '));
  for (const l of lines) console.log(fmt(l));
}

/** The design read and the design save, each connection saving a variant of its own. */
async function readAndSave(opts, base, jar, authed, variantId, designId, rows) {
  const variantPath = `/api/variants/${variantId}`;
  await warmUp(base, jar, variantPath);
  rows.push(
    row('GET /api/variants/[id]', await cannon(opts, { url: `${base}${variantPath}`, headers: authed })),
  );

  // Each connection edits a variant of its own (as each user edits their own design) and carries its
  // version forward; a 409 means two saves of one variant crossed, counted apart.
  const variants = [variantId];
  while (variants.length < opts.connections) {
    const v = await api(base, jar, 'POST', `/api/designs/${designId}/variants`, {
      name: `Load ${variants.length + 1}`,
      design: DESIGN,
    });
    variants.push(v.variant.id);
  }
  const versions = new Map();
  for (const id of variants)
    versions.set(id, (await api(base, jar, 'GET', `/api/variants/${id}`)).variant.version);
  let assigned = 0;
  let saved = 0;
  let stale = 0;
  // autocannon clears a request's context on every loop, so the variant is bound per client instead.
  const saveRequest = (id) => ({
    method: 'PUT',
    path: `/api/variants/${id}`,
    headers: { ...authed, 'content-type': 'application/json' },
    setupRequest: (req) => ({
      ...req,
      body: JSON.stringify({ design: DESIGN, baseVersion: versions.get(id) }),
    }),
    onResponse: (status, body) => {
      try {
        const json = JSON.parse(body);
        if (status === 200) {
          saved++;
          versions.set(id, Math.max(versions.get(id), json.variant.version));
        } else if (status === 409) {
          stale++;
          versions.set(id, Math.max(versions.get(id), json.current?.version ?? 0));
        }
      } catch {
        /* counted by status code */
      }
    },
  });
  const save = await cannon(opts, {
    url: `${base}${variantPath}`,
    requests: [saveRequest(variantId)],
    setupClient: (client) => client.setRequests([saveRequest(variants[assigned++ % variants.length])]),
  });
  rows.push(row('PUT /api/variants/[id]', save, { saved, stale409: stale }));
}

async function main() {
  const env = loadEnv();
  const opts = parseArgs(process.argv.slice(2), env);
  if (opts.help) {
    console.log('npm run load -- [URL] [--rate N] [--duration S] [--connections N] [--share-only]');
    return;
  }
  const base = opts.url;
  const email = env.LOAD_EMAIL || DEMO_STAFF.email;
  const password = env.LOAD_PASSWORD || DEMO_STAFF.password;
  const watchdogMs = (SCENARIOS * (opts.duration + 30) + 120) * 1000;
  setTimeout(() => {
    console.error(`load run gave up after ${Math.round(watchdogMs / 1000)} s (watchdog)`);
    process.exit(2);
  }, watchdogMs).unref();
  const started = new Date();
  const loadBefore = loadAverage();
  console.error(
    `Load run against ${base}: ${opts.rate} requests/s for ${opts.duration} s per scenario ` +
      `(at most ${opts.rate * opts.duration} requests each), ${opts.connections} connections.`,
  );

  const { jar, user } = await signIn(base, email, password);
  const organisationId = user?.memberships?.find(
    (m) => m.role === 'staff' || m.role === 'owner',
  )?.organisationId;
  if (!organisationId) throw new Error(`${email} is not staff or owner of any organisation`);
  const enclosures = await api(base, jar, 'GET', `/api/enclosures?organisationId=${organisationId}&limit=1`);
  const enclosureId = enclosures?.items?.[0]?.id;
  if (!enclosureId) throw new Error('the organisation has no enclosure to put a design in');
  const made = await api(base, jar, 'POST', `/api/enclosures/${enclosureId}/designs`, {
    name: `Load run ${new Date().toISOString()}`,
    design: DESIGN,
  });
  const designId = made.design.id;
  const variantId = made.variant.id;
  const cookie = jar.header();
  // The app refuses a cookie-carrying write without its own Origin (CSRF guard), as a browser sends it.
  const authed = { cookie, origin: base };
  const rows = [];
  const reports = {};
  let pageBytes = null;
  let pictureBytes = null;
  try {
    const share = await api(base, jar, 'POST', `/api/variants/${variantId}/shares`, { expiresInDays: 1 });
    const sharePath = `/s/${share.share.token}`;

    for (const [name, p] of [
      ['GET /api/health (baseline)', '/api/health'],
      ...(opts.shareOnly ? [] : [['GET /api/auth/csrf', '/api/auth/csrf']]),
    ]) {
      await warmUp(base, jar, p);
      rows.push(row(name, await cannon(opts, { url: `${base}${p}` })));
    }

    if (!opts.shareOnly) await readAndSave(opts, base, jar, authed, variantId, designId, rows);

    // Saves autocannon sent just before it stopped may still be landing, each a new version: wait until
    // the page names the same version twice, so the picture address read from it stays the current one.
    let probe;
    let html = '';
    for (let tries = 0, last = ''; tries < 10; tries++) {
      probe = await fetch(`${base}${sharePath}`, { signal: AbortSignal.timeout(15_000) });
      html = await probe.text();
      const seen = /\/picture\/(\d+)\//.exec(html)?.[1] ?? '';
      if (probe.status !== 200 || seen === last) break;
      last = seen;
      await new Promise((r) => setTimeout(r, 500));
    }
    if (probe.status === 200) {
      pageBytes = Buffer.byteLength(html);
      await warmUp(base, jar, sharePath);
      rows.push(row('GET /s/<token> (share page)', await cannon(opts, { url: `${base}${sharePath}` })));
    } else {
      rows.push({ name: 'GET /s/<token> (share page)', skipped: `not served (${probe.status})` });
    }

    // The field picture the page points at (its own cacheable address): drawn once, then served from
    // memory to every visitor; and the answer to a browser that already holds it (If-None-Match → 304).
    const pictureSrc = /<img[^>]+src="([^"]*\/picture\/[^"]+)"/.exec(html)?.[1]?.replace(/&amp;/g, '&');
    if (opts.shareOnly) {
      // The page alone.
    } else if (pictureSrc) {
      const first = await fetch(`${base}${pictureSrc}`, { signal: AbortSignal.timeout(15_000) });
      pictureBytes = (await first.arrayBuffer()).byteLength;
      const etag = first.headers.get('etag');
      await warmUp(base, jar, pictureSrc);
      rows.push(row('GET share picture (SVG)', await cannon(opts, { url: `${base}${pictureSrc}` })));
      if (etag) {
        rows.push(
          row(
            'GET share picture (304)',
            await cannon(opts, { url: `${base}${pictureSrc}`, headers: { 'if-none-match': etag } }),
          ),
        );
      }
    } else {
      rows.push({ name: 'GET share picture (SVG)', skipped: 'the share page links no picture' });
    }

    // Reports on the engine threads, one at a time once warm: what one person waits for a download.
    // A link of their own, so that the per-link download limit of the page's link is left alone.
    const reportShare = opts.shareOnly
      ? null
      : await api(base, jar, 'POST', `/api/variants/${variantId}/shares`, { expiresInDays: 1 });
    for (const format of reportShare ? ['png', 'pdf'] : []) {
      reports[format] = await timeSequential(
        `${base}/s/${reportShare.share.token}/report?format=${format}`,
        REPORT_RUNS,
      );
    }
  } finally {
    await api(base, jar, 'DELETE', `/api/designs/${designId}`).catch((e) =>
      console.error(`could not remove the load run's design ${designId}: ${e.message}`),
    );
  }

  const baseline = rows[0];
  const loadAfter = loadAverage();
  console.log('');
  console.log(
    `${started.toISOString()} · ${os.cpus().length} CPUs · load average (1/5/15 min) ${loadBefore} before, ` +
      `${loadAfter} after · ${opts.rate} req/s × ${opts.duration} s, ${opts.connections} connections`,
  );
  console.log(
    'ratios: p50 and p99 as multiples of the baseline (GET /api/health: the pipeline and SELECT 1)',
  );
  console.log('');
  printTable(rows, baseline, opts.rate);
  if (rows.some((r) => !r.skipped && r.rps < opts.rate * 0.9)) {
    console.log(`* below 90 % of the ${opts.rate} req/s asked: saturated, latencies include queueing`);
  }
  const save = rows.find((r) => r.name.startsWith('PUT'));
  if (save) console.log(`\nsaves: ${save.saved} stored, ${save.stale409} answered 409 (crossed in flight)`);
  if (pageBytes !== null) {
    console.log(
      `share page HTML ${(pageBytes / 1024).toFixed(1)} kB` +
        (pictureBytes !== null
          ? `; its field picture ${(pictureBytes / 1024).toFixed(1)} kB (cached apart)`
          : ''),
    );
  }
  for (const [format, r] of Object.entries(reports)) {
    console.log(
      `report ${format.toUpperCase()} (engine thread, warm, one at a time): median ${r.medianMs} ms, ` +
        `p90 ${r.p90Ms} ms, max ${r.maxMs} ms over ${r.runs} (${(r.bytes / 1024).toFixed(0)} kB)`,
    );
  }
  if (save && !save.skipped && save.saved === 0) {
    // A save route that refuses everything (say a 403 from the Origin guard) would otherwise pass as "fast".
    console.log('no save was stored: the PUT figures measure refusals, not saves (see the status codes)');
    process.exitCode = 1;
  }
  console.log(
    JSON.stringify({
      url: base,
      ...runConditions(started, loadBefore, loadAfter, opts),
      connections: opts.connections,
      sharePageBytes: pageBytes,
      sharePictureBytes: pictureBytes,
      reports,
      results: rows.map((r) =>
        r.skipped
          ? r
          : {
              ...r,
              p50Ratio: Math.round((r.p50 / Math.max(baseline.p50, 1)) * 100) / 100,
              p99Ratio: Math.round((r.p99 / Math.max(baseline.p99, 1)) * 100) / 100,
            },
      ),
    }),
  );
}

if (process.argv[1] && pathToFileURL(path.resolve(process.argv[1])).href === import.meta.url) {
  main().catch((e) => {
    console.error(`load run failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  });
}
