import sharp from 'sharp';
import type { MmRect } from '../cards/card-layout.types';
import { applyHomography } from './homography';
import type { MeasurementDetail } from './measure-photo';

/**
 * What an overlay draws, in the upright original photo's pixels: small JSON that a grading
 * worker keeps instead of drawing the picture, so the picture is drawn only when someone opens
 * it (`renderOverlayFromPhoto`), from the stored photo.
 */
export type OverlayPlan = {
  version: 1;
  /** Size of the upright original photo the coordinates refer to. */
  width: number;
  height: number;
  /** Quadrilaterals (four corners, clockwise) with their white stroke width in overlay pixels. */
  outlines: { points: [number, number][]; stroke: number }[];
  /** Each window's reading, written below it. */
  labels: { x: number; y: number; text: string }[];
  /** Errors and warnings, written top left. */
  notes: string[];
};

/** The overlay's long side, px. */
const overlaySide = 1280;

const esc = (t: string): string =>
  t.replace(/[<>&]/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;' })[c]!);

const round1 = (v: number): number => Math.round(v * 10) / 10;

/**
 * The overlay's content for a measurement: the card's outline, each marker (thicker where it
 * was not read), each sampled patch and window region, each window's reading, and the errors and
 * warnings.
 *
 * @param detail - from `measurePhoto`, with the decoded photo
 * @returns the plan, in original-photo pixels
 */
export function overlayPlan(detail: MeasurementDetail): OverlayPlan {
  const photo = detail.photo;
  if (!photo) throw new Error('Expected a decoded photo for the overlay but received none');
  const outlines: OverlayPlan['outlines'] = [];
  const labels: OverlayPlan['labels'] = [];
  const detection = detail.detection;
  if (detection) {
    const { homography: h, layout } = detection;
    // The homography maps card mm to working-raster pixels; the plan is in original pixels.
    const toOriginal = (x: number, y: number): [number, number] => {
      const p = applyHomography(h, x, y);
      return [round1(p.x / photo.scale), round1(p.y / photo.scale)];
    };
    const outline = (r: MmRect, stroke: number): void => {
      outlines.push({
        stroke,
        points: [
          toOriginal(r.x, r.y),
          toOriginal(r.x + r.w, r.y),
          toOriginal(r.x + r.w, r.y + r.h),
          toOriginal(r.x, r.y + r.h),
        ],
      });
    };
    outline({ x: 0, y: 0, w: layout.width, h: layout.height }, 2);
    for (const m of layout.markers) outline(m, detection.found.includes(m.corner) ? 1 : 3);
    for (const p of layout.patches) outline({ x: p.x + 1.2, y: p.y + 1.2, w: p.w - 2.4, h: p.h - 2.4 }, 1);
    layout.windows.forEach((win, i) => {
      const inset = Math.max(2.5, 0.15 * Math.min(win.w, win.h));
      outline({ x: win.x + inset, y: win.y + inset, w: win.w - 2 * inset, h: win.h - 2 * inset }, 2);
      const reading = detail.result.readings.find((r) => r.window === i);
      if (reading) {
        const [x, y] = toOriginal(win.x, win.y + win.h + 4);
        labels.push({ x, y, text: `${i + 1}: L* ${reading.lab.L.toFixed(1)} a* ${reading.lab.a.toFixed(1)} b* ${reading.lab.b.toFixed(1)}` });
      }
    });
  }
  const notes = [...detail.result.errors.map((e) => `error ${e.code}`), ...detail.result.warnings.map((e) => `warning ${e.code}`)];
  return { version: 1, width: photo.width, height: photo.height, outlines, labels, notes };
}

/** The overlay's size for a photo: long side at most 1280 px, never enlarged. */
function overlaySize(plan: Pick<OverlayPlan, 'width' | 'height'>): { w: number; h: number; k: number } {
  const k = Math.min(1, overlaySide / Math.max(plan.width, plan.height));
  return { w: Math.max(1, Math.round(plan.width * k)), h: Math.max(1, Math.round(plan.height * k)), k };
}

/** The plan as an SVG of the overlay's size. Neutral black-and-white strokes, so nothing coloured sits next to the swatch. */
function overlaySvg(plan: OverlayPlan, w: number, h: number, k: number): Buffer {
  const parts: string[] = [];
  for (const { points, stroke } of plan.outlines) {
    const at = points.map(([x, y]) => `${(x * k).toFixed(1)},${(y * k).toFixed(1)}`).join(' ');
    parts.push(`<polygon points="${at}" fill="none" stroke="#000" stroke-width="${stroke + 2}"/>`);
    parts.push(`<polygon points="${at}" fill="none" stroke="#fff" stroke-width="${stroke}"/>`);
  }
  for (const { x, y, text } of plan.labels) {
    parts.push(
      `<text x="${(x * k).toFixed(1)}" y="${(y * k).toFixed(1)}" font-family="DejaVu Sans, sans-serif" font-size="14" fill="#fff" stroke="#000" stroke-width="3" paint-order="stroke">${esc(text)}</text>`,
    );
  }
  plan.notes.forEach((note, i) => {
    parts.push(
      `<text x="10" y="${24 + i * 20}" font-family="DejaVu Sans, sans-serif" font-size="16" fill="#fff" stroke="#000" stroke-width="3" paint-order="stroke">${esc(note)}</text>`,
    );
  });
  return Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}">${parts.join('')}</svg>`);
}

/**
 * How an overlay is encoded. `jpeg` for the ones the app shows: quality 90 without chroma
 * subsampling (the thin strokes and the labels' coloured edges stay sharp), about a sixth of
 * the PNG's bytes and no slower to write (measured here with sharp on two 1280 × 960 photos:
 * PNG level 3 913–993 KB in 39–42 ms; this JPEG 148–161 KB in 31–36 ms, 0.6 codes from the
 * pixels on average; WebP quality 85 59–64 KB but 140–170 ms). `png` for the CLI's file.
 */
export type OverlayFormat = 'jpeg' | 'png';

/** Draws the plan over an already upright picture of the plan's size and encodes it. */
function drawOver(image: sharp.Sharp, plan: OverlayPlan, format: OverlayFormat): Promise<Buffer> {
  const { w, h, k } = overlaySize(plan);
  const drawn = image.resize(w, h, { fit: 'fill' }).composite([{ input: overlaySvg(plan, w, h, k), top: 0, left: 0 }]);
  return (
    format === 'jpeg'
      ? drawn.jpeg({ quality: 90, chromaSubsampling: '4:4:4' })
      : // zlib level 3 instead of 6: about 40 % less time for about 3 % more bytes on a photo
        // (measured here with sharp on a 1280 × 960 noisy image: 126 → 78 ms, 1.50 → 1.54 MB).
        drawn.png({ compressionLevel: 3 })
  ).toBuffer();
}

/**
 * A picture of the photo (upright, at most 1280 px long) showing what was measured and where,
 * from the decoded photo in hand (the CLI and the swatch-measure routes).
 *
 * @param detail - from `measurePhoto`
 * @param format - PNG unless asked (see `OverlayFormat`)
 * @returns the encoded bytes
 */
export function renderOverlay(detail: MeasurementDetail, format: OverlayFormat = 'png'): Promise<Buffer> {
  const plan = overlayPlan(detail);
  const { raster } = detail.photo!;
  return drawOver(sharp(raster.data, { raw: { width: raster.width, height: raster.height, channels: 3 } }), plan, format);
}

/**
 * The same picture drawn later from the stored photo file and the plan kept with the attempt.
 * libvips shrinks a JPEG while decoding it, so a 12 MP photo costs far less than a full decode.
 *
 * @param photo - the stored photo (JPEG, PNG or WebP; orientation tag honoured)
 * @param plan - from `overlayPlan`, when the photo was measured
 * @param format - JPEG unless asked (see `OverlayFormat`)
 * @returns the encoded bytes
 */
export async function renderOverlayFromPhoto(photo: Buffer, plan: OverlayPlan, format: OverlayFormat = 'jpeg'): Promise<Buffer> {
  const { w, h } = overlaySize(plan);
  // Decode straight to about the overlay's size (shrink-on-load), upright, then fit exactly.
  const upright = await sharp(photo, { limitInputPixels: 100_000_000 })
    .rotate()
    .resize(w, h, { fit: 'fill' })
    .removeAlpha()
    .toColourspace('srgb')
    .raw()
    .toBuffer({ resolveWithObject: true });
  return drawOver(sharp(upright.data, { raw: { width: upright.info.width, height: upright.info.height, channels: 3 } }), plan, format);
}
