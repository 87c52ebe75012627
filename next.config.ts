import type { NextConfig } from 'next';

const config: NextConfig = {
  // Sequelize loads dialect modules dynamically; bundling it breaks the build (pg-hstore).
  serverExternalPackages: ['sequelize', 'mariadb', 'nodemailer', 'smtp-server'],
  poweredByHeader: false,
  reactStrictMode: true,
};

export default config;
