// The file store the configuration asks for: DATA_DIR/files, or an S3-compatible bucket.
import type { AppConfig } from '../../config';
import { dataDirStorage } from './local-disk';
import { s3Storage } from './s3-storage';
import type { ListableStorage } from './storage';

export type StorageConfig = Pick<
  AppConfig,
  | 'STORAGE'
  | 'DATA_DIR'
  | 'S3_ENDPOINT'
  | 'S3_BUCKET'
  | 'S3_REGION'
  | 'S3_ACCESS_KEY_ID'
  | 'S3_SECRET_ACCESS_KEY'
  | 'S3_FORCE_PATH_STYLE'
>;

export function storageFromConfig(c: StorageConfig): ListableStorage {
  if (c.STORAGE === 'local') return dataDirStorage(c.DATA_DIR);
  if (!c.S3_BUCKET) throw new Error('Invalid configuration:\n  S3_BUCKET: is required when STORAGE=s3');
  const credentials =
    c.S3_ACCESS_KEY_ID && c.S3_SECRET_ACCESS_KEY
      ? { accessKeyId: c.S3_ACCESS_KEY_ID, secretAccessKey: c.S3_SECRET_ACCESS_KEY }
      : undefined;
  return s3Storage({
    bucket: c.S3_BUCKET,
    region: c.S3_REGION,
    endpoint: c.S3_ENDPOINT,
    forcePathStyle: c.S3_FORCE_PATH_STYLE,
    credentials,
  });
}
