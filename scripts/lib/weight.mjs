// First-load JavaScript of the app's pages, read from a production build (no server needed): the
// framework's root chunks plus the entry chunks of every segment of the page's route (layouts, error and
// not-found boundaries, the page), as listed in the route's client reference manifest — the script tags
// the server puts in the page's HTML. Chunks loaded later (next/dynamic, the Web Worker) are found apart
// by what they contain. Plain Node: used by scripts/weight.mjs and tests/browser/weight.browser.ts.
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import vm from 'node:vm';
import { gzipSync } from 'node:zlib';

/** The pages measured, by their route in the App Router's server output. */
export const PAGES = [
  { name: 'landing', route: '/page', draws: false },
  { name: 'sign-in', route: '/(auth)/sign-in/page', draws: false },
  { name: 'share', route: '/s/[token]/page', draws: false },
  { name: 'studio', route: '/(app)/studio/[variantId]/page', draws: true },
];

/**
 * Text that survives minification and marks a library in a chunk. Konva prints this prefix with its
 * warnings; the engine's grid sizing throws this message (simulation/fields/types.ts).
 */
export const MARKERS = {
  konva: 'Konva warning',
  engine: 'cellCm must be a positive number',
};

/**
 * The production build to read: the folder asked for, else the newer of `.next` (npm start, npm run build)
 * and `.next/test-build` (npm test). A folder counts once it has a BUILD_ID.
 */
export function findDistDir(root, preferred) {
  const built = (c) => existsSync(path.join(path.resolve(root, c), 'BUILD_ID'));
  if (preferred) return built(preferred) ? path.resolve(root, preferred) : null;
  const found = ['.next', path.join('.next', 'test-build')].filter(built);
  const age = (c) => statSync(path.join(path.resolve(root, c), 'BUILD_ID')).mtimeMs;
  found.sort((a, b) => age(b) - age(a));
  return found.length ? path.resolve(root, found[0]) : null;
}

function clientManifest(dist, route) {
  const file = path.join(dist, 'server', 'app', `${route}_client-reference-manifest.js`);
  if (!existsSync(file)) throw new Error(`no client manifest for ${route} in ${dist}: is it a full build?`);
  // The manifest is a script that fills globalThis.__RSC_MANIFEST: run it in a box of its own.
  const box = {};
  box.globalThis = box;
  vm.runInNewContext(readFileSync(file, 'utf8'), box, { filename: file });
  const m = box.__RSC_MANIFEST?.[route];
  if (!m?.entryJSFiles) throw new Error(`the client manifest of ${route} has no entryJSFiles`);
  return m;
}

/** The JS files (relative to the build folder, e.g. static/chunks/x.js) a first visit of the route loads. */
export function firstLoadFiles(dist, route) {
  const build = JSON.parse(readFileSync(path.join(dist, 'build-manifest.json'), 'utf8'));
  const files = new Set(build.rootMainFiles ?? []);
  for (const list of Object.values(clientManifest(dist, route).entryJSFiles)) {
    for (const f of list) files.add(f.replace(/^\/?_next\//, ''));
  }
  return [...files].filter((f) => f.endsWith('.js')).sort();
}

const textCache = new Map();
function read(dist, file) {
  const full = path.join(dist, file);
  if (!textCache.has(full)) textCache.set(full, readFileSync(full));
  return textCache.get(full);
}

/** Raw and gzip bytes of some files of the build. */
export function weigh(dist, files) {
  let raw = 0;
  let gzip = 0;
  for (const f of files) {
    const bytes = read(dist, f);
    raw += bytes.length;
    gzip += gzipSync(bytes).length;
  }
  return { raw, gzip };
}

/** Which markers (MARKERS keys) occur in some files of the build. */
export function markersIn(dist, files) {
  const found = new Set();
  for (const f of files) {
    const text = read(dist, f).toString('latin1');
    for (const [name, marker] of Object.entries(MARKERS)) if (text.includes(marker)) found.add(name);
  }
  return [...found].sort();
}

/** Every JS file of the build's static output that contains a marker (wherever it is loaded from). */
export function filesWithMarker(dist, name) {
  const out = [];
  const walk = (dir) => {
    for (const e of readdirSync(path.join(dist, dir), { withFileTypes: true })) {
      const rel = path.join(dir, e.name);
      if (e.isDirectory()) walk(rel);
      else if (e.name.endsWith('.js') && read(dist, rel).toString('latin1').includes(MARKERS[name]))
        out.push(rel);
    }
  };
  walk('static');
  return out.sort();
}

/** One row per page: its first-load JS, what it contains, and (for a page that draws) the lazy drawing code. */
export function measurePages(dist) {
  const drawing = [...new Set([...filesWithMarker(dist, 'konva'), ...filesWithMarker(dist, 'engine')])];
  return PAGES.map((p) => {
    const files = firstLoadFiles(dist, p.route);
    const lazy = p.draws ? drawing.filter((f) => !files.includes(f)) : [];
    return {
      ...p,
      files,
      firstLoad: weigh(dist, files),
      markers: markersIn(dist, files),
      lazyFiles: lazy,
      lazy: weigh(dist, lazy),
    };
  });
}
