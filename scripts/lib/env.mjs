// Environment for the start and test scripts: repository paths, a .env file, documented defaults.
// Plain Node only: these run before node_modules exists.
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const DATA_DIR = path.join(ROOT, '.data');
export const BIN = path.join(ROOT, 'node_modules', '.bin');

/** The defaults documented in .env.example. */
export const DEFAULTS = {
  DB_HOST: '127.0.0.1',
  DB_PORT: '3407',
  DB_NAME: 'baskwell',
  DB_USER: 'baskwell',
  DB_PASSWORD: 'baskwell-dev',
  TEST_DB_NAME: 'baskwell_test',
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: '2526',
  FAKE_SMTP_HTTP: 'http://127.0.0.1:2580',
  TEST_SMTP_PORT: '2527',
  TEST_FAKE_SMTP_HTTP: 'http://127.0.0.1:2581',
  PORT: '3000',
  TEST_PORT: '3100',
  S3_ENDPOINT: 'http://127.0.0.1:4569',
  S3_BUCKET: 'baskwell-uploads',
  TEST_S3_ENDPOINT: 'http://127.0.0.1:4570',
  TEST_S3_BUCKET: 'baskwell-test',
};

/** Parses KEY=VALUE lines (optional `export`, quotes, # comments). */
export function parseDotEnv(text) {
  const out = {};
  for (const raw of text.split(/\r?\n/)) {
    const line = raw.trim();
    if (!line || line.startsWith('#')) continue;
    const m = /^(?:export\s+)?([A-Za-z_][A-Za-z0-9_]*)\s*=\s*(.*)$/.exec(line);
    if (!m) continue;
    let value = m[2];
    const quote = value[0];
    if ((quote === '"' || quote === "'") && value.lastIndexOf(quote) > 0) {
      value = value.slice(1, value.lastIndexOf(quote));
      if (quote === '"') value = value.replace(/\\n/g, '\n').replace(/\\"/g, '"');
    } else {
      value = value.replace(/\s+#.*$/, '').trim();
    }
    out[m[1]] = value;
  }
  return out;
}

/**
 * Loads .env (if present) under the real environment, then the defaults under both.
 * Variables already set in the environment always win.
 */
export function loadEnv() {
  const file = path.join(ROOT, '.env');
  if (existsSync(file)) {
    for (const [k, v] of Object.entries(parseDotEnv(readFileSync(file, 'utf8')))) {
      if (process.env[k] === undefined) process.env[k] = v;
    }
  }
  for (const [k, v] of Object.entries(DEFAULTS)) {
    if (process.env[k] === undefined || process.env[k] === '') process.env[k] = v;
  }
  process.env.APP_URL ||= `http://localhost:${process.env.PORT}`;
  process.env.NEXTAUTH_URL ||= process.env.APP_URL;
  return process.env;
}

/** NEXTAUTH_SECRET from the environment, else one generated once and kept in .data/secret. */
export function ensureSecret() {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  const file = path.join(DATA_DIR, 'secret');
  let secret = existsSync(file) ? readFileSync(file, 'utf8').trim() : '';
  if (secret.length < 32) {
    mkdirSync(DATA_DIR, { recursive: true });
    secret = randomBytes(48).toString('base64url');
    writeFileSync(file, secret + '\n', { mode: 0o600 });
  }
  process.env.NEXTAUTH_SECRET = secret;
  return secret;
}

/** True when the database is ours to run (a local host), false for an external server. */
export function usesPrivateDb(env = process.env) {
  if (env.DB_EXTERNAL === '1' || env.DB_EXTERNAL === 'true') return false;
  return ['127.0.0.1', 'localhost', '::1'].includes(env.DB_HOST ?? '127.0.0.1');
}

/** Port of an http://host:port URL. */
export function urlPort(url) {
  const u = new URL(url);
  return Number(u.port || (u.protocol === 'https:' ? 443 : 80));
}
