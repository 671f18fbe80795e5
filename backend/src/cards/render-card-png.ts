import sharp from 'sharp';
import type { CardLayout, MmRect } from './card-layout.types';
import { renderCardSvg } from './render-card-svg';

/** A rectangle in pixels of the PNG. */
export type PxRect = { x: number; y: number; w: number; h: number };

/** The `<file>.layout.json` written beside a card PNG: everything in pixels of that PNG. */
export type CardPngLayout = {
  dpi: number;
  width: number;
  height: number;
  windows: PxRect[];
  patches: {
    name: string;
    x: number;
    y: number;
    w: number;
    h: number;
    lab: { L: number; a: number; b: number };
  }[];
};

/**
 * A millimetre rectangle in pixels at `dpi`, edges rounded to the nearest pixel boundary
 * (so neighbouring rectangles share edges exactly).
 */
export function mmRectToPx(rect: MmRect, dpi: number): PxRect {
  const s = dpi / 25.4;
  const x0 = Math.round(rect.x * s);
  const y0 = Math.round(rect.y * s);
  return {
    x: x0,
    y: y0,
    w: Math.round((rect.x + rect.w) * s) - x0,
    h: Math.round((rect.y + rect.h) * s) - y0,
  };
}

/**
 * The card as an RGBA PNG at `dpi` with fully transparent windows (they are holes in the
 * card), and its layout in pixels.
 *
 * @param layout - the card layout
 * @param dpi - resolution, 50 to 1200
 * @returns `{ png, layout }`
 * @throws Error worded like sharp's when `dpi` is out of range
 * @example
 * const { png, layout: px } = await renderCardPng(buildCardLayout({ kind: 'match' }), 300);
 */
export async function renderCardPng(
  layout: CardLayout,
  dpi = 300,
): Promise<{ png: Buffer; layout: CardPngLayout }> {
  if (!Number.isInteger(dpi) || dpi < 50 || dpi > 1200) {
    throw new Error(`Expected integer between 50 and 1200 for dpi but received ${dpi}`);
  }
  const width = Math.round((layout.width * dpi) / 25.4);
  const height = Math.round((layout.height * dpi) / 25.4);
  // The SVG is sized in mm; librsvg converts mm at the given density and sharp then scales by
  // density / 72 again, so at 300 dpi it drew 4.2 times too large (60 MP, resized down) and from
  // about 450 dpi it exceeded the pixel limit. Sized in pixels at 72 dpi it draws the card
  // exactly once at the size asked for.
  const svg = renderCardSvg(layout).replace(
    `width="${layout.width}mm" height="${layout.height}mm"`,
    `width="${width}" height="${height}"`,
  );
  const { data, info } = await sharp(Buffer.from(svg), { density: 72 })
    .resize(width, height, { fit: 'fill' })
    .ensureAlpha()
    .raw()
    .toBuffer({ resolveWithObject: true });
  const windows = layout.windows.map((w) => mmRectToPx(w, dpi));
  for (const w of windows) {
    for (let y = w.y; y < w.y + w.h; y++) {
      for (let x = w.x; x < w.x + w.w; x++) {
        const i = (y * info.width + x) * 4;
        data[i] = 255;
        data[i + 1] = 255;
        data[i + 2] = 255;
        data[i + 3] = 0;
      }
    }
  }
  const png = await sharp(data, { raw: { width: info.width, height: info.height, channels: 4 } })
    .png({ compressionLevel: 6 })
    .toBuffer();
  return {
    png,
    layout: {
      dpi,
      width: info.width,
      height: info.height,
      windows,
      patches: layout.patches.map((p) => ({ name: p.name, ...mmRectToPx(p, dpi), lab: p.lab })),
    },
  };
}
