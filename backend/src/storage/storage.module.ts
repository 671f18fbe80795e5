import { Global, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AllConfigType } from '../config/config.type';
import { LocalPhotoStorage } from './local-photo-storage';
import { PhotoStorage } from './photo-storage';

/** Inject `PhotoStorage`; the local folder store is bound here. */
@Global()
@Module({
  providers: [
    {
      provide: PhotoStorage,
      inject: [ConfigService],
      useFactory: (config: ConfigService<AllConfigType>) => new LocalPhotoStorage(config.getOrThrow('storage.dir', { infer: true })),
    },
  ],
  exports: [PhotoStorage],
})
export class StorageModule {}
