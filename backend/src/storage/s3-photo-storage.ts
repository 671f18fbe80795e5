import {
  DeleteObjectCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import type { S3StorageConfig } from '../config/config.type';
import { PhotoStorage } from './photo-storage';

const contentTypes: Record<string, string> = { jpg: 'image/jpeg', jpeg: 'image/jpeg', png: 'image/png', webp: 'image/webp' };

/**
 * Photos in an S3-compatible bucket (AWS S3, or any store speaking its API: set `endpoint` and,
 * for most self-hosted stores, `forcePathStyle`). Keys are the same relative paths the local store
 * uses, under an optional prefix. Credentials come from the config or, when left out, from the
 * SDK's usual chain (environment, shared files, instance role).
 */
export class S3PhotoStorage extends PhotoStorage {
  constructor(
    private readonly client: S3Client,
    private readonly bucket: string,
    private readonly prefix = '',
  ) {
    super();
  }

  static fromConfig(config: S3StorageConfig): S3PhotoStorage {
    const client = new S3Client({
      region: config.region,
      endpoint: config.endpoint ?? undefined,
      forcePathStyle: config.forcePathStyle,
      credentials:
        config.accessKeyId && config.secretAccessKey
          ? { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey }
          : undefined,
      maxAttempts: 3,
    });
    return new S3PhotoStorage(client, config.bucket, config.prefix);
  }

  async put(key: string, bytes: Buffer): Promise<void> {
    // One PUT is atomic in S3: a reader sees the old object, the new one, or none, never half.
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.bucket,
        Key: this.objectKey(key),
        Body: bytes,
        ContentLength: bytes.length,
        ContentType: contentTypes[key.split('.').pop()?.toLowerCase() ?? ''] ?? 'application/octet-stream',
      }),
    );
  }

  async get(key: string): Promise<Buffer | undefined> {
    try {
      const object = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }));
      if (!object.Body) return undefined;
      return Buffer.from(await object.Body.transformToByteArray());
    } catch (error) {
      if (error instanceof NoSuchKey) return undefined;
      if (error instanceof S3ServiceException && error.$metadata.httpStatusCode === 404 && error.name !== 'NoSuchBucket') return undefined;
      throw error;
    }
  }

  async remove(key: string): Promise<void> {
    // Deleting a key that is not there succeeds in S3, as `rm -f` does for the local store.
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }));
  }

  /** Closes the client's sockets (on shutdown). */
  close(): void {
    this.client.destroy();
  }

  private objectKey(key: string): string {
    if (!key || key.startsWith('/') || key.split('/').some((part) => part === '..' || part === '.' || part === '')) {
      throw new Error(`storage key must be a relative path without "." or ".." parts: ${key}`);
    }
    return this.prefix ? `${this.prefix.replace(/\/+$/, '')}/${key}` : key;
  }
}
