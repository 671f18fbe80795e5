import { Module } from '@nestjs/common';
import { GradingQueue } from './grading-queue.service';
import { GradingService } from './grading.service';

@Module({
  providers: [GradingService, GradingQueue],
  exports: [GradingQueue, GradingService],
})
export class GradingModule {}
