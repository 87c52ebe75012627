#!/usr/bin/env node
// `npm run weight [-- --dir=.next/test-build]`: first-load JavaScript of the landing, sign-in, share and
// studio pages from the production build (kB raw and gzip), and whether Konva or the simulation engine is
// in it. Reads the newer of .next and .next/test-build unless told; builds first (`next build`) when there
// is no build. Figures only; the assertion that pages which do not draw stay free of Konva and the
// engine is tests/browser/weight.browser.ts, run by `npm test`.
import { ROOT } from './lib/env.mjs';
import { bin, run } from './lib/proc.mjs';
import { findDistDir, measurePages } from './lib/weight.mjs';

const wanted = process.argv.find((a) => a.startsWith('--dir='))?.slice(6) ?? process.env.NEXT_DIST_DIR;
let dist = findDistDir(ROOT, wanted);
if (!dist) {
  console.log(`No production build in ${wanted ?? '.next'}: running next build ...`);
  const env = { ...process.env, NEXT_TELEMETRY_DISABLED: '1', ...(wanted ? { NEXT_DIST_DIR: wanted } : {}) };
  await run(bin('next'), ['build'], { env });
  dist = findDistDir(ROOT, wanted);
  if (!dist) throw new Error('next build left no BUILD_ID');
}

const kB = (n) => (n / 1024).toFixed(1).padStart(7);
const rows = measurePages(dist);
console.log(`First-load JavaScript from ${dist} (kB = 1024 bytes; gzip level 6, as served compressed)`);
console.log(`  ${'page'.padEnd(8)} ${'raw kB'.padStart(7)} ${'gzip kB'.padStart(7)} files  contains`);
for (const r of rows) {
  console.log(
    `  ${r.name.padEnd(8)} ${kB(r.firstLoad.raw)} ${kB(r.firstLoad.gzip)} ${String(r.files.length).padStart(5)}  ${r.markers.join(', ') || '—'}`,
  );
  if (r.lazyFiles.length) {
    console.log(
      `  ${'+ later'.padEnd(8)} ${kB(r.lazy.raw)} ${kB(r.lazy.gzip)} ${String(r.lazyFiles.length).padStart(5)}  Konva and engine chunks, loaded after the page (dynamic import, worker)`,
    );
  }
}
console.log(
  JSON.stringify({
    dist,
    pages: Object.fromEntries(
      rows.map((r) => [
        r.name,
        {
          rawBytes: r.firstLoad.raw,
          gzipBytes: r.firstLoad.gzip,
          contains: r.markers,
          laterRawBytes: r.lazy.raw,
          laterGzipBytes: r.lazy.gzip,
        },
      ]),
    ),
  }),
);
