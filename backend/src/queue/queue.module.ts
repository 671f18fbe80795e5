import { Global, Module } from '@nestjs/common';
import { QueueService } from './queue.service';

/** The PostgreSQL job queue (pg-boss) every feature shares: inject `QueueService`. */
@Global()
@Module({
  providers: [QueueService],
  exports: [QueueService],
})
export class QueueModule {}
