/**
 * The attachment store: S3 through the AWS SDK (any S3-compatible service, or the local fake in development and
 * tests). Objects are written by the server and read by the browser through short-lived presigned GET links.
 */
import { DeleteObjectsCommand, GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import type { S3Settings } from '@/server/config';

/** How long a download or thumbnail link works (common practice: minutes, not hours). */
export const LINK_LIFETIME_S = 5 * 60;

export interface LinkOptions {
  /** Shown by the browser as the saved file's name. */
  fileName: string;
  contentType: string;
}

export interface ObjectStore {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** Removes the objects; missing keys are not an error. */
  remove(keys: readonly string[]): Promise<void>;
  /** A presigned GET link valid for LINK_LIFETIME_S seconds. */
  link(key: string, options: LinkOptions): Promise<string>;
}

export function createS3Client(s3: S3Settings): S3Client {
  return new S3Client({
    region: s3.region,
    endpoint: s3.endpoint,
    // Custom endpoints (the fake, MinIO and the like) want bucket-in-path URLs.
    forcePathStyle: s3.endpoint !== undefined,
    credentials: { accessKeyId: s3.accessKeyId, secretAccessKey: s3.secretAccessKey },
    // STACK.md pitfall 8: the default checksum framing ends up inside objects stored by the fake.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

/** RFC 6266 Content-Disposition with an ASCII fallback and the exact UTF-8 name. */
export function contentDisposition(fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return `inline; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}

export function createObjectStore(s3: S3Settings, client: S3Client = createS3Client(s3)): ObjectStore {
  const Bucket = s3.bucket;
  return {
    async put(key, body, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }));
    },
    async remove(keys) {
      if (keys.length === 0) return;
      await client.send(new DeleteObjectsCommand({ Bucket, Delete: { Objects: keys.map((Key) => ({ Key })), Quiet: true } }));
    },
    link(key, { fileName, contentType }) {
      const command = new GetObjectCommand({
        Bucket,
        Key: key,
        ResponseContentType: contentType,
        ResponseContentDisposition: contentDisposition(fileName),
      });
      return getSignedUrl(client, command, { expiresIn: LINK_LIFETIME_S });
    },
  };
}

/**
 * The origin presigned links point at, for the page's Content-Security-Policy `img-src` (thumbnails are shown
 * straight from the store): the custom endpoint's origin, or the bucket's virtual-hosted AWS origin.
 */
export function storageOrigin(s3: S3Settings): string {
  return s3.endpoint ? new URL(s3.endpoint).origin : `https://${s3.bucket}.s3.${s3.region}.amazonaws.com`;
}
