import { cardKindCodes, isCardKind } from './card-kinds';
import type { CardKind } from './card-layout.types';

/** What a marker's QR code says. */
export type CardPayload = {
  version: number;
  corner: 0 | 1 | 2 | 3;
  kind: CardKind;
  steps: number;
  id: string;
};

const pattern = /^MXM(\d+)\/([0-3])\/([A-Z])([1-9])\/([0-9A-Z]{8})$/;

/**
 * The text of a corner marker: `MXM<version>/<corner>/<kind code><steps>/<id>`, e.g.
 * `MXM1/0/L5/K7Q2M4XZ`. Upper case, digits and `/` only, so it fits QR alphanumeric mode
 * (ISO/IEC 18004 §7.4.4) in a version 2 symbol.
 *
 * @param payload - the fields
 * @returns the marker text
 * @example
 * encodeCardPayload({ version: 1, corner: 0, kind: 'match', steps: 1, id: 'AB12CD34' });
 * // 'MXM1/0/M1/AB12CD34'
 */
export function encodeCardPayload(payload: CardPayload): string {
  const code = cardKindCodes[payload.kind];
  return `MXM${payload.version}/${payload.corner}/${code}${payload.steps}/${payload.id}`;
}

/**
 * Reads a marker's text back; `undefined` for text that is not a Mixmark marker.
 *
 * @param text - decoded QR text
 * @returns the fields, or undefined
 * @example
 * decodeCardPayload('MXM1/2/T2/AB12CD34')?.corner; // 2
 */
export function decodeCardPayload(text: string): CardPayload | undefined {
  const match = pattern.exec(text);
  if (!match) return undefined;
  const kind = (Object.keys(cardKindCodes) as CardKind[]).find(
    (k) => cardKindCodes[k] === match[3],
  );
  if (!isCardKind(kind)) return undefined;
  return {
    version: Number(match[1]),
    corner: Number(match[2]) as 0 | 1 | 2 | 3,
    kind,
    steps: Number(match[4]),
    id: match[5],
  };
}
