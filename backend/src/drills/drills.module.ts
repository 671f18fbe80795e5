import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DrillsController } from './drills.controller';
import { DrillsService } from './drills.service';
import { Drill } from './entities/drill.entity';

@Module({
  imports: [TypeOrmModule.forFeature([Drill])],
  controllers: [DrillsController],
  providers: [DrillsService],
  exports: [DrillsService],
})
export class DrillsModule {}
