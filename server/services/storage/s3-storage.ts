// FileStorage on an S3-compatible object store: one bucket shared by every app instance, so a
// photo uploaded through one instance is served by any other. Keys are the same server-made keys
// the local disk uses; the bucket stays private (the files route still checks who may read).
import {
  DeleteObjectCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { assertStorageKey, type ListableStorage } from './storage';

export interface S3StorageOptions {
  bucket: string;
  region: string;
  /** Omit for AWS itself; set for any other S3-compatible store. */
  endpoint?: string;
  forcePathStyle: boolean;
  /** Omit to use the SDK's own chain (environment, instance role). */
  credentials?: { accessKeyId: string; secretAccessKey: string };
}

const NOT_FOUND_STATUS = 404;

const isMissing = (err: unknown) =>
  err instanceof NoSuchKey || (err instanceof S3ServiceException && err.$metadata.httpStatusCode === NOT_FOUND_STATUS);

/** Stored names are content-hashed or made once, so a year's caching is safe for every object. */
const IMMUTABLE = 'private, max-age=31536000, immutable';

export function s3Storage(opts: S3StorageOptions): ListableStorage {
  const client = new S3Client({
    region: opts.region,
    endpoint: opts.endpoint,
    forcePathStyle: opts.forcePathStyle,
    credentials: opts.credentials,
    // Checksums only where the API insists: several S3-compatible stores reject the newer
    // default trailing checksums.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = opts.bucket;
  return {
    async put(key, buffer) {
      assertStorageKey(key);
      // A PUT replaces the object whole or not at all: a reader never sees half a file.
      await client.send(
        new PutObjectCommand({ Bucket, Key: key, Body: buffer, ContentLength: buffer.length, CacheControl: IMMUTABLE }),
      );
    },
    async get(key) {
      assertStorageKey(key);
      try {
        const out = await client.send(new GetObjectCommand({ Bucket, Key: key }));
        if (!out.Body) return null;
        return Buffer.from(await out.Body.transformToByteArray());
      } catch (err) {
        if (isMissing(err)) return null;
        throw err;
      }
    },
    async delete(key) {
      assertStorageKey(key);
      // S3 answers a delete of a missing key with success, as the interface wants.
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    async *keys() {
      let token: string | undefined;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket, ContinuationToken: token }));
        for (const o of page.Contents ?? []) if (o.Key) yield o.Key;
        token = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (token);
    },
  };
}
