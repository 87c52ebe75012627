import 'server-only';
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { storageConfig, type StorageConfig } from './config';

/**
 * The object store behind uploads, through the S3 SDK. One client per process (kept on globalThis so
 * `next dev` reloads reuse it); the bucket is created on first use when missing.
 */
type Holder = { client?: S3Client; config?: StorageConfig; bucketReady?: Promise<void> };
const holder = globalThis as unknown as { __baskwellS3?: Holder };

function state(): Required<Pick<Holder, 'client' | 'config'>> & Holder {
  holder.__baskwellS3 ??= {};
  const h = holder.__baskwellS3;
  if (!h.client || !h.config) {
    const c = storageConfig();
    h.config = c;
    h.client = new S3Client({
      endpoint: c.S3_ENDPOINT,
      region: c.S3_REGION,
      forcePathStyle: c.S3_FORCE_PATH_STYLE,
      credentials: { accessKeyId: c.S3_ACCESS_KEY_ID, secretAccessKey: c.S3_SECRET_ACCESS_KEY },
      // A storage outage should fail a request quickly, not hang it.
      maxAttempts: 2,
    });
  }
  return h as Required<Pick<Holder, 'client' | 'config'>> & Holder;
}

export class StorageUnavailableError extends Error {
  constructor(cause: unknown) {
    super('The file store cannot be reached right now.');
    this.name = 'StorageUnavailableError';
    this.cause = cause;
  }
}

const statusOf = (e: unknown) => (e instanceof S3ServiceException ? e.$metadata.httpStatusCode : undefined);

async function ensureBucket(): Promise<void> {
  const h = state();
  h.bucketReady ??= (async () => {
    const Bucket = h.config.S3_BUCKET;
    try {
      await h.client.send(new HeadBucketCommand({ Bucket }));
    } catch (e) {
      if (statusOf(e) !== 404) throw e;
      try {
        await h.client.send(new CreateBucketCommand({ Bucket }));
      } catch (e2) {
        // Someone else created it between our two calls: fine.
        if (statusOf(e2) !== 409) throw e2;
      }
    }
  })().catch((e) => {
    h.bucketReady = undefined;
    throw e;
  });
  return h.bucketReady;
}

async function guarded<T>(fn: () => Promise<T>): Promise<T> {
  try {
    await ensureBucket();
    return await fn();
  } catch (e) {
    // HTTP answers from the store (404 and the like) are real answers; anything else means unreachable.
    if (statusOf(e) !== undefined && statusOf(e)! < 500) throw e;
    throw new StorageUnavailableError(e);
  }
}

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  const { client, config } = state();
  await guarded(() =>
    client.send(
      new PutObjectCommand({ Bucket: config.S3_BUCKET, Key: key, Body: body, ContentType: contentType }),
    ),
  );
}

/** The object's bytes, or null when there is no such object. */
export async function getObject(key: string): Promise<Uint8Array | null> {
  const { client, config } = state();
  try {
    return await guarded(async () => {
      const res = await client.send(new GetObjectCommand({ Bucket: config.S3_BUCKET, Key: key }));
      return res.Body ? await res.Body.transformToByteArray() : new Uint8Array();
    });
  } catch (e) {
    if (statusOf(e) === 404) return null;
    throw e;
  }
}

export async function deleteObject(key: string): Promise<void> {
  const { client, config } = state();
  await guarded(() => client.send(new DeleteObjectCommand({ Bucket: config.S3_BUCKET, Key: key })));
}

export function bucketName(): string {
  return state().config.S3_BUCKET;
}

/** Forget the client (tests that change the endpoint). */
export function resetStorageClient(): void {
  holder.__baskwellS3?.client?.destroy();
  holder.__baskwellS3 = {};
}
