import { describe, expect, it } from '@jest/globals';
import jsQR from 'jsqr';
import sharp from 'sharp';
import { buildCardLayout } from './card-layout';
import { cardKinds } from './card-kinds';
import type { MmRect } from './card-layout.types';
import { decodeCardPayload } from './card-payload';
import { renderCardPdf } from './render-card-pdf';
import { renderCardPng } from './render-card-png';

const overlaps = (a: MmRect, b: MmRect, margin = 0): boolean =>
  a.x < b.x + b.w + margin &&
  b.x < a.x + a.w + margin &&
  a.y < b.y + b.h + margin &&
  b.y < a.y + a.h + margin;

describe('buildCardLayout', () => {
  const layouts = [
    ...cardKinds.filter((k) => k !== 'value-ladder').map((kind) => buildCardLayout({ kind })),
    ...[2, 3, 4, 5, 6, 7, 8, 9].map((steps) => buildCardLayout({ kind: 'value-ladder', steps })),
    // Version 1, as cards printed before v2 carry it.
    buildCardLayout({ kind: 'match', version: 1 }),
    buildCardLayout({ kind: 'value-ladder', steps: 9, version: 1 }),
  ];

  it.each(layouts.map((l) => [`${l.kind}/${l.steps} v${l.version}`, l] as const))(
    '%s: windows fit and keep clear',
    (_, layout) => {
      expect(layout.windows).toHaveLength(layout.steps);
      for (const w of layout.windows) {
        // "about 2–3 cm" swatches (issue 4): the short side is at least 19 mm.
        expect(Math.min(w.w, w.h)).toBeGreaterThanOrEqual(19);
        expect(w.x).toBeGreaterThan(0);
        expect(w.x + w.w).toBeLessThan(layout.width);
        // QR quiet zone of 4 modules (ISO/IEC 18004 §6.3.8) around every marker.
        for (const m of layout.markers) expect(overlaps(w, m, (4 * m.w) / m.modules)).toBe(false);
        for (const p of layout.patches) expect(overlaps(w, p, 2)).toBe(false);
      }
      for (const p of layout.patches) {
        for (const m of layout.markers) expect(overlaps(p, m, (4 * m.w) / m.modules)).toBe(false);
        // Big enough to sample 8 mm clear of its edges.
        expect(Math.min(p.w, p.h)).toBeGreaterThanOrEqual(10.5);
      }
      for (let i = 0; i < layout.patches.length; i++) {
        for (let j = i + 1; j < layout.patches.length; j++) {
          expect(overlaps(layout.patches[i], layout.patches[j])).toBe(false);
        }
      }
      for (let i = 0; i < layout.windows.length; i++) {
        for (let j = i + 1; j < layout.windows.length; j++) {
          expect(overlaps(layout.windows[i], layout.windows[j], 3)).toBe(false);
        }
      }
    },
  );

  it.each([1, 2])(
    'v%i has a ramp from paper to near black with the nominal 18 % grey, and mid-greys on opposite sides',
    (version) => {
      const layout = buildCardLayout({ kind: 'match', version });
      const ramp = layout.patches.filter((p) => p.role === 'ramp');
      expect(ramp[0].Y).toBe(1);
      // The nominal 18 % grey, as the nearest 8-bit sRGB level (118) carries it.
      expect(ramp.some((p) => Math.abs(p.Y - 0.18) < 0.002)).toBe(true);
      expect(ramp.at(-1)!.lab.L).toBeLessThanOrEqual(20);
      for (let i = 1; i < ramp.length; i++) expect(ramp[i].Y).toBeLessThan(ramp[i - 1].Y);
      const greys = layout.patches.filter((p) => p.role === 'grey');
      const w = layout.windows[0];
      expect(greys.some((g) => g.x + g.w < w.x) && greys.some((g) => g.x > w.x + w.w)).toBe(true);
      expect(ramp).toHaveLength(version === 1 ? 9 : 18);
      expect(layout.markers[0].payload.startsWith(`MXM${version}/`)).toBe(true);
      // v1 prints its mid-greys all at 18 %; v2 each at its own 8-bit level, none the ramp's.
      const levels = new Set(greys.map((g) => g.Y));
      expect(levels.size).toBe(version === 1 ? 1 : 3);
      if (version === 2) for (const g of greys) expect(ramp.some((p) => p.Y === g.Y)).toBe(false);
    },
  );

  it('rejects a layout version it does not know', () => {
    expect(() => buildCardLayout({ kind: 'match', version: 3 })).toThrow(
      'Expected one of 1, 2 for version but received 3',
    );
  });

  it('rejects step counts the way sharp words parameter errors', () => {
    expect(() => buildCardLayout({ kind: 'value-ladder', steps: 12 })).toThrow(
      'Expected integer between 2 and 9 for steps but received 12',
    );
    expect(() => buildCardLayout({ kind: 'match', steps: 3 })).toThrow(/Expected 1 for steps/);
  });
});

describe('renderCardPng', () => {
  it.each([600, 1200])('draws the card at %i dpi, true size, where it once exceeded the pixel limit', async (dpi) => {
    const layout = buildCardLayout({ kind: 'graded-wash' });
    const { png, layout: px } = await renderCardPng(layout, dpi);
    const info = await sharp(png).metadata();
    expect([info.width, info.height]).toEqual([Math.round((layout.width / 25.4) * dpi), Math.round((layout.height / 25.4) * dpi)]);
    expect([px.width, px.height]).toEqual([info.width, info.height]);
  });

  it('makes the windows fully transparent and the markers readable', async () => {
    const layout = buildCardLayout({ kind: 'temperature-pair' });
    const { png, layout: px } = await renderCardPng(layout, 150);
    const { data, info } = await sharp(png).raw().toBuffer({ resolveWithObject: true });
    expect([info.width, info.height, info.channels]).toEqual([px.width, px.height, 4]);
    // True size: 190 mm at 150 dpi is 1122 px.
    expect(px.width).toBe(Math.round((190 / 25.4) * 150));
    for (const w of px.windows) {
      let transparent = 0;
      for (let y = w.y; y < w.y + w.h; y++) {
        for (let x = w.x; x < w.x + w.w; x++)
          if (data[(y * info.width + x) * 4 + 3] === 0) transparent++;
      }
      expect(transparent).toBe(w.w * w.h);
    }
    expect(data[((px.windows[0].y - 3) * info.width + px.windows[0].x) * 4 + 3]).toBe(255);
    const grey = px.patches.find((p) => p.name === 'grey-left')!;
    const centre = ((grey.y + (grey.h >> 1)) * info.width + grey.x + (grey.w >> 1)) * 4;
    // Layout v2 prints grey-left at L* 47.5: Y 0.1641, 8-bit sRGB 113 (IEC 61966-2-1).
    expect(data[centre]).toBe(113);
    const m = layout.markers[2];
    const s = 150 / 25.4;
    const pad = 6 * s;
    const crop = await sharp(png)
      .flatten({ background: '#fff' })
      .extract({
        left: Math.round(m.x * s - pad),
        top: Math.round(m.y * s - pad),
        width: Math.round(m.w * s + 2 * pad),
        height: Math.round(m.h * s + 2 * pad),
      })
      .ensureAlpha()
      .raw()
      .toBuffer({ resolveWithObject: true });
    const code = jsQR(new Uint8ClampedArray(crop.data), crop.info.width, crop.info.height);
    expect(decodeCardPayload(code!.data)).toEqual({
      version: 2,
      corner: 2,
      kind: 'temperature-pair',
      steps: 2,
      id: layout.id,
    });
  });
});

describe('renderCardPdf', () => {
  it.each([
    ['A4', '595.28 841.89'],
    ['LETTER', '612 792'],
  ] as const)('writes a one-page %s PDF', async (paper, box) => {
    const pdf = await renderCardPdf(buildCardLayout({ kind: 'graded-wash' }), paper);
    const text = pdf.toString('latin1');
    expect(text.startsWith('%PDF-')).toBe(true);
    expect(text).toContain(`/MediaBox [0 0 ${box}]`);
  });
});
