/**
 * How soon a studio shows its field, in Chromium against a production build, as a user opens it:
 *
 *   npm run --silent bench:studio [-- --runs 10] [--no-build] [--base .next/bench-base] [--trace DIR]
 *
 * Brings up what `npm test`'s browser stage does (the private MariaDB with a database of its own,
 * migrations, the demo seed, `next build` into .next/bench-build, `next start` on a free port) and stops
 * it at the end. Then opens, each in a fresh browser context (nothing cached), `--runs` times:
 * the saved demo design of the "Desert vivarium" (signed in) and the scratch studio (no account), after
 * one opening of each that is not counted (the server's first computation of a design's picture).
 *
 * Two times per opening, from the navigation's start: `field-visible` (the field is first on screen,
 * picture or computed) and `field-computed` (the studio's engine worker answered). Prints median and p90
 * of both with the load average (the machine is shared), the medians of where the wait before the field
 * went (first byte, HTML complete, stylesheet file, first paint, long tasks), and as its LAST line one
 * JSON object.
 * `--no-build` reuses .next/bench-build when it exists.
 * `--base DIR` serves a second, earlier build of this checkout (made before a change with
 * `NEXT_DIST_DIR=DIR npx next build`) beside the new one, against the same database, and opens each studio
 * in both in turn (alternating which goes first), so a change is measured side by side in the same minutes
 * on a shared machine; it prints both and the new build's medians as ratios of the earlier one's.
 * `--trace DIR` adds one more uncounted opening of each studio in each build, recorded as a Chromium
 * performance trace (DIR/<build>-<studio>.json, for Chromium's or Perfetto's trace viewer), and prints
 * for it how much processor time the page's main thread, its other threads (raster, script compiling) and
 * the rest of the browser used between the HTML's last byte and the first paint: on a shared machine the
 * wall time between the two is mostly waiting for a core when these are small.
 */
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import path from 'node:path';
import type { Browser, BrowserContext } from 'playwright-core';
import { loadEnv } from './lib/env.mjs';
import { BUILD_DIRS } from './lib/builds.mjs';
import { bin, freePort, log, run } from './lib/proc.mjs';
import { Lifecycle, migrate, prepareDatabase, ROOT, seed, startNext } from './lib/stack.mjs';
import { cpuBetween, type TraceEvent } from './lib/trace-breakdown';

const DIST = BUILD_DIRS.bench;

function parseArgs(argv: string[]) {
  const opts: { runs: number; build: boolean; base: string | null; trace: string | null } = {
    runs: 10,
    build: true,
    base: null,
    trace: null,
  };
  for (let k = 0; k < argv.length; k++) {
    const a = argv[k]!;
    if (a === '--runs') opts.runs = Number(argv[++k]);
    else if (a.startsWith('--runs=')) opts.runs = Number(a.slice(7));
    else if (a === '--no-build') opts.build = false;
    else if (a === '--base') opts.base = argv[++k] ?? '';
    else if (a.startsWith('--base=')) opts.base = a.slice(7);
    else if (a === '--trace') opts.trace = argv[++k] ?? '';
    else if (a.startsWith('--trace=')) opts.trace = a.slice(8);
    else throw new Error(`unknown option ${a} (--runs N, --no-build, --base DIR, --trace DIR)`);
  }
  if (opts.base !== null && !existsSync(path.join(ROOT, opts.base, 'BUILD_ID')))
    throw new Error(
      `--base: no build in ${opts.base} (make one with NEXT_DIST_DIR=${opts.base} npx next build)`,
    );
  if (!(Number.isInteger(opts.runs) && opts.runs >= 1))
    throw new Error('--runs: expected a whole number ≥ 1');
  return opts;
}

/**
 * One opening, in ms after the navigation started: the two marks, and where the time before the first one
 * went — the HTML's first and last byte, the browser's first paint, and the main thread's long tasks
 * (over 50 ms, the browser's own threshold) that began before the field was visible.
 */
type Opening = {
  visible: number;
  computed: number;
  firstByte: number;
  htmlEnd: number;
  firstPaint: number;
  /** When the last stylesheet file arrived (NaN when the page has none to fetch: its CSS is inline). */
  cssEnd: number;
  busyBeforeVisible: number;
};

function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  // Nearest rank: the p90 of 10 openings is the 9th fastest.
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil(q * s.length) - 1))]!;
}

/** The trace's categories: the main thread's tasks, raster and compositing, script, paint timing. */
const TRACE_CATEGORIES = [
  'devtools.timeline',
  'disabled-by-default-devtools.timeline',
  'disabled-by-default-devtools.timeline.frame',
  'blink.user_timing',
  'loading',
  'cc',
  'v8.execute',
];

/**
 * One opening in a fresh context: the two marks, in ms after the navigation started. With `traceFile`, the
 * opening is recorded as a Chromium performance trace into that file.
 */
async function openOnce(
  browser: Browser,
  url: string,
  cookies: Parameters<BrowserContext['addCookies']>[0],
  traceFile?: string,
) {
  const { newContext } = await import('../tests/browser/harness');
  const context = await newContext(browser);
  try {
    if (cookies.length) await context.addCookies(cookies);
    // Registered through the browser's debugging protocol, before the page's own scripts (its policy does
    // not apply): long tasks are not kept for an observer that starts later.
    await context.addInitScript(() => {
      const w = window as unknown as { __longTasks: [number, number][] };
      w.__longTasks = [];
      try {
        new PerformanceObserver((list) => {
          for (const e of list.getEntries()) w.__longTasks.push([e.startTime, e.duration]);
        }).observe({ type: 'longtask', buffered: true });
      } catch {
        // No long task timing in this browser: the breakdown reports 0.
      }
    });
    const page = await context.newPage();
    if (traceFile) await browser.startTracing(page, { path: traceFile, categories: TRACE_CATEGORIES });
    await page.goto(url, { waitUntil: 'commit' });
    // No named helper inside: tsx would wrap it in a function of its own that the page does not have
    // (and the page's policy refuses a string to evaluate).
    const marks = await page.waitForFunction(
      () => {
        const visible = performance.getEntriesByName('field-visible', 'mark')[0]?.startTime;
        const computed = performance.getEntriesByName('field-computed', 'mark')[0]?.startTime;
        if (visible === undefined || computed === undefined) return null;
        const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined;
        const firstPaint = performance.getEntriesByName('first-paint', 'paint')[0]?.startTime ?? NaN;
        const tasks = (window as unknown as { __longTasks?: [number, number][] }).__longTasks ?? [];
        let busyBeforeVisible = 0;
        for (const [start, duration] of tasks)
          if (start < visible) busyBeforeVisible += Math.min(duration, visible - start);
        const cssEnds = performance
          .getEntriesByType('resource')
          .filter((r) => /\.css(\?|$)/.test(r.name))
          .map((r) => (r as PerformanceResourceTiming).responseEnd);
        return {
          visible,
          computed,
          firstByte: nav?.responseStart ?? NaN,
          htmlEnd: nav?.responseEnd ?? NaN,
          firstPaint,
          cssEnd: cssEnds.length ? Math.max(...cssEnds) : NaN,
          busyBeforeVisible,
        };
      },
      null,
      { timeout: 120_000, polling: 50 },
    );
    const opening = (await marks.jsonValue()) as Opening;
    if (traceFile) await browser.stopTracing();
    return opening;
  } finally {
    await context.close();
  }
}

/** One more opening, not counted, recorded as a trace; prints where the processor went before the paint. */
async function traceOnce(
  browser: Browser,
  build: string,
  target: { name: string; cookies: Parameters<BrowserContext['addCookies']>[0] },
  url: string,
  dir: string,
) {
  const file = path.resolve(ROOT, dir, `${build}-${target.name.replace(/ /g, '-')}.json`);
  const o = await openOnce(browser, url, target.cookies, file);
  const trace = JSON.parse(readFileSync(file, 'utf8')) as { traceEvents: TraceEvent[] };
  const cpu = cpuBetween(trace.traceEvents, o.htmlEnd, o.firstPaint);
  const r = (v: number) => Math.round(v);
  console.log(
    `trace of ${target.name} (${build}): HTML complete ${r(o.htmlEnd)} ms → first paint ${r(o.firstPaint)} ms` +
      (cpu
        ? `; processor time between them: page main thread ${r(cpu.main)} ms, page's other threads ` +
          `${r(cpu.pageWorkers)} ms, rest of the browser ${r(cpu.browser)} ms`
        : '; no navigation found in the trace') +
      ` (${path.relative(ROOT, file)}, load average ${loadavg()[0]!.toFixed(1)})`,
  );
}

async function main() {
  const opts = parseArgs(process.argv.slice(2));
  const env = loadEnv();
  const life = new Lifecycle();
  life.handleSignals(130);
  const port = await freePort(Number(env.TEST_PORT) + 50);
  const appUrl = `http://localhost:${port}`;
  const benchEnv = {
    ...env,
    DB_NAME: `${env.DB_NAME}_bench`,
    PORT: String(port),
    APP_URL: appUrl,
    NEXTAUTH_URL: appUrl,
    NEXTAUTH_SECRET: env.NEXTAUTH_SECRET || 'baskwell-bench-only-secret-0123456789abcdefghijklmnop',
    NEXT_DIST_DIR: DIST,
    NEXT_TELEMETRY_DISABLED: '1',
  };
  let browser: Browser | null = null;
  try {
    log('Database, migrations and the demo seed ...');
    await prepareDatabase(life, benchEnv, { recreate: [benchEnv.DB_NAME] });
    await migrate(benchEnv);
    await seed(benchEnv);
    if (opts.build || !existsSync(path.join(ROOT, DIST, 'BUILD_ID'))) {
      log(`Building the app into ${DIST} (next build) ...`);
      await run(bin('next'), ['build'], { env: benchEnv });
    }
    await startNext(life, benchEnv, {
      port,
      build: false,
      logFile: path.join(ROOT, 'test-results', 'bench-studio-next.log'),
    });
    // The earlier build, on a port of its own against the same database: the session cookie is the
    // host's (not the port's), so the same sign-in opens both.
    let baseUrl: string | null = null;
    if (opts.base !== null) {
      const basePort = await freePort(port + 1);
      baseUrl = `http://localhost:${basePort}`;
      const baseEnv = { ...benchEnv, PORT: String(basePort), APP_URL: baseUrl, NEXTAUTH_URL: baseUrl };
      await startNext(
        life,
        { ...baseEnv, NEXT_DIST_DIR: opts.base },
        {
          port: basePort,
          build: false,
          logFile: path.join(ROOT, 'test-results', 'bench-studio-base-next.log'),
        },
      );
    }

    // The harness reads the app's address when it is first imported.
    process.env.E2E_BASE_URL = appUrl;
    const { launchBrowser } = await import('../tests/browser/harness');
    const { enclosureIdByName, staffPage } = await import('../tests/browser/journey-helpers');
    browser = await launchBrowser();
    const staff = await staffPage(browser);
    const enclosureId = await enclosureIdByName(staff, 'Desert vivarium');
    const variantId = await staff.evaluate(async (id) => {
      const res = await fetch(`/api/enclosures/${id}/designs`);
      const body = (await res.json()) as { items?: { variants?: { id: number }[] }[] };
      return body.items?.[0]?.variants?.[0]?.id ?? null;
    }, enclosureId);
    if (!variantId) throw new Error('the demo "Desert vivarium" has no design to open');
    const cookies = await staff.context().cookies();
    await staff.context().close();

    const builds = [{ name: 'new', url: appUrl }, ...(baseUrl ? [{ name: 'base', url: baseUrl }] : [])];
    const targets = [
      { name: 'saved design', path: `/studio/${variantId}`, cookies },
      { name: 'scratch studio', path: '/studio-scratch', cookies: [] },
    ];
    const load0 = loadavg()[0]!;
    const results: Record<string, Record<string, Opening[]>> = {};
    for (const b of builds) results[b.name] = {};
    if (opts.trace) mkdirSync(path.resolve(ROOT, opts.trace), { recursive: true });
    for (const t of targets) {
      for (const b of builds) {
        await openOnce(browser, b.url + t.path, t.cookies); // not counted: the server's first picture
        results[b.name]![t.name] = [];
        if (opts.trace) await traceOnce(browser, b.name, t, b.url + t.path, opts.trace);
      }
      for (let k = 0; k < opts.runs; k++) {
        // Which build goes first alternates, so neither always meets the machine just after the other.
        const order = k % 2 ? [...builds].reverse() : builds;
        for (const b of order)
          results[b.name]![t.name]!.push(await openOnce(browser, b.url + t.path, t.cookies));
      }
    }
    const load1 = loadavg()[0]!;

    const r0 = (v: number) => Math.round(v);
    const med = (xs: Opening[], key: keyof Opening, q = 0.5) =>
      r0(
        quantile(
          xs.map((x) => x[key]),
          q,
        ),
      );
    const summary = (xs: Opening[]) => ({
      visibleMedianMs: med(xs, 'visible'),
      visibleP90Ms: med(xs, 'visible', 0.9),
      computedMedianMs: med(xs, 'computed'),
      computedP90Ms: med(xs, 'computed', 0.9),
      // Medians of the breakdown: where the wait before the field went.
      firstByteMs: med(xs, 'firstByte'),
      htmlEndMs: med(xs, 'htmlEnd'),
      firstPaintMs: med(xs, 'firstPaint'),
      cssEndMs: med(xs, 'cssEnd'),
      busyBeforeVisibleMs: med(xs, 'busyBeforeVisible'),
    });
    type Summary = ReturnType<typeof summary>;
    const summaries = (name: string) => ({
      saved: summary(results[name]!['saved design']!),
      scratch: summary(results[name]!['scratch studio']!),
    });
    const printed = (label: string, s: { saved: Summary; scratch: Summary }) => {
      if (label) console.log(label);
      for (const [name, x] of [
        ['saved design', s.saved],
        ['scratch studio', s.scratch],
      ] as const) {
        console.log(
          `  ${name.padEnd(15)} field visible: median ${x.visibleMedianMs} ms, p90 ${x.visibleP90Ms} ms; ` +
            `computed: median ${x.computedMedianMs} ms, p90 ${x.computedP90Ms} ms`,
        );
        console.log(
          `  ${''.padEnd(15)} medians: first byte ${x.firstByteMs} ms, HTML complete ${x.htmlEndMs} ms, ` +
            `stylesheet file ${Number.isNaN(x.cssEndMs) ? 'none (inline)' : `${x.cssEndMs} ms`}, ` +
            `first paint ${x.firstPaintMs} ms, main thread in long tasks before the field ${x.busyBeforeVisibleMs} ms`,
        );
      }
    };
    const fresh = summaries('new');
    const base = baseUrl ? summaries('base') : null;
    console.log(
      `Navigation → field on screen (field-visible) and → the engine worker's first answer (field-computed), ` +
        `${opts.runs} openings each in a fresh Chromium context, production build:`,
    );
    printed(base ? `This build (${DIST}):` : '', fresh);
    const ratio = (a: number, b: number) => Math.round((a / b) * 100) / 100;
    const ratios = base && {
      savedVisibleMedian: ratio(fresh.saved.visibleMedianMs, base.saved.visibleMedianMs),
      savedVisibleP90: ratio(fresh.saved.visibleP90Ms, base.saved.visibleP90Ms),
      scratchVisibleMedian: ratio(fresh.scratch.visibleMedianMs, base.scratch.visibleMedianMs),
      scratchVisibleP90: ratio(fresh.scratch.visibleP90Ms, base.scratch.visibleP90Ms),
    };
    if (base && ratios) {
      printed(`The earlier build (${opts.base}), the same minutes, alternating:`, base);
      console.log(
        `  this build over the earlier one, field visible: saved median ×${ratios.savedVisibleMedian}, ` +
          `p90 ×${ratios.savedVisibleP90}; scratch median ×${ratios.scratchVisibleMedian}, p90 ×${ratios.scratchVisibleP90}`,
      );
    }
    console.log(`Load average ${load0.toFixed(1)} before, ${load1.toFixed(1)} after (a shared machine).`);
    console.log(
      JSON.stringify({
        runs: opts.runs,
        ...fresh,
        ...(base ? { base, ratios } : {}),
        loadAvg: Math.round(((load0 + load1) / 2) * 100) / 100,
      }),
    );
  } finally {
    await browser?.close();
    await life.stop();
  }
}

main().then(
  () => process.exit(0),
  (e: unknown) => {
    console.error(`bench:studio failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  },
);
