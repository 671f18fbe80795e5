import {
  BadRequestException,
  PayloadTooLargeException,
  UnprocessableEntityException,
  UnsupportedMediaTypeException,
  type HttpException,
} from '@nestjs/common';
import { labToHex, type Lab } from '@mixmark/common';
import { sniffImageType } from '../measurement/decode-photo';
import { measurePhoto } from '../measurement/measure-photo';

/** One window of the card as measured: CIELAB (D65), its hex for screens, and the spread inside. */
export interface MeasuredSwatch {
  lab: Lab;
  hex: string;
  spread: { L: number; a: number; b: number };
}

/** A photo of someone's own painted swatch(es) through a Mixmark card, read by the grading pipeline. */
export interface MeasuredSwatches {
  /** The kind of card found in the photo (its windows decide how many readings there are). */
  cardKind: string;
  /** One reading per window, in window order. */
  swatches: MeasuredSwatch[];
  /** Milder problems worth a retake when accuracy matters (each a code and a sentence). */
  warnings: { code: string; message: string }[];
}

/** Upload limit for a swatch photo (the same as for attempts; issue 5). */
export const swatchPhotoLimits = { fileSize: 20 * 1024 * 1024, files: 1 };

const fileCodes = new Set(['FILE_TOO_LARGE', 'FILE_UNSUPPORTED', 'FILE_UNREADABLE']);

/**
 * The HTTP answer for a photo file that cannot be measured: 413 when too large; 415 when the
 * bytes are not a JPEG, PNG or WebP at all; 400 when one of those is broken.
 */
export function photoFileHttpError(code: string, message: string, bytes: Buffer): HttpException {
  const body = { code, message, details: { photo: code } };
  if (code === 'FILE_TOO_LARGE') return new PayloadTooLargeException(body);
  const type = sniffImageType(bytes);
  if (code === 'FILE_UNSUPPORTED' || !type || !['jpeg', 'png', 'webp'].includes(type)) {
    return new UnsupportedMediaTypeException(body);
  }
  return new BadRequestException(body);
}

/**
 * Measures a photo of a painted swatch laid under a Mixmark card, by the same pipeline as
 * students' attempts. Nothing is stored.
 *
 * @throws BadRequestException `photo_missing` when no file came
 * @throws PayloadTooLarge / UnsupportedMediaType / BadRequest for files that are not photos we read
 * @throws UnprocessableEntityException with the first quality code, every problem's sentence in
 *   the message (so a person fixes them all in one retake)
 */
export async function measureSwatchPhoto(
  file: Express.Multer.File | undefined,
): Promise<MeasuredSwatches> {
  if (!file || file.size === 0) {
    throw new BadRequestException({
      code: 'photo_missing',
      message: 'Add a photo of your painted swatch under the card.',
      details: { photo: 'required' },
    });
  }
  const { result } = await measurePhoto(file.buffer);
  const [first] = result.errors;
  if (first && fileCodes.has(first.code))
    throw photoFileHttpError(first.code, first.message, file.buffer);
  if (!result.ok || !result.card) {
    const code = first?.code ?? 'CARD_NOT_FOUND';
    const message = result.errors.length
      ? result.errors.map((e) => e.message).join(' ')
      : 'The card was not found in the photo.';
    throw new UnprocessableEntityException({ code, message, details: { photo: code } });
  }
  return {
    cardKind: result.card.kind,
    warnings: result.warnings,
    swatches: [...result.readings]
      .sort((x, y) => x.window - y.window)
      .map((r) => ({
        lab: r.lab,
        hex: labToHex(r.lab),
        spread: { L: r.spread.L, a: r.spread.a, b: r.spread.b },
      })),
  };
}
