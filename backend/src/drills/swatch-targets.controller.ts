import { BadRequestException, Controller, Post, UnprocessableEntityException, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { labToHex, type Lab } from '@mixmark/common';
import { Roles } from '../common/decorators/roles.decorator';
import { measurePhoto } from '../measurement/measure-photo';

export interface MeasuredTargets {
  /** One reading per window of the card in the photo, in window order. */
  targets: { lab: Lab; hex: string; spread: { L: number; a: number; b: number } }[];
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
  @UseInterceptors(FileInterceptor('photo', { limits: { fileSize: 20 * 1024 * 1024, files: 1 } }))
  async measure(@UploadedFile() file: Express.Multer.File | undefined): Promise<MeasuredTargets> {
    if (!file || file.size === 0) {
      throw new BadRequestException({ code: 'photo_missing', message: 'Add a photo of your painted swatch with the card.', details: { photo: 'required' } });
    }
    const { result } = await measurePhoto(file.buffer);
    if (!result.ok || !result.card) {
      const first = result.errors[0];
      throw new UnprocessableEntityException({ code: first?.code ?? 'CARD_NOT_FOUND', message: first?.message ?? 'The card was not found in the photo.', details: { photo: first?.code ?? 'CARD_NOT_FOUND' } });
    }
    return {
      cardKind: result.card.kind,
      warnings: result.warnings,
      targets: [...result.readings]
        .sort((x, y) => x.window - y.window)
        .map((r) => ({ lab: r.lab, hex: labToHex(r.lab), spread: { L: r.spread.L, a: r.spread.a, b: r.spread.b } })),
    };
  }
}
