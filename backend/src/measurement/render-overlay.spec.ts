import { beforeAll, describe, expect, it } from '@jest/globals';
import sharp from 'sharp';
import { measurePhoto, type MeasurementDetail } from './measure-photo';
import { overlayPlan, renderOverlay, renderOverlayFromPhoto, type OverlayPlan } from './render-overlay';
import { renderScene } from './testing/photo-scene';

// A 3000 × 2250 scene: the working raster is half size, so the plan's change of scale is tested.
const scene = () =>
  renderScene({
    kind: 'temperature-pair',
    swatches: [
      { L: 58, a: 18, b: 30 },
      { L: 57, a: -6, b: -22 },
    ],
    width: 3000,
    height: 2250,
    cardFraction: 0.45,
    rotation: 9,
    tiltX: 8,
    tiltY: -6,
    ev: 0,
    cast: 'warm',
    crossTalk: 0.01,
    flare: 0.01,
    vignetting: 0.1,
    noise: 1.5,
    jpegQuality: 88,
    seed: 31,
  });

/** The overlay pixel (RGB) at a point of the plan, which is in original-photo pixels. */
async function pixelAt(png: Buffer, plan: OverlayPlan, [x, y]: [number, number]): Promise<number[]> {
  const { data, info } = await sharp(png).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  const k = info.width / plan.width;
  const i = (Math.round(y * k) * info.width + Math.round(x * k)) * 3;
  return [data[i], data[i + 1], data[i + 2]];
}

const midpoint = (a: [number, number], b: [number, number]): [number, number] => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];

describe('the measurement overlay', () => {
  let jpeg: Buffer;
  let detail: MeasurementDetail;
  let plan: OverlayPlan;

  beforeAll(async () => {
    jpeg = (await scene()).jpeg;
    detail = await measurePhoto(jpeg);
    plan = JSON.parse(JSON.stringify(overlayPlan(detail))) as OverlayPlan; // as stored in jsonb
  });

  it('should put the card outline of its plan on the corners the measurement reports, in original pixels', () => {
    expect(detail.result.ok).toBe(true);
    expect(detail.photo!.scale).toBeCloseTo(0.5, 3);
    expect([plan.width, plan.height]).toEqual([3000, 2250]);
    const corners = detail.result.card!.corners;
    plan.outlines[0].points.forEach(([x, y], i) => {
      expect(Math.hypot(x - corners[i][0], y - corners[i][1])).toBeLessThan(1.5);
    });
    // One label per window reading, with the reading's numbers.
    expect(plan.labels.map((l) => l.text)).toEqual(
      detail.result.readings.map((r) => `${r.window + 1}: L* ${r.lab.L.toFixed(1)} a* ${r.lab.a.toFixed(1)} b* ${r.lab.b.toFixed(1)}`),
    );
  });

  it('should draw the same picture later from the stored photo file as from the decoded photo in hand', async () => {
    const now = await renderOverlay(detail);
    const later = await renderOverlayFromPhoto(jpeg, plan);
    const a = await sharp(now).removeAlpha().raw().toBuffer({ resolveWithObject: true });
    const b = await sharp(later).removeAlpha().raw().toBuffer({ resolveWithObject: true });
    expect([b.info.width, b.info.height]).toEqual([1280, 960]);
    expect([a.info.width, a.info.height]).toEqual([b.info.width, b.info.height]);
    let sum = 0;
    for (let i = 0; i < a.data.length; i += 1) sum += Math.abs(a.data[i] - b.data[i]);
    // Two resamplings of one photo (from the half-size raster, and shrunk while decoding the
    // JPEG) with the same strokes: within a few 8-bit codes on average (a bound of our own).
    expect(sum / a.data.length).toBeLessThan(3);
    // The card's top edge carries the white stroke.
    const top = midpoint(plan.outlines[0].points[0], plan.outlines[0].points[1]);
    for (const value of await pixelAt(later, plan, top)) expect(value).toBeGreaterThan(235);
  });

  it('should draw it upright from a photo stored on its side with an orientation tag', async () => {
    // The pixels turned a quarter anticlockwise, tagged "rotate 90° clockwise to view" (EXIF orientation 6).
    const sideways = await sharp(jpeg).rotate(-90).withMetadata({ orientation: 6 }).jpeg({ quality: 92 }).toBuffer();
    const measured = await measurePhoto(sideways);
    expect(measured.result.ok).toBe(true);
    const sidewaysPlan = overlayPlan(measured);
    expect([sidewaysPlan.width, sidewaysPlan.height]).toEqual([3000, 2250]);
    const png = await renderOverlayFromPhoto(sideways, sidewaysPlan);
    const meta = await sharp(png).metadata();
    expect([meta.width, meta.height]).toEqual([1280, 960]);
    const top = midpoint(sidewaysPlan.outlines[0].points[0], sidewaysPlan.outlines[0].points[1]);
    for (const value of await pixelAt(png, sidewaysPlan, top)) expect(value).toBeGreaterThan(235);
  });

  it('should write the errors of a photo whose card is not there', async () => {
    const blank = await sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 120, g: 110, b: 100 } } }).jpeg().toBuffer();
    const measured = await measurePhoto(blank);
    const blankPlan = overlayPlan(measured);
    expect(blankPlan.outlines).toEqual([]);
    expect(blankPlan.notes).toContain('error CARD_NOT_FOUND');
    const png = await renderOverlayFromPhoto(blank, blankPlan);
    expect((await sharp(png).metadata()).width).toBe(800); // never enlarged
  });
});
