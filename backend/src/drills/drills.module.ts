import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DrillsController } from './drills.controller';
import { DrillsService } from './drills.service';
import { Drill } from './entities/drill.entity';
import { SwatchTargetsController } from './swatch-targets.controller';

@Module({
  imports: [TypeOrmModule.forFeature([Drill])],
  // The swatch route comes first so that 'targets' is not read as a drill id.
  controllers: [SwatchTargetsController, DrillsController],
  providers: [DrillsService],
  exports: [DrillsService],
})
export class DrillsModule {}
