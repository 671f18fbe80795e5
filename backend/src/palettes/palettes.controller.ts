import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put } from '@nestjs/common';
import { paintSchema, type PaintInput } from '@mixmark/common';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { SchemaValidationPipe } from '../common/pipes/schema-validation.pipe';
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
  create(@CurrentUser() caller: AuthUser, @Body(new SchemaValidationPipe(paintSchema)) body: PaintInput): Promise<PaintView> {
    return this.palettesService.create(caller, body);
  }

  @Put('paints/:id')
  update(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string, @Body(new SchemaValidationPipe(paintSchema)) body: PaintInput): Promise<PaintView> {
    return this.palettesService.update(caller, id, body);
  }

  @Delete('paints/:id')
  @HttpCode(204)
  remove(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string): Promise<void> {
    return this.palettesService.remove(caller, id);
  }
}
