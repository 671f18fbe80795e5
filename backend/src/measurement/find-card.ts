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
  /** Every group the scan saw, at every scale scanned. */
  groups: QrCandidate[];
  /** Whether the working-size copy was scanned too. */
  full: boolean;
} {
  const { width, height } = raster;
  const tried: QrCandidate[] = [];
  const groups: QrCandidate[] = [];
  for (const reduce of Math.max(width, height) > 1100 ? [2, 1] : [1]) {
    // Every other row on the half-size copy (a finder is at least 7 modules of 1.5 px there,
    // so it still crosses several rows scanned); every row at working size, where the
    // smallest cards are looked for.
    const finders = findFinderPatterns(greyReduced(raster, reduce), reduce === 2 ? 2 : 1);
    const candidates = groupQrCandidates(finders, reduce, width, height);
    groups.push(...candidates);
    for (const c of candidates) {
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
      // Only the payload of this read is needed when the scan saw the other symbols too
      // (their geometry comes from their finders), so jsQR first gets the crop halved
      // whenever that still leaves it three pixels a module: a quarter of the pixels.
      const factors =
        c.module >= 6 && factorFor(c.module) < 2 ? [2, factorFor(c.module)] : [factorFor(c.module)];
      for (const factor of factors) {
        const read = readMarker(raster, c.x0, c.y0, c.x1 - c.x0, c.y1 - c.y0, factor);
        if (read)
          return { read, precise: factor <= 1, candidates: tried, groups, full: reduce === 1 };
      }
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
        if (read) return { read, precise: factor === 1, candidates: tried, groups, full: true };
      }
    }
  }
  return { precise: false, candidates: tried, groups, full: true };
}

const overlap = (a: { x0: number; y0: number; x1: number; y1: number }, b: typeof a): number =>
  Math.max(0, Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0)) *
  Math.max(0, Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0));

/** Finder centres of a version 2 symbol, in modules: top-left, top-right, bottom-left
 * (ISO/IEC 18004 §6.3.3). */
const finderModules: [number, number][] = [
  [3.5, 3.5],
  [21.5, 3.5],
  [3.5, 21.5],
];

/**
 * The centre of a finder pattern at working resolution: the darkness-weighted centroid of
 * the disc 2.5 modules across its centre, which holds the 3 × 3-module core and the light
 * ring around it and nothing else (so the weights are symmetric about the true centre);
 * twice, each from the last estimate. The scan's own centres come from run lengths on a
 * reduced copy, good to about a working pixel; this is good to a small fraction of one.
 */
function refineFinderCentre(raster: Raster8, start: Point, module: number): Point {
  const { data, width, height, channels } = raster;
  const r = 2.5 * module;
  let cx = start.x;
  let cy = start.y;
  for (let pass = 0; pass < 2; pass++) {
    const x0 = Math.max(0, Math.floor(cx - r));
    const x1 = Math.min(width - 1, Math.ceil(cx + r));
    const y0 = Math.max(0, Math.floor(cy - r));
    const y1 = Math.min(height - 1, Math.ceil(cy + r));
    let lo = Infinity;
    let hi = -Infinity;
    for (let y = y0; y <= y1; y++) {
      for (let x = x0, i = (y * width + x0) * channels; x <= x1; x++, i += channels) {
        const dx = x + 0.5 - cx;
        const dy = y + 0.5 - cy;
        if (dx * dx + dy * dy > r * r) continue;
        const g = data[i] + 2 * data[i + 1] + data[i + 2];
        if (g < lo) lo = g;
        if (g > hi) hi = g;
      }
    }
    const limit = (lo + hi) / 2;
    let sw = 0;
    let sx = 0;
    let sy = 0;
    for (let y = y0; y <= y1; y++) {
      for (let x = x0, i = (y * width + x0) * channels; x <= x1; x++, i += channels) {
        const dx = x + 0.5 - cx;
        const dy = y + 0.5 - cy;
        if (dx * dx + dy * dy > r * r) continue;
        const w = limit - (data[i] + 2 * data[i + 1] + data[i + 2]);
        if (w <= 0) continue;
        sw += w;
        sx += w * (x + 0.5);
        sy += w * (y + 0.5);
      }
    }
    if (!(sw > 0) || hi - lo < 40) return { x: cx, y: cy };
    cx = sx / sw;
    cy = sy / sw;
  }
  return { x: cx, y: cy };
}

/** A scanned group of three finders as one oriented QR symbol: finder centres (top-left,
 * top-right, bottom-left, in working pixels) and the symbol's centre. */
type OrientedSymbol = { finders: Point[]; centre: Point; module: number };

/**
 * Orients a group of three finders: the top-left one faces the longest side, and top-right
 * follows it clockwise (a photo is never mirrored, so the symbol's handedness holds). Legs
 * much unequal, or not about 18 modules long, are not a version 2 symbol.
 */
function orientSymbol(c: QrCandidate): OrientedSymbol | undefined {
  if (c.finders.length !== 3) return undefined;
  const p = c.finders.map((f) => ({ x: (f.x + 0.5) * c.scale, y: (f.y + 0.5) * c.scale }));
  const d = (a: Point, b: Point): number => Math.hypot(a.x - b.x, a.y - b.y);
  const opposite = [d(p[1], p[2]), d(p[0], p[2]), d(p[0], p[1])];
  const i = opposite.indexOf(Math.max(...opposite));
  const tl = p[i];
  const [a, b] = p.filter((_, k) => k !== i);
  const cross = (a.x - tl.x) * (b.y - tl.y) - (a.y - tl.y) * (b.x - tl.x);
  const [tr, bl] = cross > 0 ? [a, b] : [b, a];
  const legs = [d(tl, tr), d(tl, bl)];
  const leg = (legs[0] + legs[1]) / 2 / c.module;
  if (Math.max(...legs) > 2 * Math.min(...legs) || leg < 10 || leg > 30) return undefined;
  return {
    finders: [tl, tr, bl],
    centre: { x: (tr.x + bl.x) / 2, y: (tr.y + bl.y) / 2 },
    module: c.module,
  };
}

/**
 * The scanned symbol at a marker's predicted place: the nearest oriented group whose centre
 * is nearer this marker's predicted centre than any other marker's and within half the
 * distance to the nearest other marker (a fit to one marker extrapolates poorly to the far
 * corners; the markers are far apart, so this still tells them apart), whose top-left to
 * top-right leg points within 45° of the predicted one (all markers are printed upright on
 * the card) and whose module size is within a factor of 2 of the predicted one. Its finders
 * are refined at working resolution. The payload is not read: the first marker's says which
 * card this is, and the card's geometry says which corner each other symbol is.
 */
function symbolAt(
  raster: Raster8,
  symbols: OrientedSymbol[],
  h: Homography,
  layout: CardLayout,
  marker: CardMarker,
): Point[] | undefined {
  const centreOf = (k: CardMarker): Point => applyHomography(h, k.x + k.w / 2, k.y + k.h / 2);
  const m = marker.w / marker.modules;
  const [tl, tr] = finderModules.map(([u, v]) =>
    applyHomography(h, marker.x + u * m, marker.y + v * m),
  );
  const centre = centreOf(marker);
  const others = layout.markers.filter((k) => k.corner !== marker.corner).map(centreOf);
  const dist = (a: Point, b: Point): number => Math.hypot(a.x - b.x, a.y - b.y);
  const spacing = Math.min(...others.map((o) => dist(o, centre)));
  const leg = { x: tr.x - tl.x, y: tr.y - tl.y };
  const legLength = Math.hypot(leg.x, leg.y);
  let best: OrientedSymbol | undefined;
  let bestDistance = 0.5 * spacing;
  for (const s of symbols) {
    const distance = dist(s.centre, centre);
    if (distance >= bestDistance || others.some((o) => dist(s.centre, o) < distance)) continue;
    const [stl, str] = s.finders;
    const sx = str.x - stl.x;
    const sy = str.y - stl.y;
    const length = Math.hypot(sx, sy);
    const cos = (sx * leg.x + sy * leg.y) / (length * legLength);
    if (!(cos > Math.SQRT1_2) || length > 2 * legLength || length < 0.5 * legLength) continue;
    best = s;
    bestDistance = distance;
  }
  if (!best) return undefined;
  const module = best.module;
  return best.finders.map((f) => refineFinderCentre(raster, f, module));
}

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
    layout = buildCardLayout({
      kind: payload.kind,
      steps: payload.steps,
      id: payload.id,
      version: payload.version,
    });
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
  /** A marker seen by the finder scan: its three finder centres, refined, are its points. */
  const addScanned = (corner: number, image: Point[]): void => {
    hits.set(corner, {
      payload: { ...payload, corner: corner as CardPayload['corner'] },
      card: toCard(layout.markers[corner], finderModules),
      image,
      weights: [1, 1, 1],
    });
    fit = fitAll([...hits.values()]) ?? fit;
  };
  const start = payload.corner;
  const order = [start, (start + 1) % 4, (start + 3) % 4, (start + 2) % 4];
  const symbols = found.groups.map(orientSymbol).filter((s) => s !== undefined);
  for (const corner of order) {
    const marker = layout.markers[corner];
    // The symbol the scan saw there, if any: its three finder centres, refined, are the
    // marker's points (jsQR is not run again).
    const image = symbolAt(raster, symbols, fit.h, layout, marker);
    if (image) {
      addScanned(corner, image);
      continue;
    }
    // A first marker read at working resolution is not read again.
    if (corner === start && found.precise) continue;
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
  // A first marker read from the half-size scan leaves the others to that scan's symbols;
  // where their modules are under about 2.5 px there, some finders are lost. Then the
  // working-size copy is scanned for the markers still missing (cards small in the frame).
  if (hits.size < layout.markers.length && !found.full) {
    const finders = findFinderPatterns(greyReduced(raster, 1), 1);
    const more = groupQrCandidates(finders, 1, width, height)
      .map(orientSymbol)
      .filter((s) => s !== undefined);
    for (const corner of order) {
      if (hits.has(corner)) continue;
      const marker = layout.markers[corner];
      const image = symbolAt(raster, more, fit.h, layout, marker);
      if (image) addScanned(corner, image);
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
