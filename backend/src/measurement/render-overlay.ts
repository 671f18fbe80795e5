import sharp from 'sharp';
import type { MmRect } from '../cards/card-layout.types';
import { applyHomography } from './homography';
import type { MeasurementDetail } from './measure-photo';

const esc = (t: string): string =>
  t.replace(/[<>&]/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;' })[c]!);

/**
 * A PNG of the photo (upright, at most 1280 px long) showing what was measured and where:
 * the card's outline, each sampled patch and window region, each window's reading, and the
 * errors and warnings. Neutral black-and-white strokes, so nothing coloured sits next to the
 * swatch.
 *
 * @param detail - from `measurePhoto`
 * @returns PNG bytes
 */
export async function renderOverlay(detail: MeasurementDetail): Promise<Buffer> {
  const photo = detail.photo;
  if (!photo) throw new Error('Expected a decoded photo for the overlay but received none');
  const { raster } = photo;
  const k = Math.min(1, 1280 / Math.max(raster.width, raster.height));
  const w = Math.round(raster.width * k);
  const hgt = Math.round(raster.height * k);
  const parts: string[] = [];
  const detection = detail.detection;
  if (detection) {
    const { homography: h, layout } = detection;
    const poly = (r: MmRect): string =>
      [
        [r.x, r.y],
        [r.x + r.w, r.y],
        [r.x + r.w, r.y + r.h],
        [r.x, r.y + r.h],
      ]
        .map(([x, y]) => applyHomography(h, x, y))
        .map((p) => `${(p.x * k).toFixed(1)},${(p.y * k).toFixed(1)}`)
        .join(' ');
    const stroke = (r: MmRect, width: number): void => {
      parts.push(
        `<polygon points="${poly(r)}" fill="none" stroke="#000" stroke-width="${width + 2}"/>`,
      );
      parts.push(
        `<polygon points="${poly(r)}" fill="none" stroke="#fff" stroke-width="${width}"/>`,
      );
    };
    stroke({ x: 0, y: 0, w: layout.width, h: layout.height }, 2);
    for (const m of layout.markers) stroke(m, detection.found.includes(m.corner) ? 1 : 3);
    for (const p of layout.patches)
      stroke({ x: p.x + 1.2, y: p.y + 1.2, w: p.w - 2.4, h: p.h - 2.4 }, 1);
    layout.windows.forEach((win, i) => {
      const inset = Math.max(2.5, 0.15 * Math.min(win.w, win.h));
      stroke({ x: win.x + inset, y: win.y + inset, w: win.w - 2 * inset, h: win.h - 2 * inset }, 2);
      const reading = detail.result.readings.find((r) => r.window === i);
      if (reading) {
        const at = applyHomography(h, win.x, win.y + win.h + 4);
        const text = `${i + 1}: L* ${reading.lab.L.toFixed(1)} a* ${reading.lab.a.toFixed(1)} b* ${reading.lab.b.toFixed(1)}`;
        parts.push(
          `<text x="${(at.x * k).toFixed(1)}" y="${(at.y * k).toFixed(1)}" font-family="DejaVu Sans, sans-serif" font-size="14" fill="#fff" stroke="#000" stroke-width="3" paint-order="stroke">${esc(text)}</text>`,
        );
      }
    });
  }
  const notes = [
    ...detail.result.errors.map((e) => `error ${e.code}`),
    ...detail.result.warnings.map((e) => `warning ${e.code}`),
  ];
  notes.forEach((note, i) => {
    parts.push(
      `<text x="10" y="${24 + i * 20}" font-family="DejaVu Sans, sans-serif" font-size="16" fill="#fff" stroke="#000" stroke-width="3" paint-order="stroke">${esc(note)}</text>`,
    );
  });
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${hgt}">${parts.join('')}</svg>`;
  return sharp(raster.data, { raw: { width: raster.width, height: raster.height, channels: 3 } })
    .resize(w, hgt)
    .composite([{ input: Buffer.from(svg), top: 0, left: 0 }])
    // zlib level 3 instead of 6: about 40 % less time for about 3 % more bytes on a photo
    // (measured here with sharp on a 1280 × 960 noisy image: 126 → 78 ms, 1.50 → 1.54 MB).
    .png({ compressionLevel: 3 })
    .toBuffer();
}
