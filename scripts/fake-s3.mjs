// A local S3-compatible server (npm `s3rver`) for development and tests, so uploads go through the real
// S3 SDK without a cloud account. Objects live under .data/s3 (or $S3_DIR). Used two ways:
//   import { startFakeS3 } from './fake-s3.mjs'   (from the start and test scripts)
//   node scripts/fake-s3.mjs                       (on its own; stops on Ctrl-C)
// The endpoint, bucket and keys come from S3_ENDPOINT, S3_BUCKET, S3_ACCESS_KEY_ID (defaults in .env.example).
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import S3rver from 's3rver';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export const FAKE_S3_DEFAULTS = {
  S3_ENDPOINT: 'http://127.0.0.1:4569',
  S3_BUCKET: 'baskwell-uploads',
  TEST_S3_ENDPOINT: 'http://127.0.0.1:4570',
};

/**
 * Starts the fake S3 server on the port of `endpoint` (127.0.0.1 only) with `bucket` created.
 * Resolves { endpoint, port, directory, close() }.
 */
export async function startFakeS3({
  endpoint = process.env.S3_ENDPOINT || FAKE_S3_DEFAULTS.S3_ENDPOINT,
  bucket = process.env.S3_BUCKET || FAKE_S3_DEFAULTS.S3_BUCKET,
  directory = process.env.S3_DIR || path.join(ROOT, '.data', 's3'),
} = {}) {
  const url = new URL(endpoint);
  const port = Number(url.port || 80);
  mkdirSync(directory, { recursive: true });
  const server = new S3rver({
    port,
    address: '127.0.0.1',
    silent: true,
    directory,
    configureBuckets: [{ name: bucket, configs: [] }],
  });
  await server.run();
  return {
    endpoint: `http://127.0.0.1:${port}`,
    port,
    directory,
    close: () => server.close(),
  };
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const s3 = await startFakeS3();
  console.log(`fake S3 on ${s3.endpoint} (objects kept in ${path.relative(ROOT, s3.directory)})`);
  let closing = false;
  for (const signal of ['SIGINT', 'SIGTERM']) {
    process.on(signal, () => {
      if (closing) return;
      closing = true;
      void s3.close().finally(() => process.exit(0));
    });
  }
}
