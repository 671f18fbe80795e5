import { Global, Inject, Module, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AllConfigType } from '../config/config.type';
import { createPhotoStorage } from './create-photo-storage';
import { PhotoStorage } from './photo-storage';
import { S3PhotoStorage } from './s3-photo-storage';

/**
 * Inject `PhotoStorage`: the local folder store by default, an S3-compatible bucket with
 * `STORAGE_DRIVER=s3` (see `config/storage.config.ts`).
 */
@Global()
@Module({
  providers: [
    {
      provide: PhotoStorage,
      inject: [ConfigService],
      useFactory: (config: ConfigService<AllConfigType>) => createPhotoStorage(config.getOrThrow('storage', { infer: true })),
    },
  ],
  exports: [PhotoStorage],
})
export class StorageModule implements OnApplicationShutdown {
  constructor(@Inject(PhotoStorage) private readonly storage: PhotoStorage) {}

  onApplicationShutdown(): void {
    if (this.storage instanceof S3PhotoStorage) this.storage.close();
  }
}
