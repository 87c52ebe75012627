import { z } from 'zod';

/**
 * Object storage settings (documented in .env.example). The defaults point at the local fake S3 server
 * that `npm start` and the tests run; a hosted S3-compatible bucket replaces it by configuration only.
 */
const schema = z.object({
  S3_ENDPOINT: z.string().url().default('http://127.0.0.1:4569'),
  S3_REGION: z.string().min(1).default('us-east-1'),
  S3_BUCKET: z
    .string()
    .regex(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, 'S3_BUCKET must be a valid bucket name')
    .default('baskwell-uploads'),
  S3_ACCESS_KEY_ID: z.string().min(1).default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().min(1).default('S3RVER'),
  /** Path-style URLs (endpoint/bucket/key): needed by the fake server and most self-hosted stores. */
  S3_FORCE_PATH_STYLE: z
    .enum(['true', 'false', '1', '0'])
    .default('true')
    .transform((v) => v === 'true' || v === '1'),
});

export type StorageConfig = z.infer<typeof schema>;

export function storageConfig(env: Record<string, string | undefined> = process.env): StorageConfig {
  return schema.parse(Object.fromEntries(Object.entries(env).filter(([, v]) => v !== '')));
}
