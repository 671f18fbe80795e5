import type { StorageConfig } from '../config/config.type';
import { LocalPhotoStorage } from './local-photo-storage';
import type { PhotoStorage } from './photo-storage';
import { S3PhotoStorage } from './s3-photo-storage';

/** The photo store the config asks for: the local folder (default) or an S3-compatible bucket. */
export function createPhotoStorage(config: StorageConfig): PhotoStorage {
  if (config.driver === 's3') {
    if (!config.s3) throw new Error('STORAGE_DRIVER=s3 needs S3_BUCKET');
    return S3PhotoStorage.fromConfig(config.s3);
  }
  return new LocalPhotoStorage(config.dir);
}
