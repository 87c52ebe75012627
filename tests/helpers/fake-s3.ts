import path from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { FAKE_S3_DEFAULTS, startFakeS3 } from '@/scripts/fake-s3.mjs';
import { canConnect } from '@/scripts/lib/proc.mjs';
import { resetStorageClient } from '@/lib/storage/s3';

/**
 * For tests: makes sure a fake S3 server answers at the test endpoint. `npm test` starts one (like the
 * fake SMTP server); when a test file runs on its own, one is started in this process instead.
 * Tests never share the development bucket: without S3_ENDPOINT the test endpoint is used.
 */
export async function useFakeS3(): Promise<{ close: () => Promise<void> }> {
  if (!process.env.S3_ENDPOINT) {
    process.env.S3_ENDPOINT = process.env.TEST_S3_ENDPOINT || FAKE_S3_DEFAULTS.TEST_S3_ENDPOINT;
    process.env.S3_BUCKET ||= 'baskwell-test';
  }
  resetStorageClient();
  const url = new URL(process.env.S3_ENDPOINT);
  const port = Number(url.port || 80);
  if (await canConnect(port, url.hostname)) return { close: async () => {} };
  const server = await startFakeS3({
    endpoint: process.env.S3_ENDPOINT,
    bucket: process.env.S3_BUCKET || FAKE_S3_DEFAULTS.S3_BUCKET,
    directory: path.join(process.cwd(), '.data', 's3-test'),
  });
  return {
    close: async () => {
      resetStorageClient();
      await server.close();
    },
  };
}

/** `useFakeS3()` for a whole test file: the server answers from before its first test to after its last. */
export function withFakeS3(): void {
  let s3: { close: () => Promise<void> } | undefined;
  beforeAll(async () => {
    s3 = await useFakeS3();
  });
  afterAll(async () => {
    await s3?.close();
  });
}
