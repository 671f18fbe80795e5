import {
  labToXyz,
  srgb8ToLinearLut,
  xyzToLinearSrgb,
  linearChannelToSrgb,
  type Lab,
} from '@mixmark/common';
import sharp from 'sharp';
import { buildCardLayout } from '../../cards/card-layout';
import type { CardKind } from '../../cards/card-layout.types';
import { renderCardPng } from '../../cards/render-card-png';
import { applyHomography, fitHomography, type Point } from '../homography';
import { gaussian, seededRandom } from './seeded-random';

// Math's functions taken once: under jest's ESM VM every lookup of the global `Math` is slow
// (~2 µs), and the scene loop makes tens of millions of calls.
const { floor, max, min, round, imul, sqrt, exp } = Math;

/** Light colours as per-channel gains on linear sRGB, normalised to green (test choices,
 * roughly the camera-native casts of tungsten ~2800 K, open shade ~7500 K and a cool-white
 * fluorescent tube; not measured spectra). */
export const casts = {
  neutral: [1, 1, 1],
  warm: [1.45, 1, 0.52],
  shade: [0.8, 1, 1.28],
  fluorescent: [0.9, 1, 0.78],
} as const;

/** How a synthetic photo is made. */
export type SceneOptions = {
  kind: CardKind;
  steps?: number;
  /** Card layout version (default the current one; 1 for cards printed before v2). */
  version?: number;
  /** True colour under each window (CIELAB D65, in sRGB gamut). */
  swatches: Lab[];
  width: number;
  height: number;
  /** Share of the frame the card covers (0.15–0.8). */
  cardFraction: number;
  /** In-plane rotation, and tilt of the card plane about its x and y axes, degrees. */
  rotation: number;
  tiltX: number;
  tiltY: number;
  /** Card centre offset from the frame centre, as fractions of width and height. */
  offset?: [number, number];
  ev: number;
  cast: keyof typeof casts;
  /** Off-diagonal channel mixing (0–0.05). */
  crossTalk: number;
  /** Veiling glare added, as a share of the white's signal (0–0.04). */
  flare: number;
  /** Light fall-off at the frame corners (0–0.35). */
  vignetting: number;
  /** Sensor noise, in 8-bit codes at mid grey. */
  noise: number;
  jpegQuality: number;
  seed: number;
  /** A specular reflection: centre in card mm, radius mm, peak (linear, × white). */
  glare?: { x: number; y: number; radius: number; peak: number };
  /** Light gradient across the card: gain at the right edge relative to the left. */
  lightGradient?: number;
};

const cardCache = new Map<
  string,
  Promise<{ data: Buffer; width: number; height: number; dpi: number }>
>();

function cardRaster(
  kind: CardKind,
  steps: number | undefined,
  version: number | undefined,
  dpi: number,
) {
  const key = `${kind}/${steps}/v${version}/${dpi}`;
  let hit = cardCache.get(key);
  if (!hit) {
    hit = renderCardPng(buildCardLayout({ kind, steps, version }), dpi).then(async ({ png }) => {
      const { data, info } = await sharp(png).raw().toBuffer({ resolveWithObject: true });
      return { data, width: info.width, height: info.height, dpi };
    });
    cardCache.set(key, hit);
  }
  return hit;
}

/** Smooth value noise in [-1, 1] over card mm (cells of `cell` mm), for grain and granulation. */
function valueNoise(seed: number, cell: number) {
  const hash = (i: number, j: number): number => {
    let h = imul(i, 374761393) ^ imul(j, 668265263) ^ seed;
    h = imul(h ^ (h >>> 13), 1274126177);
    return ((h ^ (h >>> 16)) >>> 0) / 2147483648 - 1;
  };
  return (x: number, y: number): number => {
    const fx = x / cell;
    const fy = y / cell;
    const i = floor(fx);
    const j = floor(fy);
    const ax = fx - i;
    const ay = fy - j;
    return (
      (1 - ay) * ((1 - ax) * hash(i, j) + ax * hash(i + 1, j)) +
      ay * ((1 - ax) * hash(i, j + 1) + ax * hash(i + 1, j + 1))
    );
  };
}

/** The card-mm → photo-px homography of a card posed in 3D and seen by a pinhole camera. */
export function posedHomography(o: SceneOptions, cardW: number, cardH: number) {
  const rad = Math.PI / 180;
  const [ax, ay, az] = [o.tiltX * rad, o.tiltY * rad, o.rotation * rad];
  const project = (x: number, y: number, f: number): Point => {
    let X = x - cardW / 2;
    let Y = y - cardH / 2;
    let Z = 0;
    [Y, Z] = [Y * Math.cos(ax) - Z * Math.sin(ax), Y * Math.sin(ax) + Z * Math.cos(ax)];
    [X, Z] = [X * Math.cos(ay) + Z * Math.sin(ay), -X * Math.sin(ay) + Z * Math.cos(ay)];
    [X, Y] = [X * Math.cos(az) - Y * Math.sin(az), X * Math.sin(az) + Y * Math.cos(az)];
    const D = 400 + Z;
    return { x: (f * X) / D, y: (f * Y) / D };
  };
  const corners = [
    { x: 0, y: 0 },
    { x: cardW, y: 0 },
    { x: cardW, y: cardH },
    { x: 0, y: cardH },
  ];
  const area = (pts: Point[]): number =>
    Math.abs(pts.reduce((s, p, i) => s + p.x * pts[(i + 1) % 4].y - pts[(i + 1) % 4].x * p.y, 0)) /
    2;
  const unit = corners.map((c) => project(c.x, c.y, 1));
  let f = sqrt((o.cardFraction * o.width * o.height) / area(unit));
  const [dx, dy] = o.offset ?? [0, 0];
  const place = (): Point[] =>
    corners.map((c) => {
      const p = project(c.x, c.y, f);
      return { x: p.x + o.width * (0.5 + dx), y: p.y + o.height * (0.5 + dy) };
    });
  let image = place();
  // A turned card can only fill so much of the frame: unless asked to stick out (`offset`),
  // shrink it until its corners are inside, 2 % from the edges.
  const inside = (pts: Point[]): boolean =>
    pts.every(
      (p) =>
        p.x > 0.02 * o.width &&
        p.x < 0.98 * o.width &&
        p.y > 0.02 * o.height &&
        p.y < 0.98 * o.height,
    );
  while (!o.offset && !inside(image)) {
    f *= 0.97;
    image = place();
  }
  return {
    toPhoto: fitHomography(corners, image)!,
    toCard: fitHomography(image, corners)!,
    corners: image,
  };
}

/** Linear sRGB of a CIELAB colour (CIE 15:2004 inverse, IEC 61966-2-1 matrix). */
export const labToLinear = (lab: Lab): [number, number, number] => {
  const { r, g, b } = xyzToLinearSrgb(labToXyz(lab));
  return [r, g, b];
};

/** Filmic highlight shoulder (extended Reinhard, white at 4) then the sRGB encoding: the
 * camera-like tone curve of the synthetic camera (a test choice, not a measured camera). */
function toneCurve(x: number): number {
  const v = max(0, x);
  const y = min(1, (v * (1 + v / 16)) / (1 + v));
  // sRGB encoding (IEC 61966-2-1).
  return y <= 0.0031308 ? 12.92 * y : 1.055 * y ** (1 / 2.4) - 0.055;
}

/**
 * Makes a synthetic phone photo of the card lying over painted swatches: the card's own PNG
 * over known swatch colours (with paper grain and granulation), on a textured table, posed in
 * 3D, lit (exposure, colour cast, vignetting, gradient, glare), then "photographed" (channel
 * cross-talk, flare, tone curve, noise, JPEG).
 *
 * @param o - the scene
 * @returns the JPEG and the truth
 */
export async function renderScene(
  o: SceneOptions,
): Promise<{ jpeg: Buffer; truth: Lab[]; corners: Point[] }> {
  const layout = buildCardLayout({ kind: o.kind, steps: o.steps, version: o.version });
  const ppm = sqrt((o.cardFraction * o.width * o.height) / (layout.width * layout.height));
  const dpi = min(600, max(60, Math.ceil(ppm * 25.4 * 1.2)));
  const card = await cardRaster(o.kind, o.steps, o.version, dpi);
  const cs = card.dpi / 25.4;
  const { toCard, corners } = posedHomography(o, layout.width, layout.height);
  const random = seededRandom(o.seed);
  const grain = valueNoise(o.seed ^ 0x51, 0.15);
  const granulation = valueNoise(o.seed ^ 0x77, 0.6);
  const table = valueNoise(o.seed ^ 0x99, 3);
  const swatches = o.swatches.map(labToLinear);
  const windowOf = (x: number, y: number): number =>
    layout.windows.findIndex(
      (w) => x >= w.x - 3 && x < w.x + w.w + 3 && y >= w.y - 3 && y < w.y + w.h + 3,
    );
  const gain = casts[o.cast].map((c) => c * 2 ** o.ev);
  const k = o.crossTalk;
  const cx = o.width / 2;
  const cy = o.height / 2;
  const r2max = cx * cx + cy * cy;
  const out = Buffer.alloc(o.width * o.height * 3);
  const lin = srgb8ToLinearLut;
  const flare = o.flare * max(...gain);
  for (let v = 0; v < o.height; v++) {
    for (let u = 0; u < o.width; u++) {
      const p = applyHomography(toCard, u + 0.5, v + 0.5);
      let R: number;
      let G: number;
      let B: number;
      let light = 1 - o.vignetting * (((u - cx) ** 2 + (v - cy) ** 2) / r2max);
      if (p.x >= 0 && p.y >= 0 && p.x < layout.width && p.y < layout.height) {
        const fx = min(p.x * cs - 0.5, card.width - 1.001);
        const fy = min(p.y * cs - 0.5, card.height - 1.001);
        const x0 = max(0, floor(fx));
        const y0 = max(0, floor(fy));
        const ax = max(0, fx - x0);
        const ay = max(0, fy - y0);
        const w00 = (1 - ax) * (1 - ay);
        const w10 = ax * (1 - ay);
        const w01 = (1 - ax) * ay;
        const w11 = ax * ay;
        const i00 = (y0 * card.width + x0) * 4;
        const i10 = i00 + 4;
        const i01 = i00 + card.width * 4;
        const i11 = i01 + 4;
        const d = card.data;
        const a = (w00 * d[i00 + 3] + w10 * d[i10 + 3] + w01 * d[i01 + 3] + w11 * d[i11 + 3]) / 255;
        const paper = 1 + 0.01 * grain(p.x, p.y);
        R = paper * (w00 * lin[d[i00]] + w10 * lin[d[i10]] + w01 * lin[d[i01]] + w11 * lin[d[i11]]);
        G =
          paper *
          (w00 * lin[d[i00 + 1]] +
            w10 * lin[d[i10 + 1]] +
            w01 * lin[d[i01 + 1]] +
            w11 * lin[d[i11 + 1]]);
        B =
          paper *
          (w00 * lin[d[i00 + 2]] +
            w10 * lin[d[i10 + 2]] +
            w01 * lin[d[i01 + 2]] +
            w11 * lin[d[i11 + 2]]);
        if (a < 1) {
          const wi = windowOf(p.x, p.y);
          const s = wi >= 0 ? swatches[wi] : [0.8, 0.8, 0.78];
          // Granulation: pigment settling in the paper's tooth, ±6 % in linear light.
          const t = 1 + 0.06 * granulation(p.x, p.y) + 0.02 * grain(p.x * 1.7, p.y * 1.7);
          R = a * R + (1 - a) * s[0] * t;
          G = a * G + (1 - a) * s[1] * t;
          B = a * B + (1 - a) * s[2] * t;
        }
        if (o.lightGradient) light *= 1 + (o.lightGradient - 1) * (p.x / layout.width);
        if (o.glare) {
          const dd = ((p.x - o.glare.x) ** 2 + (p.y - o.glare.y) ** 2) / o.glare.radius ** 2;
          if (dd < 4) {
            const add = o.glare.peak * exp(-dd);
            R += add;
            G += add;
            B += add;
          }
        }
      } else {
        const t = 0.15 * (1 + 0.3 * table(u / 4, v / 4));
        R = t * 0.9;
        G = t * 0.75;
        B = t * 0.6;
      }
      R *= light * gain[0];
      G *= light * gain[1];
      B *= light * gain[2];
      const r = (1 - 2 * k) * R + k * G + k * B + flare;
      const g = k * R + (1 - 2 * k) * G + k * B + flare;
      const b = k * R + k * G + (1 - 2 * k) * B + flare;
      const o3 = (v * o.width + u) * 3;
      const channel = [r, g, b];
      for (let c = 0; c < 3; c++) {
        const y = toneCurve(channel[c]);
        const n = (o.noise / 255) * (0.4 + 0.6 * sqrt(y / 0.45)) * gaussian(random);
        out[o3 + c] = max(0, min(255, round(255 * (y + n))));
      }
    }
  }
  const jpeg = await sharp(out, { raw: { width: o.width, height: o.height, channels: 3 } })
    .jpeg({ quality: o.jpegQuality })
    .toBuffer();
  return { jpeg, truth: o.swatches, corners };
}
