import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  Post,
  Put,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { paintSchema, type PaintInput } from '@mixmark/common';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
import {
  measureSwatchPhoto,
  swatchPhotoLimits,
  type MeasuredSwatches,
} from '../swatches/measure-swatch-photo';
import { PalettesService, type PaintView, type PaletteView } from './palettes.service';

/** The caller's own paints. */
@Controller('palette')
export class PalettesController {
  constructor(private readonly palettesService: PalettesService) {}

  @Get()
  findAll(@CurrentUser() caller: AuthUser): Promise<PaletteView> {
    return this.palettesService.findAll(caller);
  }

  @Post('paints')
  create(
    @CurrentUser() caller: AuthUser,
    @Body(new SchemaValidationPipe(paintSchema)) body: PaintInput,
  ): Promise<PaintView> {
    return this.palettesService.create(caller, body);
  }

  @Put('paints/:id')
  update(
    @CurrentUser() caller: AuthUser,
    @Param('id', parseId()) id: string,
    @Body(new SchemaValidationPipe(paintSchema)) body: PaintInput,
  ): Promise<PaintView> {
    return this.palettesService.update(caller, id, body);
  }

  /**
   * Reads a photo of a painted-out swatch of one of your paints under any Mixmark card, by the
   * grading pipeline, so the paint can carry its measured colour. Nothing is stored: the app puts
   * the reading in the paint's form for the person to save.
   */
  @Post('swatch/measure')
  @HttpCode(200)
  @UseInterceptors(FileInterceptor('photo', { limits: swatchPhotoLimits }))
  measureSwatch(@UploadedFile() file: Express.Multer.File | undefined): Promise<MeasuredSwatches> {
    return measureSwatchPhoto(file);
  }

  @Delete('paints/:id')
  @HttpCode(204)
  remove(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<void> {
    return this.palettesService.remove(caller, id);
  }
}
