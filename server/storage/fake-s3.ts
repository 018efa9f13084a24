/**
 * The in-process S3 fake for development and tests (s3rver, a devDependency): a loopback server on a random port
 * with the attachment bucket created. Data lives under .tmp/ (git-ignored). Never started in production use.
 */
import { rm } from 'node:fs/promises';
import path from 'node:path';
import S3rver from 's3rver';
import type { S3Settings } from '@/server/config';

export interface FakeS3 {
  /** The settings to use instead of the configured ones (endpoint of the fake, its credentials, the bucket). */
  settings: S3Settings;
  close(): Promise<void>;
}

/** Development data survives restarts here; tests pass their own throwaway folder. */
export const DEV_FAKE_S3_DIR = path.resolve(__dirname, '..', '..', '.tmp', 'fake-s3');

export async function startFakeS3(
  base: S3Settings,
  options: { directory?: string; removeOnClose?: boolean } = {},
): Promise<FakeS3> {
  const directory = options.directory ?? DEV_FAKE_S3_DIR;
  const server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory,
    configureBuckets: [{ name: base.bucket, configs: [] }],
  });
  const { port } = await server.run();
  return {
    // s3rver accepts only its own fixed credentials.
    settings: { ...base, endpoint: `http://127.0.0.1:${port}`, accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    async close() {
      await server.close();
      if (options.removeOnClose) await rm(directory, { recursive: true, force: true });
    },
  };
}
