// Types of scripts/fake-s3.mjs for TypeScript callers (tests).
export declare const FAKE_S3_DEFAULTS: { S3_ENDPOINT: string; S3_BUCKET: string; TEST_S3_ENDPOINT: string };
export declare function startFakeS3(options?: {
  endpoint?: string;
  bucket?: string;
  directory?: string;
}): Promise<{ endpoint: string; port: number; directory: string; close: () => Promise<void> }>;
