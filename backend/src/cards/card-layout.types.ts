import type { Lab } from '@mixmark/common';

/** Drill kinds a card can be printed for (PRODUCT.md vocabulary). */
export type CardKind =
  'match' | 'neutral' | 'flat-wash' | 'temperature-pair' | 'value-ladder' | 'graded-wash';

/** An axis-aligned rectangle on the card, in millimetres from the card's top-left corner. */
export type MmRect = { x: number; y: number; w: number; h: number };

/** A printed neutral patch: its place and its nominal colour (paper white is L* 100). */
export type CardPatch = MmRect & {
  /** Stable name, e.g. `ramp-0` (paper) … `ramp-17` (v2; `ramp-8` in v1), `grey-left`. */
  name: string;
  /** What the patch is for: the tone ramp, or the mid-greys that check evenness of light. */
  role: 'ramp' | 'grey';
  /** Nominal CIELAB (D65) relative to the paper, which is taken as L* 100. */
  lab: Lab;
  /** Nominal luminance factor Y (0..1, paper = 1) the correction is fitted to. */
  Y: number;
};

/** One corner marker: a QR code whose text names the card and which corner it sits in. */
export type CardMarker = MmRect & {
  /** 0 top-left, 1 top-right, 2 bottom-right, 3 bottom-left (clockwise). */
  corner: 0 | 1 | 2 | 3;
  /** The QR code's text. */
  payload: string;
  /** Modules across the symbol (25 for QR version 2), without the quiet zone. */
  modules: number;
};

/** The full description of one card, in millimetres: what the generator draws and the
 * measurement reads. Everything on the card comes from here. */
export type CardLayout = {
  /** Layout version; part of every marker's payload. */
  version: number;
  /** Card id (8 characters, 0-9 A-Z). */
  id: string;
  kind: CardKind;
  /** Number of windows. */
  steps: number;
  /** Card size in mm. */
  width: number;
  height: number;
  markers: CardMarker[];
  patches: CardPatch[];
  /** Cut-out windows through which the swatch is seen, in reading order. */
  windows: MmRect[];
  /** Where the 50 mm scale bar is printed. */
  scaleBar: MmRect;
  /** Short printed texts: [x, y (baseline), size in mm, text]. */
  texts: { x: number; y: number; size: number; text: string }[];
};
