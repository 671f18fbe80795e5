import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Paint } from './entities/paint.entity';
import { PalettesController } from './palettes.controller';
import { PalettesService } from './palettes.service';

@Module({
  imports: [TypeOrmModule.forFeature([Paint])],
  controllers: [PalettesController],
  providers: [PalettesService],
})
export class PalettesModule {}
