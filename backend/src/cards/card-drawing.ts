import { linearChannelToSrgb } from '@mixmark/common';
import QRCode from 'qrcode';
import type { CardLayout, MmRect } from './card-layout.types';

/** One thing to draw, in millimetres; the SVG and PDF renderers draw the same list. */
export type CardPrimitive =
  | { type: 'rect'; rect: MmRect; grey: number }
  | { type: 'modules'; rect: MmRect; size: number; dark: boolean[] }
  | { type: 'cut'; rect: MmRect; dashed: boolean }
  | { type: 'bar'; rect: MmRect }
  | { type: 'text'; x: number; y: number; size: number; text: string };

/** The 8-bit sRGB grey whose linear value is `Y` (IEC 61966-2-1 encoding). */
export const greyLevel8 = (Y: number): number => Math.round(255 * linearChannelToSrgb(Y));

/** Offset of the dashed cut line outside each window (mm), so a slightly rough cut leaves
 * the window's own edge clean. */
const cutOffset = 0.3;

/**
 * The drawing of a card: patches, QR modules (ISO/IEC 18004 version 2, error correction M),
 * cut lines, scale bar and texts, in millimetres. Paper white is not drawn.
 *
 * @param layout - the card layout
 * @returns primitives in drawing order
 * @example
 * cardPrimitives(buildCardLayout({ kind: 'match' })).length;
 */
export function cardPrimitives(layout: CardLayout): CardPrimitive[] {
  const out: CardPrimitive[] = [];
  out.push({
    type: 'cut',
    rect: { x: 0.15, y: 0.15, w: layout.width - 0.3, h: layout.height - 0.3 },
    dashed: false,
  });
  for (const patch of layout.patches) {
    if (patch.Y < 1) out.push({ type: 'rect', rect: patch, grey: greyLevel8(patch.Y) });
  }
  for (const marker of layout.markers) {
    const qr = QRCode.create(marker.payload, { version: 2, errorCorrectionLevel: 'M' });
    const size = qr.modules.size;
    const dark = Array.from({ length: size * size }, (_, i) => qr.modules.data[i] === 1);
    out.push({ type: 'modules', rect: marker, size, dark });
  }
  for (const w of layout.windows) {
    out.push({
      type: 'cut',
      rect: {
        x: w.x - cutOffset,
        y: w.y - cutOffset,
        w: w.w + 2 * cutOffset,
        h: w.h + 2 * cutOffset,
      },
      dashed: true,
    });
  }
  out.push({ type: 'bar', rect: layout.scaleBar });
  for (const t of layout.texts) out.push({ type: 'text', ...t });
  return out;
}
