import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { CreateBucketCommand, HeadObjectCommand, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';
import { readStorageConfig } from '../config/storage.config';
import { createPhotoStorage } from './create-photo-storage';
import { S3PhotoStorage } from './s3-photo-storage';

/**
 * The S3 adapter against a local S3-compatible server (s3rver, an npm package; files in a temp
 * folder), through the real AWS SDK and HTTP, configured as the app would be from the environment.
 */
describe('S3PhotoStorage (against a local S3-compatible server)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'mixmark-s3-'));
  let server: S3rver;
  let endpoint: string;
  let storage: S3PhotoStorage;
  let client: S3Client;

  beforeAll(async () => {
    server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: dir });
    const { port } = await server.run();
    endpoint = `http://127.0.0.1:${port}`;
    // s3rver accepts any signature made with its fixed key pair.
    const env = { STORAGE_DRIVER: 's3', S3_ENDPOINT: endpoint, S3_BUCKET: 'mixmark-photos', S3_REGION: 'us-east-1', S3_FORCE_PATH_STYLE: 'true', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER', S3_PREFIX: 'tenant-a/' };
    const created = createPhotoStorage(readStorageConfig(env));
    expect(created).toBeInstanceOf(S3PhotoStorage);
    storage = created as S3PhotoStorage;
    client = new S3Client({ endpoint, region: 'us-east-1', forcePathStyle: true, credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } });
    await client.send(new CreateBucketCommand({ Bucket: 'mixmark-photos' }));
  });
  afterAll(async () => {
    storage.close();
    client.destroy();
    await server.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('should give back the very bytes that were put (a 4 MB photo), under the prefix with its type', async () => {
    const photo = randomBytes(4 * 1024 * 1024);
    await storage.put('attempts/one/photo.jpg', photo);
    const back = await storage.get('attempts/one/photo.jpg');
    expect(back?.equals(photo)).toBe(true);
    const head = await client.send(new HeadObjectCommand({ Bucket: 'mixmark-photos', Key: 'tenant-a/attempts/one/photo.jpg' }));
    expect(head).toMatchObject({ ContentType: 'image/jpeg', ContentLength: photo.length });
  });

  it('should replace an object put again under the same key', async () => {
    await storage.put('attempts/two/overlay.png', Buffer.from('first'));
    await storage.put('attempts/two/overlay.png', Buffer.from('second'));
    expect((await storage.get('attempts/two/overlay.png'))?.toString()).toBe('second');
  });

  it('should answer undefined for a key that holds nothing', async () => {
    expect(await storage.get('attempts/never/photo.jpg')).toBeUndefined();
  });

  it('should remove an object, and take the removal of a missing one quietly', async () => {
    await storage.put('attempts/three/photo.jpg', Buffer.from('bytes'));
    await storage.remove('attempts/three/photo.jpg');
    expect(await storage.get('attempts/three/photo.jpg')).toBeUndefined();
    await expect(storage.remove('attempts/three/photo.jpg')).resolves.toBeUndefined();
  });

  it('should fail loudly, not answer "missing", when the bucket does not exist', async () => {
    const wrong = S3PhotoStorage.fromConfig({ bucket: 'no-such-bucket', region: 'us-east-1', endpoint, forcePathStyle: true, accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER', prefix: '' });
    try {
      await expect(wrong.get('attempts/one/photo.jpg')).rejects.toMatchObject({ name: 'NoSuchBucket' });
    } finally {
      wrong.close();
    }
  });

  it('should refuse keys with empty, "." or ".." parts', async () => {
    for (const key of ['../outside.jpg', '/abs.jpg', 'a//b.jpg', 'a/./b.jpg']) {
      await expect(storage.put(key, Buffer.from('x'))).rejects.toThrow(`storage key must be a relative path without "." or ".." parts: ${key}`);
    }
  });
});
