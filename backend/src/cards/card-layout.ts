import { lightnessFromY, srgbChannelToLinear, yFromLightness } from '@mixmark/common';
import { greyLevel8 } from './card-drawing';
import { cardIdFor, isCardId } from './card-id';
import { resolveSteps } from './card-kinds';
import type { CardKind, CardLayout, CardPatch, MmRect } from './card-layout.types';
import { encodeCardPayload } from './card-payload';

/** The layout version this generator draws; the markers carry it. */
export const cardLayoutVersion = 1;

/** Card size (mm): fits A4 and US Letter with margins to spare. */
const cardWidth = 190;
const cardHeight = 130;
/** QR symbol side (mm) and its inset from the card edge (≥ the 4-module quiet zone). */
const markerSize = 26;
const markerInset = 6;
/** QR version 2 has 25 modules and an alignment pattern, which jsQR uses for the 4th point. */
const markerModules = 25;

/**
 * The tone ramp: paper white, then greys evenly spaced in L* down to near black, with the
 * nominal 18 % grey (L* 49.5) in the middle. Nine points are enough for a monotone curve per
 * channel; L* 20 is about as dark as a matte print reliably gets.
 */
const rampLightness = [100, 90, 80, 70, 60, lightnessFromY(0.18), 40, 30, 20];

/** Where the windows go: the middle band between the ramp and the printed notes. */
const windowArea: MmRect = { x: 38, y: 36, w: 114, h: 56 };

/** A patch at nominal L*, stored as what the file really carries: the 8-bit grey level
 * nearest to it, decoded back (IEC 61966-2-1), so the correction is fitted to the truth. */
function neutralPatch(name: string, role: CardPatch['role'], rect: MmRect, L: number): CardPatch {
  const Y = L >= 100 ? 1 : srgbChannelToLinear(greyLevel8(yFromLightness(L)) / 255);
  return { name, role, ...rect, lab: { L: lightnessFromY(Y), a: 0, b: 0 }, Y };
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
 * The data of a reference card, layout version 1, in millimetres (190 × 130 mm): four QR
 * corner markers, a nine-step neutral ramp along the top, mid-grey patches left, right and
 * below the windows (to see uneven light), the windows for the drill kind, a 50 mm scale bar
 * and short printed instructions. The generator draws from this and the measurement reads
 * from it; nothing on the card is placed anywhere else.
 *
 * @param options - kind, steps (value-ladder: 2 to 9) and either an id or a seed for one
 * @returns the layout
 * @throws Error for a bad step count or id
 * @example
 * buildCardLayout({ kind: 'value-ladder', steps: 5 }).windows.length; // 5
 */
export function buildCardLayout(options: {
  kind: CardKind;
  steps?: number;
  id?: string;
}): CardLayout {
  const { kind } = options;
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
      version: cardLayoutVersion,
      corner: corner as 0,
      kind,
      steps,
      id,
    }),
  }));
  const rampWidth = 12;
  const rampGap = 0.75;
  const ramp = rampLightness.map((L, i) =>
    neutralPatch(
      `ramp-${i}`,
      'ramp',
      { x: 38 + i * (rampWidth + rampGap), y: 8, w: rampWidth, h: 22 },
      L,
    ),
  );
  const grey = lightnessFromY(0.18);
  const greys = [
    neutralPatch('grey-left', 'grey', { x: 9, y: 38, w: 18, h: 54 }, grey),
    neutralPatch('grey-right', 'grey', { x: 163, y: 38, w: 18, h: 54 }, grey),
    neutralPatch('grey-bottom', 'grey', { x: 38, y: 100, w: 18, h: 24 }, grey),
  ];
  const windows = windowsFor(kind, steps);
  const labels = windowLabels(kind, windows);
  const kindName = steps > 1 && kind === 'value-ladder' ? `${kind}, ${steps} steps` : kind;
  return {
    version: cardLayoutVersion,
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
        text: `Mixmark card · ${kindName} · ${id} · v${cardLayoutVersion}`,
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
