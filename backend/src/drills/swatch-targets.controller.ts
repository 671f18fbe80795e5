import { Controller, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { Roles } from '../common/decorators/roles.decorator';
import {
  measureSwatchPhoto,
  swatchPhotoLimits,
  type MeasuredSwatch,
} from '../swatches/measure-swatch-photo';

export interface MeasuredTargets {
  /** One reading per window of the card in the photo, in window order. */
  targets: MeasuredSwatch[];
  cardKind: string;
  warnings: { code: string; message: string }[];
}

/**
 * Targets from the teacher's own painted swatch: a photo of it through any Mixmark card,
 * measured by the same pipeline as students' attempts. Nothing is stored.
 */
@Controller('drills/targets')
export class SwatchTargetsController {
  @Roles('teacher')
  @Post('measure')
  @UseInterceptors(FileInterceptor('photo', { limits: swatchPhotoLimits }))
  async measure(@UploadedFile() file: Express.Multer.File | undefined): Promise<MeasuredTargets> {
    const { cardKind, warnings, swatches } = await measureSwatchPhoto(file);
    return { cardKind, warnings, targets: swatches };
  }
}
