import type { NextConfig } from 'next';

const config: NextConfig = {
  // Sequelize loads dialect modules dynamically; bundling it breaks the build (pg-hstore).
  serverExternalPackages: ['sequelize', 'mariadb', 'nodemailer', 'smtp-server'],
  poweredByHeader: false,
  // npm test builds into .next/test-build so a running `npm start` keeps serving its own build.
  distDir: process.env.NEXT_DIST_DIR || '.next',
  reactStrictMode: true,
};

export default config;
