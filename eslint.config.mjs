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
];

export default config;
