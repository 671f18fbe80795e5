import { describe, expect, it } from '@jest/globals';
import { readStorageConfig } from './storage.config';

describe('storage configuration', () => {
  it('should keep photos in the local folder unless told otherwise', () => {
    const config = readStorageConfig({ STORAGE_DIR: '/var/tmp/photos' });
    expect(config).toMatchObject({ driver: 'local', s3: null, dir: '/var/tmp/photos', gradingExpireSeconds: 300, queueMaintenanceSeconds: 120, imageThreads: 1 });
  });

  it('should take the libvips threads per image operation, 0 for one per core, and refuse a negative count', () => {
    expect(readStorageConfig({ IMAGE_THREADS: '0' }).imageThreads).toBe(0);
    expect(readStorageConfig({ IMAGE_THREADS: '4' }).imageThreads).toBe(4);
    expect(() => readStorageConfig({ IMAGE_THREADS: '-1' })).toThrow(/IMAGE_THREADS/);
  });

  it('should read an S3-compatible bucket with its endpoint, path style and keys', () => {
    const config = readStorageConfig({
      STORAGE_DRIVER: 's3',
      S3_BUCKET: 'photos',
      S3_ENDPOINT: 'http://127.0.0.1:9000',
      S3_FORCE_PATH_STYLE: 'true',
      S3_ACCESS_KEY_ID: 'id',
      S3_SECRET_ACCESS_KEY: 'secret',
    });
    expect(config.driver).toBe('s3');
    expect(config.s3).toEqual({ bucket: 'photos', region: 'us-east-1', endpoint: 'http://127.0.0.1:9000', forcePathStyle: true, accessKeyId: 'id', secretAccessKey: 'secret', prefix: '' });
  });

  it('should list what is missing for S3 in one error', () => {
    expect(() => readStorageConfig({ STORAGE_DRIVER: 's3', S3_ACCESS_KEY_ID: 'id', S3_ENDPOINT: 'not a url' })).toThrow(
      /S3_BUCKET must be set when STORAGE_DRIVER is s3[\s\S]*S3_ENDPOINT must be a URL[\s\S]*S3_SECRET_ACCESS_KEY must be set with S3_ACCESS_KEY_ID/,
    );
    expect(() => readStorageConfig({ STORAGE_DRIVER: 'ftp' })).toThrow('STORAGE_DRIVER must be "local" or "s3"');
  });
});
