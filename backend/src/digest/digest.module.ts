import { Module } from '@nestjs/common';
import { AssignmentsModule } from '../assignments/assignments.module';
import { ClassesModule } from '../classes/classes.module';
import { ProgressModule } from '../progress/progress.module';
import { DigestQueue } from './digest-queue.service';
import { WeeklyDigestService } from './weekly-digest.service';

/** The weekly progress digest e-mail: its content, the once-a-week guarantee and its schedule. */
@Module({
  imports: [ProgressModule, AssignmentsModule, ClassesModule],
  providers: [WeeklyDigestService, DigestQueue],
  exports: [WeeklyDigestService, DigestQueue],
})
export class DigestModule {}
