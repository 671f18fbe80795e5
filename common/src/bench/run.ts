/**
 * `npm run bench -w common`: Mixmark's colour engine beside baselines run in the same
 * process (issue 3). Not a test: figures depend on the machine and its load. Each line
 * prints items per second from the median of 5 timed runs (after a warm-up) and the
 * ratio ours / baseline.
 */
import { differenceCiede2000 } from 'culori';
import sharp from 'sharp';
import { deltaE2000, deltaE2000Batch } from '../colour/difference/delta-e-2000.js';
import { seededRandom } from '../colour/fixtures/seeded-random.js';
import { regionMeanLinear } from '../colour/region/region-mean.js';
import { regionToLab } from '../colour/region/region-to-lab.js';
import { srgbChannelToLinear } from '../colour/srgb/convert-srgb-to-linear.js';
import type { Lab, Raster8 } from '../types/colour.js';
import { measure } from './measure.js';

const perSecond = (count: number, ms: number): number => (count / ms) * 1000;
const millions = (v: number): string => `${(v / 1e6).toFixed(1)} M/s`;
const line = (
  name: string,
  ours: number,
  baseline: number,
  baselineName: string,
  aim: string,
): void => {
  const ratio = ours / baseline;
  console.log(
    `${name.padEnd(34)} ours ${millions(ours).padStart(10)}   ${baselineName.padEnd(14)} ${millions(baseline).padStart(10)}   ratio ${ratio.toFixed(2)}×   (${aim})`,
  );
};

async function benchDeltaE(): Promise<void> {
  const pairs = 300_000;
  const random = seededRandom(2000);
  const first: Lab[] = [];
  const second: Lab[] = [];
  const packedFirst = new Float64Array(pairs * 3);
  const packedSecond = new Float64Array(pairs * 3);
  for (let i = 0; i < pairs; i++) {
    const x = { L: random() * 100, a: random() * 200 - 100, b: random() * 200 - 100 };
    const y = {
      L: x.L + random() * 10 - 5,
      a: x.a + random() * 10 - 5,
      b: x.b + random() * 10 - 5,
    };
    first.push(x);
    second.push(y);
    packedFirst.set([x.L, x.a, x.b], i * 3);
    packedSecond.set([y.L, y.a, y.b], i * 3);
  }
  // culori's ΔE00 converts to lab65 first; lab65 objects go through untouched (STACK.md).
  const culoriFirst = first.map((c) => ({ mode: 'lab65' as const, l: c.L, a: c.a, b: c.b }));
  const culoriSecond = second.map((c) => ({ mode: 'lab65' as const, l: c.L, a: c.a, b: c.b }));
  const culoriDe = differenceCiede2000();
  let sink = 0;
  const culori = await measure(() => {
    for (let i = 0; i < pairs; i++) sink += culoriDe(culoriFirst[i], culoriSecond[i]);
  });
  const ours = await measure(() => {
    for (let i = 0; i < pairs; i++) sink += deltaE2000(first[i], second[i]);
  });
  const out = new Float64Array(pairs);
  const batch = await measure(() => deltaE2000Batch(packedFirst, packedSecond, out));
  const base = perSecond(pairs, culori.median);
  line(
    'ΔE00 pairs, deltaE2000(lab, lab)',
    perSecond(pairs, ours.median),
    base,
    'culori',
    'aim ≥ 2×',
  );
  line('ΔE00 pairs, deltaE2000Batch', perSecond(pairs, batch.median), base, 'culori', 'aim ≥ 2×');
  if (sink === 42) console.log(''); // keeps the loops from being optimised away
}

function makeRegion(width: number, height: number): Raster8 {
  // A painted-looking region: a smooth two-colour gradient with seeded pixel noise.
  const random = seededRandom(1999);
  const data = new Uint8Array(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const t = x / (width - 1);
      const i = (y * width + x) * 3;
      const noise = (): number => (random() - 0.5) * 24;
      data[i] = Math.max(0, Math.min(255, Math.round(220 - 150 * t + noise())));
      data[i + 1] = Math.max(0, Math.min(255, Math.round(180 - 60 * t + noise())));
      data[i + 2] = Math.max(0, Math.min(255, Math.round(90 + 120 * t + noise())));
    }
  }
  return { data, width, height, channels: 3 };
}

async function benchRegion(): Promise<void> {
  const width = 2000;
  const height = 1000;
  const pixels = width * height;
  const region = makeRegion(width, height);
  sharp.concurrency(1); // one libvips thread: the aim is "on one core"
  sharp.cache(false);
  const raw = { raw: { width, height, channels: 3 as const } };

  let vipsLab: Float32Array | undefined;
  const vips = await measure(async () => {
    // depth 'float' keeps libvips' own float Lab (the default 'uchar' would cast it to 8 bits).
    const buffer = await sharp(region.data, raw)
      .toColourspace('lab')
      .raw({ depth: 'float' })
      .toBuffer();
    vipsLab = new Float32Array(
      buffer.buffer.slice(buffer.byteOffset, buffer.byteOffset + buffer.byteLength),
    );
  });
  // The same conversion cast to 8 bits on output (sharp's default raw depth): less to copy.
  const vips8 = await measure(() => sharp(region.data, raw).toColourspace('lab').raw().toBuffer());
  const out = new Float32Array(pixels * 3);
  const ours = await measure(() => regionToLab(region, undefined, out));
  const ourLab = perSecond(pixels, ours.median);
  line(
    'per-pixel sRGB→Lab, 2 MP',
    ourLab,
    perSecond(pixels, vips.median),
    'libvips float',
    'aim ≥ 0.8×',
  );
  line('', ourLab, perSecond(pixels, vips8.median), 'libvips uchar', 'aim ≥ 0.8×');
  if (vipsLab) {
    let worst = 0;
    for (let i = 0; i < out.length; i++) worst = Math.max(worst, Math.abs(out[i] - vipsLab[i]));
    console.log(
      `${''.padEnd(34)} (largest |ours − libvips| over all L*, a*, b*: ${worst.toFixed(3)})`,
    );
  }

  const mean = await measure(() => regionMeanLinear(region));
  const naiveSpan = 500_000; // the power-function loop is slow: time a quarter of the region
  const naive = await measure(() => {
    const data = region.data.subarray(0, naiveSpan * 3);
    let r = 0;
    let g = 0;
    let b = 0;
    for (let i = 0; i < data.length; i += 3) {
      r += srgbChannelToLinear(data[i] / 255);
      g += srgbChannelToLinear(data[i + 1] / 255);
      b += srgbChannelToLinear(data[i + 2] / 255);
    }
    return r + g + b;
  }, 3);
  const stats = await measure(() => sharp(region.data, raw).stats());
  const ourMean = perSecond(pixels, mean.median);
  line(
    'region mean in linear light, 2 MP',
    ourMean,
    perSecond(pixels, naive.median),
    'pow loop',
    'aim ≥ 200 M px/s',
  );
  line('', ourMean, perSecond(pixels, stats.median), 'sharp stats()', 'encoded means, for scale');
}

console.log(`Mixmark colour engine bench (Node ${process.version}, one thread)`);
await benchDeltaE();
await benchRegion();
