import type { NextConfig } from 'next';
import { UPLOAD_CSP } from './lib/uploads/serve';

/**
 * Sent with every response (pages, API routes, static files). Pages get their full, nonce-based
 * Content-Security-Policy from proxy.ts (a fresh nonce per request cannot live in a static config), which
 * replaces the baseline below; API replies and static files keep the baseline's frame-ancestors, the
 * modern twin of X-Frame-Options (a worker script's own policy comes from its response, so static files
 * must not carry a stricter one).
 */
const SECURITY_HEADERS = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  { key: 'X-Frame-Options', value: 'DENY' },
  { key: 'Content-Security-Policy', value: "frame-ancestors 'none'" },
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), payment=(), usb=()' },
];

const config: NextConfig = {
  async headers() {
    return [
      { source: '/:path*', headers: SECURITY_HEADERS },
      // An uploaded file keeps its own stricter policy: a later rule wins for the same header, and without
      // this one the baseline above would replace the route's (nothing loads, scripts never run).
      { source: '/api/uploads/:id', headers: [{ key: 'Content-Security-Policy', value: UPLOAD_CSP }] },
    ];
  },
  // Sequelize loads dialect modules dynamically; bundling it breaks the build (pg-hstore).
  serverExternalPackages: ['sequelize', 'mariadb', 'nodemailer', 'smtp-server'],
  poweredByHeader: false,
  // NEXT_DIST_DIR: a build folder of its own (npm test uses .next/test-build), so a running `npm start`
  // keeps serving its build.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  // `npm start` empties .next itself before it builds, keeping the other builds' folders inside it, which
  // Next's own emptying would delete (scripts/lib/builds.mjs).
  cleanDistDir: process.env.NEXT_KEEP_DIST !== '1',
  typescript: {
    // npm test has run `tsc --noEmit` over the whole project just before it builds: no second pass.
    ignoreBuildErrors: process.env.NEXT_SKIP_TYPECHECK === '1',
    // Next adds every build folder's types to the tsconfig it is given and rewrites that file; with a
    // folder of its own it gets tsconfig.next.json, which only extends tsconfig.json and is left alone.
    tsconfigPath: process.env.NEXT_DIST_DIR ? 'tsconfig.next.json' : 'tsconfig.json',
  },
  reactStrictMode: true,
  experimental: {
    // Turbopack keeps a cache of a build on disk for the next one (minutes to write on a busy 2-core
    // machine). A CI run builds once from a fresh clone and throws the folder away: no cache there.
    turbopackFileSystemCacheForBuild: process.env.CI !== 'true',
  },
};

export default config;
