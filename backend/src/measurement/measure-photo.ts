import { labToLch } from '@mixmark/common';
import type { CardLayout, MmRect } from '../cards/card-layout.types';
import {
  fitColourCorrection,
  type ColourCorrection,
  type PatchObservation,
} from './colour-correction';
import { decodePhoto, type DecodedPhoto, type PhotoLimits } from './decode-photo';
import { edgeWidthMm } from './edge-width';
import { findCard, type CardDetection } from './find-card';
import { applyHomography } from './homography';
import { issue } from './issue-messages';
import { latticeShift, shiftedTable } from './jpeg-lattice';
import { PhotoFileError, type MeasurementIssue } from './measurement-issue';
import { readWindow, type CodeShift, type WindowReading } from './read-window';
import { kthSmallest, trimmedMeanOfCodes } from './robust-statistics';
import { scratchF64 } from './scratch';
import { insetRect, pixelsPerMm, sampleCardRect, type CardSamples } from './sample-card';
import { srgb8ToLinearLut } from '@mixmark/common';

/** What was found of the card. */
export type CardSummary = {
  id: string;
  kind: CardLayout['kind'];
  steps: number;
  version: number;
  /** Corners whose markers were read (0 top-left, clockwise). */
  markers: number[];
  /** The card's corners in the original photo's pixels (upright), clockwise from top-left. */
  corners: [number, number][];
  /** RMS reprojection error of the marker points, in original pixels. */
  fitError: number;
  /** Photo pixels per card millimetre at the card's centre (original resolution). */
  pixelsPerMm: number;
  /** Light across the card: max/min − 1 over the mid-grey patches. */
  unevenness?: number;
};

/** The outcome of measuring a photo (the CLI prints this as JSON). */
export type MeasurementResult = {
  ok: boolean;
  errors: MeasurementIssue[];
  warnings: MeasurementIssue[];
  card: CardSummary | null;
  readings: WindowReading[];
};

/** Time spent in each stage, ms (for the benchmark). */
export type MeasurementTimings = { decode: number; detect: number; fit: number; sample: number };

/** Everything the overlay needs besides the result. */
export type MeasurementDetail = {
  result: MeasurementResult;
  photo?: DecodedPhoto;
  detection?: CardDetection;
  timings: MeasurementTimings;
};

/** Limits of the quality gates (design choices checked on the synthetic suite, not a standard). */
export const gateLimits = {
  /** Paper patch, brightest channel (8-bit code): below this the photo is too dark. */
  darkError: 40,
  darkWarning: 70,
  /** Share of clipped pixels (any channel ≥ 250) on the paper patch: overexposed. */
  brightError: 0.5,
  /** Share of clipped pixels in a window or grey patch: glare. */
  glareError: 0.02,
  glareWarning: 0.002,
  /** Share of pixels far brighter than the window's own median: a reflection. */
  hotError: 0.04,
  /** 10–90 % edge width (mm on the card). */
  blurError: 1.2,
  blurWarning: 0.7,
  /** Light across the card, max/min − 1 over the mid-greys (0.35 ≈ half a stop). */
  unevenError: 0.35,
  unevenWarning: 0.12,
  /** Departure of the light from a plane (the part the correction cannot follow). */
  nonPlanarError: 0.1,
  nonPlanarWarning: 0.04,
  /** A window reading at least this light and this grey is bare paper. */
  unpaintedL: 94,
  unpaintedC: 4,
};

const clipped = (s: CardSamples): number => {
  let count = 0;
  const n = s.nx * s.ny;
  for (let k = 0; k < n; k++) {
    if (s.codes[3 * k] >= 250 || s.codes[3 * k + 1] >= 250 || s.codes[3 * k + 2] >= 250) count++;
  }
  return count / n;
};

function observePatch(samples: CardSamples, shift?: CodeShift): [number, number, number] {
  return [0, 1, 2].map((c) =>
    trimmedMeanOfCodes(
      samples.codes,
      c,
      3,
      shift
        ? shiftedTable(srgb8ToLinearLut, shift[c], scratchF64('patch-table', 256))
        : srgb8ToLinearLut,
      0.1,
    ),
  ) as [number, number, number];
}

const centre = (r: MmRect): [number, number] => [r.x + r.w / 2, r.y + r.h / 2];
const round2 = (v: number): number => Math.round(v * 100) / 100;

/** Inset for sampling (mm): clear of the print edges, the cut edge and its shadow. */
const patchInset = (r: MmRect): number => Math.max(1.2, 0.12 * Math.min(r.w, r.h));
const windowInset = (r: MmRect): number => Math.max(2.5, 0.15 * Math.min(r.w, r.h));

function summarise(
  detection: CardDetection,
  photo: DecodedPhoto,
  correction?: ColourCorrection,
): CardSummary {
  const { layout, homography: h } = detection;
  const s = photo.scale;
  const corners = [
    [0, 0],
    [layout.width, 0],
    [layout.width, layout.height],
    [0, layout.height],
  ].map(([x, y]) => {
    const p = applyHomography(h, x, y);
    return [round2(p.x / s), round2(p.y / s)] as [number, number];
  });
  return {
    id: layout.id,
    kind: layout.kind,
    steps: layout.steps,
    version: layout.version,
    markers: detection.found,
    corners,
    fitError: round2(detection.rmsError / s),
    pixelsPerMm: round2(pixelsPerMm(h, layout.width / 2, layout.height / 2) / s),
    ...(correction ? { unevenness: round2(correction.unevenness) } : {}),
  };
}

/**
 * Measures a decoded photo: finds the card, samples its patches, fits the correction, runs
 * the quality gates and reads every window.
 *
 * @param photo - from `decodePhoto`
 * @returns the result and what the overlay needs
 */
export function measureDecoded(
  photo: DecodedPhoto,
  timings: MeasurementTimings = { decode: 0, detect: 0, fit: 0, sample: 0 },
): MeasurementDetail {
  const errors: MeasurementIssue[] = [];
  const warnings: MeasurementIssue[] = [];
  const done = (
    card: CardSummary | null,
    readings: WindowReading[] = [],
    detection?: CardDetection,
  ): MeasurementDetail => ({
    result: {
      ok: errors.length === 0,
      errors,
      warnings,
      card,
      readings: errors.length ? [] : readings,
    },
    photo,
    detection,
    timings,
  });
  let t = performance.now();
  const detection = findCard(photo.raster);
  timings.detect = performance.now() - t;
  if (!detection) {
    errors.push(issue('CARD_NOT_FOUND'));
    return done(null);
  }
  const { layout, homography: h } = detection;
  const { raster } = photo;
  // Three markers locate the card well (two dozen points); a fourth that is hidden inside
  // the frame is only a warning. One outside the frame, or two missing, is an error.
  for (const m of detection.missing) {
    if (m.outside)
      errors.push(
        issue('CARD_PARTLY_OUTSIDE', `Corner code ${m.corner + 1} is outside the photo.`),
      );
    else if (detection.found.length < 3)
      errors.push(issue('CARD_COVERED', `Corner code ${m.corner + 1} could not be read.`));
    else
      warnings.push(
        issue(
          'CARD_COVERED',
          `Corner code ${m.corner + 1} could not be read; the card was located from the other three.`,
        ),
      );
  }
  if (errors.length) return done(summarise(detection, photo), [], detection);

  t = performance.now();
  const patchSamples = layout.patches.map((p) =>
    sampleCardRect(raster, h, insetRect(p, patchInset(p)), 48),
  );
  const windowSamples = layout.windows.map((w) =>
    sampleCardRect(raster, h, insetRect(w, windowInset(w))),
  );
  if ([...patchSamples, ...windowSamples].some((s) => s.outside > 0)) {
    errors.push(issue('CARD_PARTLY_OUTSIDE', 'Some patches or windows are outside the photo.'));
    return done(summarise(detection, photo), [], detection);
  }
  timings.sample = performance.now() - t;

  t = performance.now();
  const paperIndex = layout.patches.findIndex((p) => p.role === 'ramp' && p.Y >= 1);
  const paper = observePatch(patchSamples[paperIndex]);
  const paperCode = Math.max(...paper.map((v) => srgb8ToLinearLut.findIndex((l) => l >= v)));
  if (clipped(patchSamples[paperIndex]) > gateLimits.brightError) {
    errors.push(issue('TOO_BRIGHT'));
  } else if (paperCode < gateLimits.darkError) {
    errors.push(issue('TOO_DARK'));
  } else if (paperCode < gateLimits.darkWarning) {
    warnings.push(
      issue('TOO_DARK', 'It can still be measured, but a brighter photo would be more accurate.'),
    );
  }
  layout.patches.forEach((p, i) => {
    if (i === paperIndex || errors.length) return;
    const share = clipped(patchSamples[i]);
    if (share > gateLimits.glareError)
      errors.push(issue('GLARE', `It is on the card's grey patch ${p.name}.`));
  });
  if (errors.length) return done(summarise(detection, photo), [], detection);

  // A flat patch's or window's chroma is snapped to the JPEG's own DC lattice when the file
  // allows it (jpeg-lattice.ts): the decoder's roundings of it are then not read as colour.
  const lattice = 'lattice' in photo.chroma ? photo.chroma.lattice : undefined;
  const shiftOf = (s: CardSamples): CodeShift | undefined =>
    lattice ? latticeShift(s.codes, lattice) : undefined;
  const observations: PatchObservation[] = layout.patches.map((p, i) => {
    const [x, y] = centre(p);
    const linear = observePatch(patchSamples[i], shiftOf(patchSamples[i]));
    return { name: p.name, role: p.role, Y: p.Y, x, y, linear };
  });
  const correction = fitColourCorrection(observations);
  timings.fit = performance.now() - t;
  const card = summarise(detection, photo, correction);

  if (
    correction.unevenness > gateLimits.unevenError ||
    correction.nonPlanar > gateLimits.nonPlanarError
  ) {
    errors.push(
      issue(
        'UNEVEN_LIGHT',
        `The mid-grey patches differ by ${Math.round(correction.unevenness * 100)} %.`,
      ),
    );
  } else if (
    correction.unevenness > gateLimits.unevenWarning ||
    correction.nonPlanar > gateLimits.nonPlanarWarning
  ) {
    warnings.push(
      issue(
        'UNEVEN_LIGHT',
        `The mid-grey patches differ by ${Math.round(correction.unevenness * 100)} %; the reading was corrected for it.`,
      ),
    );
  }
  const greys = layout.patches.filter((p) => p.role === 'grey');
  const widths = greys
    .map((g) => edgeWidthMm(raster, h, g.x + g.w, g.y + 0.25 * g.h, g.y + 0.75 * g.h))
    .filter(Number.isFinite)
    .sort((a, b) => a - b);
  const blur = widths.length ? widths[Math.floor(widths.length / 2)] : Infinity;
  if (blur > gateLimits.blurError) errors.push(issue('BLURRED'));
  else if (blur > gateLimits.blurWarning)
    warnings.push(
      issue('BLURRED', 'It can still be measured, but a sharper photo would be better.'),
    );

  t = performance.now();
  const readings: WindowReading[] = [];
  windowSamples.forEach((samples, i) => {
    const share = clipped(samples);
    const reading = readWindow(samples, correction, i, shiftOf(samples));
    const hot = hotShare(samples, correction);
    if (share > gateLimits.glareError || hot > gateLimits.hotError) {
      errors.push(issue('GLARE', `It is on window ${i + 1}.`, i));
    } else if (share > gateLimits.glareWarning) {
      warnings.push(
        issue('GLARE', `A little of it is on window ${i + 1}; bright pixels were left out.`, i),
      );
    }
    const lch = labToLch(reading.lab);
    if (reading.lab.L >= gateLimits.unpaintedL && lch.C <= gateLimits.unpaintedC) {
      errors.push(issue('WINDOW_NOT_PAINTED', `Window ${i + 1} reads as bare paper.`, i));
    }
    readings.push(reading);
  });
  timings.sample += performance.now() - t;
  return done(card, readings, detection);
}

/** Share of a window's pixels much brighter than its median: a reflection, not paint. */
function hotShare(samples: CardSamples, correction: ColourCorrection): number {
  const n = samples.nx * samples.ny;
  const g = correction.tables[1];
  const values = scratchF64('hot', n);
  for (let k = 0; k < n; k++) values[k] = g[samples.codes[3 * k + 1]];
  const median = kthSmallest(values, n >> 1);
  let hot = 0;
  for (let k = 0; k < n; k++) if (values[k] > median * 1.5 + 0.12) hot++;
  return hot / n;
}

/**
 * Measures a photo file end to end: decode (EXIF orientation, sRGB, limits), find the card,
 * correct, gate and read. Never throws for a bad photo: every problem comes back as an error
 * code in the result. The same bytes always give the same result.
 *
 * @param bytes - the photo file
 * @param options - input limits and working size
 * @returns the result and the detail the overlay needs
 * @example
 * const { result } = await measurePhoto(await readFile('swatch.jpg'));
 */
export async function measurePhoto(
  bytes: Buffer,
  options: { limits?: PhotoLimits; maxSide?: number } = {},
): Promise<MeasurementDetail> {
  const t = performance.now();
  let photo: DecodedPhoto;
  try {
    photo = await decodePhoto(bytes, options);
  } catch (error) {
    if (!(error instanceof PhotoFileError)) throw error;
    return {
      result: {
        ok: false,
        errors: [{ code: error.code, message: error.message }],
        warnings: [],
        card: null,
        readings: [],
      },
      timings: { decode: performance.now() - t, detect: 0, fit: 0, sample: 0 },
    };
  }
  return measureDecoded(photo, { decode: performance.now() - t, detect: 0, fit: 0, sample: 0 });
}
