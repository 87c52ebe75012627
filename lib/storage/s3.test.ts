import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomBytes } from 'node:crypto';
import { useFakeS3 } from '@/tests/helpers/fake-s3';
import { deleteObject, getObject, putObject } from './s3';
import { storageConfig } from './config';

// Against a real S3-compatible server (the local fake one), through the real SDK.
let server: { close: () => Promise<void> };
beforeAll(async () => {
  server = await useFakeS3();
});
afterAll(async () => {
  await server.close();
});

describe('object storage', () => {
  it('stores, returns and deletes bytes', async () => {
    const key = `tests/${randomBytes(8).toString('hex')}.bin`;
    const bytes = new Uint8Array(randomBytes(5000));
    await putObject(key, bytes, 'application/octet-stream');
    expect(Buffer.from((await getObject(key)) as Uint8Array).equals(Buffer.from(bytes))).toBe(true);
    await deleteObject(key);
    expect(await getObject(key)).toBeNull();
  });

  it('answers null for a key that was never stored', async () => {
    expect(await getObject('tests/never-stored')).toBeNull();
  });
});

describe('storageConfig', () => {
  it('has working defaults and rejects a bad bucket name with a clear message', () => {
    expect(storageConfig({}).S3_FORCE_PATH_STYLE).toBe(true);
    expect(() => storageConfig({ S3_BUCKET: 'Bad_Bucket' })).toThrow(/valid bucket name/);
  });
});
