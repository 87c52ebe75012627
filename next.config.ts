import type { NextConfig } from 'next';

const config: NextConfig = {
  // Sequelize loads dialect modules dynamically; bundling it breaks the build (pg-hstore).
  serverExternalPackages: ['sequelize', 'mariadb', 'nodemailer', 'smtp-server'],
  poweredByHeader: false,
  // NEXT_DIST_DIR: a build folder of its own (npm test uses .next/test-build), so a running `npm start`
  // keeps serving its build.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  typescript: {
    // npm test has run `tsc --noEmit` over the whole project just before it builds: no second pass.
    ignoreBuildErrors: process.env.NEXT_SKIP_TYPECHECK === '1',
    // Next adds every build folder's types to the tsconfig it is given and rewrites that file; with a
    // folder of its own it gets tsconfig.next.json, which only extends tsconfig.json and is left alone.
    tsconfigPath: process.env.NEXT_DIST_DIR ? 'tsconfig.next.json' : 'tsconfig.json',
  },
  reactStrictMode: true,
};

export default config;
