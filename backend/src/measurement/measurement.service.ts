import { Injectable } from '@nestjs/common';
import { sanitisePhoto, type PhotoLimits } from './decode-photo';
import { measurePhoto, type MeasurementDetail, type MeasurementResult } from './measure-photo';
import { renderOverlay } from './render-overlay';

/** Photo measurement for the attempts module and the workers (no HTTP in here). */
@Injectable()
export class MeasurementService {
  /**
   * Measures a photo of a reference card. Never throws for a bad photo: problems come back
   * as `errors` with stable codes.
   */
  async measure(bytes: Buffer, limits?: PhotoLimits): Promise<MeasurementResult> {
    return (await measurePhoto(bytes, { limits })).result;
  }

  /** Measures and also draws the overlay PNG (undefined when the file could not be decoded). */
  async measureWithOverlay(
    bytes: Buffer,
    limits?: PhotoLimits,
  ): Promise<{ result: MeasurementResult; overlay?: Buffer }> {
    const detail: MeasurementDetail = await measurePhoto(bytes, { limits });
    return {
      result: detail.result,
      overlay: detail.photo ? await renderOverlay(detail) : undefined,
    };
  }

  /** The copy to store: upright JPEG with all metadata (GPS included) removed. */
  sanitise(bytes: Buffer, limits?: PhotoLimits): Promise<Buffer> {
    return sanitisePhoto(bytes, limits);
  }
}
