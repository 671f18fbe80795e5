import type { Raster8 } from '@mixmark/common';
import jsQR from 'jsqr';
import { buildCardLayout } from '../cards/card-layout';
import type { CardLayout, CardMarker } from '../cards/card-layout.types';
import { decodeCardPayload, type CardPayload } from '../cards/card-payload';
import {
  findFinderPatterns,
  greyReduced,
  groupQrCandidates,
  type QrCandidate,
} from './find-finder-patterns';
import {
  applyHomography,
  fitHomography,
  refineHomography,
  reprojectionError,
  type Homography,
  type Point,
} from './homography';

/** The card as found in the working raster. */
export type CardDetection = {
  layout: CardLayout;
  /** Card millimetres → working-raster pixels. */
  homography: Homography;
  /** Corners (0-3) whose markers were read. */
  found: number[];
  /** Markers not read, and whether their place lies outside the frame. */
  missing: { corner: number; outside: boolean }[];
  /** Number of point pairs in the fit and their RMS reprojection error (working px). */
  points: number;
  rmsError: number;
};

type MarkerHit = { payload: CardPayload; card: Point[]; image: Point[]; weights: number[] };

/**
 * Where jsQR's reported points sit in a version 2 symbol, in modules: the three finder
 * centres and the alignment pattern centre (ISO/IEC 18004 §6.3.3, §6.3.6, Annex E), which
 * jsQR measures, then the four symbol corners, which it extrapolates from them (so they
 * count half).
 */
const markerPoints: [number, number, number, string][] = [
  [3.5, 3.5, 1, 'topLeftFinderPattern'],
  [21.5, 3.5, 1, 'topRightFinderPattern'],
  [3.5, 21.5, 1, 'bottomLeftFinderPattern'],
  [18.5, 18.5, 1, 'bottomRightAlignmentPattern'],
  [0, 0, 0.5, 'topLeftCorner'],
  [25, 0, 0.5, 'topRightCorner'],
  [25, 25, 0.5, 'bottomRightCorner'],
  [0, 25, 0.5, 'bottomLeftCorner'],
];

/** RGBA grey copy of a region of an RGB raster, reduced by `factor` (box average), for jsQR. */
function greyRgba(raster: Raster8, x0: number, y0: number, w: number, h: number, factor: number) {
  const ow = Math.floor(w / factor);
  const oh = Math.floor(h / factor);
  const out = new Uint8ClampedArray(ow * oh * 4);
  const { data, width, channels } = raster;
  const area = factor * factor;
  for (let y = 0; y < oh; y++) {
    for (let x = 0; x < ow; x++) {
      let sum = 0;
      for (let dy = 0; dy < factor; dy++) {
        let i = ((y0 + y * factor + dy) * width + x0 + x * factor) * channels;
        for (let dx = 0; dx < factor; dx++, i += channels)
          sum += data[i] + 2 * data[i + 1] + data[i + 2];
      }
      const v = sum / (4 * area);
      const o = (y * ow + x) * 4;
      out[o] = v;
      out[o + 1] = v;
      out[o + 2] = v;
      out[o + 3] = 255;
    }
  }
  return { data: out, width: ow, height: oh };
}

/** Doubles a grey RGBA image by bilinear interpolation (jsQR's binariser needs about three
 * pixels a module; small markers read far more often after this). */
function upsample2(grey: { data: Uint8ClampedArray; width: number; height: number }) {
  const { data, width, height } = grey;
  const ow = width * 2;
  const oh = height * 2;
  const out = new Uint8ClampedArray(ow * oh * 4);
  for (let y = 0; y < oh; y++) {
    const fy = Math.min(Math.max((y + 0.5) / 2 - 0.5, 0), height - 1.001);
    const y0 = Math.floor(fy);
    const ay = fy - y0;
    for (let x = 0; x < ow; x++) {
      const fx = Math.min(Math.max((x + 0.5) / 2 - 0.5, 0), width - 1.001);
      const x0 = Math.floor(fx);
      const ax = fx - x0;
      const i = (y0 * width + x0) * 4;
      const v =
        (1 - ay) * ((1 - ax) * data[i] + ax * data[i + 4]) +
        ay * ((1 - ax) * data[i + width * 4] + ax * data[i + width * 4 + 4]);
      const o = (y * ow + x) * 4;
      out[o] = v;
      out[o + 1] = v;
      out[o + 2] = v;
      out[o + 3] = 255;
    }
  }
  return { data: out, width: ow, height: oh };
}

/** Runs jsQR on a region (factor 0.5 = the region doubled); points come back in
 * working-raster pixels. */
function readMarker(raster: Raster8, x0: number, y0: number, w: number, h: number, factor: number) {
  if (w < 24 || h < 24) return undefined;
  const grey =
    factor >= 1
      ? greyRgba(raster, x0, y0, w, h, factor)
      : upsample2(greyRgba(raster, x0, y0, w, h, 1));
  const code = jsQR(grey.data, grey.width, grey.height, { inversionAttempts: 'dontInvert' });
  if (!code) return undefined;
  const payload = decodeCardPayload(code.data);
  if (!payload) return undefined;
  const location = code.location as unknown as Record<string, Point | undefined>;
  const image: Point[] = [];
  const modules: [number, number][] = [];
  const weights: number[] = [];
  for (const [u, v, weight, key] of markerPoints) {
    const p = location[key];
    if (!p) continue;
    image.push({ x: x0 + p.x * factor, y: y0 + p.y * factor });
    modules.push([u, v]);
    weights.push(weight);
  }
  return { payload, modules, image, weights };
}

function toCard(marker: CardMarker, modules: [number, number][]): Point[] {
  const m = marker.w / marker.modules;
  return modules.map(([u, v]) => ({ x: marker.x + u * m, y: marker.y + v * m }));
}

/** Bounding box in the raster of a card rectangle grown by `margin` mm. */
function predictedBox(h: Homography, marker: CardMarker, margin: number) {
  const corners = [
    [marker.x - margin, marker.y - margin],
    [marker.x + marker.w + margin, marker.y - margin],
    [marker.x + marker.w + margin, marker.y + marker.h + margin],
    [marker.x - margin, marker.y + marker.h + margin],
  ].map(([x, y]) => applyHomography(h, x, y));
  const xs = corners.map((p) => p.x);
  const ys = corners.map((p) => p.y);
  return { x0: Math.min(...xs), y0: Math.min(...ys), x1: Math.max(...xs), y1: Math.max(...ys) };
}

function fitAll(hits: MarkerHit[]): { h: Homography; points: number; rms: number } | undefined {
  const card = hits.flatMap((hit) => hit.card);
  const image = hits.flatMap((hit) => hit.image);
  const weights = hits.flatMap((hit) => hit.weights);
  const initial = fitHomography(card, image, weights);
  if (!initial) return undefined;
  const { h } = refineHomography(initial, card, image);
  return { h, points: card.length, rms: reprojectionError(h, card, image) };
}

/** jsQR's resolution for a crop whose modules are `module` working pixels: reduced when
 * they are large (faster), doubled when small (it needs about three pixels a module). */
const factorFor = (module: number): number => (module >= 8 ? 2 : module < 3.5 ? 0.5 : 1);

/**
 * The first readable marker: finder patterns are found by their run ratio on a grey copy
 * (half size for large rasters, then full size), and jsQR reads only a crop around each
 * group of them. When that reads nothing (a marker badly blurred or cut, or a finder
 * missed), jsQR runs on overlapping half-frame tiles as before: slower, but it stays the
 * last resort for photos the scanner cannot help.
 */
function firstMarker(raster: Raster8): {
  read?: NonNullable<ReturnType<typeof readMarker>>;
  precise: boolean;
  candidates: QrCandidate[];
} {
  const { width, height } = raster;
  const tried: QrCandidate[] = [];
  for (const reduce of Math.max(width, height) > 1100 ? [2, 1] : [1]) {
    const finders = findFinderPatterns(greyReduced(raster, reduce));
    for (const c of groupQrCandidates(finders, reduce, width, height)) {
      // A group already tried at the coarser scale is not decoded again.
      if (
        tried.some(
          (t) =>
            t.x0 <= c.x0 + 2 * c.module &&
            t.x1 >= c.x1 - 2 * c.module &&
            t.y0 <= c.y0 + 2 * c.module &&
            t.y1 >= c.y1 - 2 * c.module,
        )
      )
        continue;
      tried.push(c);
      const factor = factorFor(c.module);
      const read = readMarker(raster, c.x0, c.y0, c.x1 - c.x0, c.y1 - c.y0, factor);
      if (read) return { read, precise: factor <= 1, candidates: tried };
    }
  }
  // jsQR reads one code per call and gets lost when several are in view (all four corners
  // of the card), so it is run on overlapping tiles, each half the frame a side: most hold
  // one marker whole. First on a half-size copy (fast), then at working size (small cards).
  const reduce = Math.max(width, height) > 1100 ? 2 : 1;
  for (const factor of reduce === 2 ? [2, 1] : [1]) {
    const tw = Math.floor(width / 2);
    const th = Math.floor(height / 2);
    for (let j = 0; j < 3; j++) {
      for (let i = 0; i < 3; i++) {
        const read = readMarker(
          raster,
          Math.floor((i * width) / 4),
          Math.floor((j * height) / 4),
          tw,
          th,
          factor,
        );
        if (read) return { read, precise: factor === 1, candidates: tried };
      }
    }
  }
  return { precise: false, candidates: tried };
}

const overlap = (a: { x0: number; y0: number; x1: number; y1: number }, b: typeof a): number =>
  Math.max(0, Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0)) *
  Math.max(0, Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0));

/**
 * Finds the reference card: finds QR finder patterns by their run ratio on a grey copy and
 * reads the first marker with jsQR in a crop around them (tiles of the frame as a last
 * resort); then reads each other marker in the crop of the finder group at its predicted
 * place (or the predicted box itself) at working resolution, and refits with every point
 * read (least squares, then refined on the reprojection error). Works at any rotation: each
 * QR code knows its own orientation and says which corner it is.
 *
 * @param raster - the working raster (upright, sRGB)
 * @returns the detection, or undefined when no Mixmark marker is readable
 */
export function findCard(raster: Raster8): CardDetection | undefined {
  const { width, height } = raster;
  const found = firstMarker(raster);
  const first = found.read;
  if (!first) return undefined;
  const { payload } = first;
  let layout: CardLayout;
  try {
    layout = buildCardLayout({ kind: payload.kind, steps: payload.steps, id: payload.id });
  } catch {
    return undefined;
  }
  if (payload.version !== layout.version) return undefined;
  const hits = new Map<number, MarkerHit>();
  const addHit = (read: NonNullable<ReturnType<typeof readMarker>>): void => {
    const marker = layout.markers[read.payload.corner];
    hits.set(read.payload.corner, {
      payload: read.payload,
      card: toCard(marker, read.modules),
      image: read.image,
      weights: read.weights,
    });
  };
  addHit(first);
  let fit = fitAll([...hits.values()]);
  if (!fit) return undefined;
  const start = payload.corner;
  const order = [start, (start + 1) % 4, (start + 3) % 4, (start + 2) % 4];
  for (const corner of order) {
    // A first marker read at working resolution is not read again.
    if (corner === start && found.precise) continue;
    const marker = layout.markers[corner];
    const box = predictedBox(fit.h, marker, 6);
    const x0 = Math.max(0, Math.floor(box.x0));
    const y0 = Math.max(0, Math.floor(box.y0));
    const x1 = Math.min(width, Math.ceil(box.x1));
    const y1 = Math.min(height, Math.ceil(box.y1));
    if (x1 - x0 < 24 || y1 - y0 < 24) continue;
    const matches = (read: ReturnType<typeof readMarker>): boolean =>
      !!read && read.payload.id === payload.id && read.payload.corner === corner;
    // Where the finder scan saw a symbol, its own box comes first: a homography fitted to
    // one marker extrapolates poorly to the far corners of the card.
    const seen = found.candidates
      .filter((c) => overlap(c, { x0, y0, x1, y1 }) > 0)
      .sort((a, b) => overlap(b, { x0, y0, x1, y1 }) - overlap(a, { x0, y0, x1, y1 }));
    let read: ReturnType<typeof readMarker>;
    for (const c of seen) {
      // A tilted card squeezes the modules one way: small ones are also tried doubled.
      for (const factor of c.module < 5 ? [1, 0.5] : [Math.min(1, factorFor(c.module))]) {
        read = readMarker(raster, c.x0, c.y0, c.x1 - c.x0, c.y1 - c.y0, factor);
        if (matches(read)) break;
        read = undefined;
      }
      if (read) break;
    }
    read ??=
      readMarker(raster, x0, y0, x1 - x0, y1 - y0, 1) ??
      readMarker(raster, x0, y0, x1 - x0, y1 - y0, 0.5);
    if (read && matches(read)) {
      addHit(read);
      fit = fitAll([...hits.values()]) ?? fit;
    }
  }
  const missing: CardDetection['missing'] = [];
  for (const marker of layout.markers) {
    if (hits.has(marker.corner)) continue;
    const box = predictedBox(fit.h, marker, 0);
    missing.push({
      corner: marker.corner,
      outside: box.x0 < 0 || box.y0 < 0 || box.x1 > width || box.y1 > height,
    });
  }
  return {
    layout,
    homography: fit.h,
    found: [...hits.keys()].sort(),
    missing,
    points: fit.points,
    rmsError: fit.rms,
  };
}
