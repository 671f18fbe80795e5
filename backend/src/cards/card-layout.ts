import { lightnessFromY, srgbChannelToLinear, yFromLightness } from '@mixmark/common';
import { greyLevel8 } from './card-drawing';
import { cardIdFor, isCardId } from './card-id';
import { resolveSteps } from './card-kinds';
import type { CardKind, CardLayout, CardPatch, MmRect } from './card-layout.types';
import { encodeCardPayload } from './card-payload';

/** The layout version this generator draws by default; the markers carry it. */
export const cardLayoutVersion = 2;

/** Every layout version that can still be measured (cards already printed keep working). */
export const cardLayoutVersions = [1, 2] as const;
export type CardLayoutVersion = (typeof cardLayoutVersions)[number];

/** Card size (mm): fits A4 and US Letter with margins to spare. */
const cardWidth = 190;
const cardHeight = 130;
/** QR symbol side (mm) and its inset from the card edge (≥ the 4-module quiet zone). */
const markerSize = 26;
const markerInset = 6;
/** QR version 2 has 25 modules and an alignment pattern, which jsQR uses for the 4th point. */
const markerModules = 25;

const grey18 = lightnessFromY(0.18);

/**
 * Version 1's tone ramp: paper white, then greys evenly spaced in L* down to near black, with
 * the nominal 18 % grey (L* 49.5) in the middle; L* 20 is about as dark as a matte print
 * reliably gets. Its three mid-greys are all printed at the nominal 18 %.
 */
const rampLightnessV1 = [100, 90, 80, 70, 60, grey18, 40, 30, 20];
const greyLightnessV1 = [grey18, grey18, grey18];

/**
 * Version 2's tone ramp: eighteen steps, every 5 L* from paper to L* 55, the nominal 18 %
 * grey, then every 5 L* to 30 and closer steps to L* 20, where flare bends the camera's curve
 * most. A photo's JPEG rounds each flat patch to about one value per 8 × 8 block (16 × 16
 * for chroma), an error noise does not average out; twice the steps let a smoothing fit
 * average those errors instead of passing through each one.
 */
const rampLightnessV2 = [
  100,
  95,
  90,
  85,
  80,
  75,
  70,
  65,
  60,
  55,
  grey18,
  45,
  40,
  35,
  30,
  26,
  23,
  20,
];
/** Version 2's mid-greys: near 18 % but each at its own 8-bit level (about 5 codes apart,
 * none the ramp's), so the JPEG's rounding of each is its own and the fit averages them. */
const greyLightnessV2 = [47.5, 51.5, 53.5];

/** Where the windows go: the middle band between the ramp and the printed notes. */
const windowArea: MmRect = { x: 38, y: 36, w: 114, h: 56 };

/** A patch at nominal L*, stored as what the file really carries: the 8-bit grey level
 * nearest to it, decoded back (IEC 61966-2-1), so the correction is fitted to the truth. */
function neutralPatch(name: string, role: CardPatch['role'], rect: MmRect, L: number): CardPatch {
  const Y = L >= 100 ? 1 : srgbChannelToLinear(greyLevel8(yFromLightness(L)) / 255);
  return { name, role, ...rect, lab: { L: lightnessFromY(Y), a: 0, b: 0 }, Y };
}

/** Version 1's ramp: one row of nine 12 × 22 mm patches along the top, paper first. */
function rampV1(): CardPatch[] {
  return rampLightnessV1.map((L, i) =>
    neutralPatch(`ramp-${i}`, 'ramp', { x: 38 + i * 12.75, y: 8, w: 12, h: 22 }, L),
  );
}

/** Version 2's ramp: the same band in two rows of 12 × 10.5 mm patches, the steps zigzag
 * (even steps on top, odd below) so lightness still falls from left to right. */
function rampV2(): CardPatch[] {
  return rampLightnessV2.map((L, i) =>
    neutralPatch(
      `ramp-${i}`,
      'ramp',
      { x: 38 + (i >> 1) * 12.75, y: i % 2 ? 19.5 : 8, w: 12, h: 10.5 },
      L,
    ),
  );
}

/** A row of `count` squares of side `size` and gap `gap`, centred in the window area at `y`. */
function row(count: number, size: number, gap: number, y: number): MmRect[] {
  const total = count * size + (count - 1) * gap;
  const x0 = windowArea.x + (windowArea.w - total) / 2;
  return Array.from({ length: count }, (_, i) => ({
    x: x0 + i * (size + gap),
    y,
    w: size,
    h: size,
  }));
}

/** The windows for a kind: sized for a typical test swatch of 2 to 3 cm. */
function windowsFor(kind: CardKind, steps: number): MmRect[] {
  const midY = windowArea.y + windowArea.h / 2;
  switch (kind) {
    case 'graded-wash':
      return [{ x: 40, y: midY - 12, w: 110, h: 24 }];
    case 'temperature-pair':
      return row(2, 28, 12, midY - 14);
    case 'value-ladder': {
      if (steps <= 4) return row(steps, 24, 6, midY - 12);
      const top = Math.ceil(steps / 2);
      return [
        ...row(top, 19, 4.75, windowArea.y + 2),
        ...row(steps - top, 19, 4.75, windowArea.y + 31),
      ];
    }
    default:
      return row(1, 30, 0, midY - 15);
  }
}

/** Small labels just above the windows: step numbers, or which of a pair is which. */
function windowLabels(kind: CardKind, windows: MmRect[]): CardLayout['texts'] {
  const names =
    kind === 'temperature-pair'
      ? ['warmer', 'cooler']
      : kind === 'value-ladder'
        ? windows.map((_, i) => `${i + 1}`)
        : [];
  return names.map((text, i) => ({ x: windows[i].x, y: windows[i].y - 0.9, size: 1.8, text }));
}

/**
 * The data of a reference card in millimetres (190 × 130 mm): four QR corner markers, a
 * neutral ramp along the top, mid-grey patches left, right and below the windows (to see
 * uneven light), the windows for the drill kind, a 50 mm scale bar and short printed
 * instructions. The generator draws from this and the measurement reads from it; nothing on
 * the card is placed anywhere else. Version 2 (the default) has an 18-step ramp in two rows
 * and mid-greys at three slightly different levels; version 1 (nine steps in one row, the
 * mid-greys all at 18 %) is kept so cards already printed still measure.
 *
 * @param options - kind, steps (value-ladder: 2 to 9), either an id or a seed for one, and
 *   the layout version (default the current one)
 * @returns the layout
 * @throws Error for a bad step count, id or version
 * @example
 * buildCardLayout({ kind: 'value-ladder', steps: 5 }).windows.length; // 5
 */
export function buildCardLayout(options: {
  kind: CardKind;
  steps?: number;
  id?: string;
  version?: number;
}): CardLayout {
  const { kind } = options;
  const version = options.version ?? cardLayoutVersion;
  if (!cardLayoutVersions.includes(version as CardLayoutVersion)) {
    throw new Error(
      `Expected one of ${cardLayoutVersions.join(', ')} for version but received ${version}`,
    );
  }
  const steps = resolveSteps(kind, options.steps);
  const id = options.id ?? cardIdFor(`${kind}/${steps}`);
  if (!isCardId(id)) {
    throw new Error(`Expected 8 characters 0-9 A-Z for id but received ${id}`);
  }
  const far = cardWidth - markerInset - markerSize;
  const low = cardHeight - markerInset - markerSize;
  const corners: [number, number][] = [
    [markerInset, markerInset],
    [far, markerInset],
    [far, low],
    [markerInset, low],
  ];
  const markers = corners.map(([x, y], corner) => ({
    x,
    y,
    w: markerSize,
    h: markerSize,
    corner: corner as 0 | 1 | 2 | 3,
    modules: markerModules,
    payload: encodeCardPayload({
      version,
      corner: corner as 0,
      kind,
      steps,
      id,
    }),
  }));
  const ramp = version === 1 ? rampV1() : rampV2();
  const [left, right, bottom] = version === 1 ? greyLightnessV1 : greyLightnessV2;
  const greys = [
    neutralPatch('grey-left', 'grey', { x: 9, y: 38, w: 18, h: 54 }, left),
    neutralPatch('grey-right', 'grey', { x: 163, y: 38, w: 18, h: 54 }, right),
    neutralPatch('grey-bottom', 'grey', { x: 38, y: 100, w: 18, h: 24 }, bottom),
  ];
  const windows = windowsFor(kind, steps);
  const labels = windowLabels(kind, windows);
  const kindName = steps > 1 && kind === 'value-ladder' ? `${kind}, ${steps} steps` : kind;
  return {
    version,
    id,
    kind,
    steps,
    width: cardWidth,
    height: cardHeight,
    markers,
    patches: [...ramp, ...greys],
    windows,
    scaleBar: { x: 60, y: 119, w: 50, h: 2 },
    texts: [
      {
        x: 60,
        y: 102.5,
        size: 3,
        text: `Mixmark card · ${kindName} · ${id} · v${version}`,
      },
      {
        x: 60,
        y: 107,
        size: 2.2,
        text: 'Cut out the windows along the dashed lines. Lay the card flat on the',
      },
      {
        x: 60,
        y: 110.5,
        size: 2.2,
        text: 'dry swatch, in even light, and photograph it square on, no flash.',
      },
      {
        x: 60,
        y: 114.5,
        size: 2.2,
        text: 'Print at 100 %, no scaling, matte paper. Keep markers uncovered.',
      },
      { x: 112, y: 121, size: 2.2, text: '50 mm: check with a ruler' },
      ...labels,
    ],
  };
}
