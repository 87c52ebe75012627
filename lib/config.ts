import { z } from 'zod';

// Server configuration from the environment, with the defaults documented in .env.example.
const schema = z.object({
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().positive().default(3407),
  DB_NAME: z
    .string()
    .regex(/^[a-z0-9_]+$/)
    .default('baskwell'),
  DB_USER: z.string().default('baskwell'),
  DB_PASSWORD: z.string().default('baskwell-dev'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().positive().default(2526),
  MAIL_FROM: z.string().default('Baskwell <no-reply@baskwell.example>'),
  FAKE_SMTP_HTTP: z.string().default('http://127.0.0.1:2580'),
  APP_URL: z.string().url().default('http://localhost:3000'),
  // Designs whose engine results the share page and reports keep in memory (lib/variants/computed);
  // 0 turns the memo off (every request simulates), e.g. to measure what it saves.
  COMPUTED_CACHE_ENTRIES: z.coerce.number().int().min(0).max(1000).default(24),
  // The engine's worker threads (lib/engine-pool): how many (default: cores − 1, 1 to 4), how many tasks
  // may wait for one, and how long one task may run before its thread is ended.
  ENGINE_THREADS: z.coerce.number().int().min(1).max(32).optional(),
  // How many web server processes share this machine (scripts/lib/web-cluster.mjs; `npm start` sets it
  // for each): the engine's threads are divided among them.
  WEB_PROCESSES: z.coerce.number().int().min(1).max(256).default(1),
  ENGINE_QUEUE: z.coerce.number().int().min(0).max(1000).default(16),
  ENGINE_TIMEOUT_MS: z.coerce.number().int().min(100).max(600_000).default(20_000),
});

export type ServerConfig = z.infer<typeof schema>;

let cached: ServerConfig | undefined;

export function config(): ServerConfig {
  cached ??= schema.parse(process.env);
  return cached;
}
