import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from '@jest/globals';
import { LocalPhotoStorage } from './local-photo-storage';

describe('LocalPhotoStorage', () => {
  const root = mkdtempSync(join(tmpdir(), 'mixmark-store-'));
  const storage = new LocalPhotoStorage(root);
  afterAll(() => rmSync(root, { recursive: true, force: true }));

  it('should give back what was put, and nothing after removal', async () => {
    await storage.put('attempts/a/photo.jpg', Buffer.from('jpeg bytes'));
    expect((await storage.get('attempts/a/photo.jpg'))?.toString()).toBe('jpeg bytes');
    await storage.remove('attempts/a/photo.jpg');
    expect(await storage.get('attempts/a/photo.jpg')).toBeUndefined();
  });

  it('should refuse a key that climbs out of the store', async () => {
    await expect(storage.put('../outside.jpg', Buffer.from('x'))).rejects.toThrow('storage key escapes the store');
  });
});
