import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { MulterModule } from '@nestjs/platform-express';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AssignmentsModule } from '../assignments/assignments.module';
import type { AllConfigType } from '../config/config.type';
import { DrillsModule } from '../drills/drills.module';
import { GradingModule } from '../grading/grading.module';
import { AttemptsController } from './attempts.controller';
import { AttemptsService } from './attempts.service';
import { Attempt } from './entities/attempt.entity';

@Module({
  imports: [
    TypeOrmModule.forFeature([Attempt]),
    // In memory: the photo is checked by its bytes before anything is written.
    MulterModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AllConfigType>) => ({
        limits: { fileSize: config.getOrThrow('storage.uploadMaxBytes', { infer: true }), files: 1, fields: 10 },
      }),
    }),
    AssignmentsModule,
    DrillsModule,
    GradingModule,
  ],
  controllers: [AttemptsController],
  providers: [AttemptsService],
})
export class AttemptsModule {}
