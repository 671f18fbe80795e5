import { Injectable } from '@nestjs/common';
import { buildCardLayout } from './card-layout';
import type { CardKind, CardLayout } from './card-layout.types';
import { renderCardPdf, type PaperSize } from './render-card-pdf';
import { renderCardPng, type CardPngLayout } from './render-card-png';

/** Card options as the API and the seed give them. */
export type CardRequest = { kind: CardKind; steps?: number; id?: string };

/** Reference cards for drills: layout, PDF for printing, PNG for screens. */
@Injectable()
export class CardsService {
  /** The card's layout data (mm). */
  layout(request: CardRequest): CardLayout {
    return buildCardLayout(request);
  }

  /** The printable PDF (true size). */
  pdf(request: CardRequest, paper: PaperSize = 'A4'): Promise<Buffer> {
    return renderCardPdf(buildCardLayout(request), paper);
  }

  /** The PNG with transparent windows, and its layout in pixels. */
  png(request: CardRequest, dpi = 300): Promise<{ png: Buffer; layout: CardPngLayout }> {
    return renderCardPng(buildCardLayout(request), dpi);
  }
}
