import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

// The engine under simulation/ must stay pure: no React, DOM, Node or database imports.
const engineForbidden = {
  patterns: [
    {
      group: ['react', 'react-*', 'react/*', 'next', 'next/*', 'next-auth', 'next-auth/*'],
      message: 'simulation/ is framework-free.',
    },
    { group: ['konva', 'konva/*', 'react-konva'], message: 'simulation/ is framework-free.' },
    {
      group: ['sequelize', 'mariadb', 'umzug', 'nodemailer'],
      message: 'simulation/ has no database or mail.',
    },
    {
      group: [
        'node:*',
        'fs',
        'fs/*',
        'path',
        'os',
        'child_process',
        'http',
        'https',
        'net',
        'crypto',
        'worker_threads',
        'url',
        'process',
      ],
      message: 'simulation/ has no Node APIs.',
    },
    {
      group: ['@/app/*', '@/components/*', '@/lib/*', '@/models/*', '@/migrations/*', '@/scripts/*'],
      message: 'simulation/ does not import the app.',
    },
  ],
};

// The layers (DEVELOPERS.md draws them): shared/ is pure code both sides use; lib/ is the server's domain
// code and never draws; components/ is the browser's and never touches the database; app/ composes them and
// reaches the models only through lib/. Everyone outside the engine uses it through its index, so the
// engine can move its files without breaking the app. Each pattern says why it is there.
const layer = {
  engineIndex: {
    // The engine's own test fixtures (simulation/testing/) are for tests and benchmarks.
    regex: '^(@/|(\\.\\./)+)simulation/(?!testing/)',
    message: 'Use the engine through its index, @/simulation.',
  },
  components: {
    group: ['@/components', '@/components/*', '**/components/*'],
    message: 'lib/ and shared/ do not draw: move the pure part to shared/ and import it from both sides.',
  },
  models: {
    group: ['@/models', '@/models/*', '**/models', '**/models/*'],
    message: 'Reach the models through a lib/ domain module (queries, mutations, access).',
  },
  database: {
    group: ['@/lib/db', '**/lib/db', 'sequelize', 'mariadb', 'umzug'],
    message: 'components/ runs in the browser: no database.',
  },
  server: {
    group: [
      '@/lib/*',
      '@/app/*',
      '**/lib/*',
      'server-only',
      'next',
      'next/*',
      'next-auth',
      'next-auth/*',
      'react',
      'react-*',
    ],
    message: 'shared/ is pure code for both sides: no server modules, framework or React.',
  },
};
const restrict = (...patterns) => ['error', { patterns }];

const config = [
  ...nextVitals,
  ...nextTs,
  { ignores: ['node_modules/**', '.next/**', '.data/**', 'next-env.d.ts', 'test-results/**', 'coverage/**'] },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['simulation/**/*.ts'],
    ignores: ['simulation/**/*.test.ts'],
    rules: {
      'no-restricted-imports': ['error', engineForbidden],
      'no-restricted-globals': ['error', 'window', 'document', 'process', 'require', 'Buffer', '__dirname'],
    },
  },
  {
    files: ['lib/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': restrict(layer.engineIndex, layer.components) },
  },
  {
    files: ['shared/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': restrict(
        layer.engineIndex,
        layer.components,
        layer.models,
        layer.database,
        layer.server,
      ),
    },
  },
  {
    files: ['components/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': restrict(layer.engineIndex, layer.models, layer.database) },
  },
  {
    files: ['app/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': restrict(layer.engineIndex, layer.models) },
  },
  {
    files: ['models/**/*.ts', 'scripts/**/*.ts', 'tests/**/*.ts', '*.ts'],
    rules: { 'no-restricted-imports': restrict(layer.engineIndex) },
  },
];

export default config;
