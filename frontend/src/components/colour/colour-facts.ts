import {
  labToHex,
  labToLch,
  labToSrgb,
  munsellValueFromY,
  warmCoolIndex,
  yFromLightness,
  type Lab,
} from '@mixmark/common';

/** What a painter and a colour scientist each read off one CIELAB colour. */
export type ColourFacts = {
  hex: string;
  L: number;
  C: number;
  h: number;
  /** Munsell value 0–10 (ASTM D1535), the painter's value scale. */
  value: number;
  /** Ou et al. warm–cool index: positive warm, negative cool. */
  warmCool: number;
  inGamut: boolean;
};

export function colourFacts(lab: Lab): ColourFacts {
  const lch = labToLch(lab);
  return {
    hex: labToHex(lab),
    L: lch.L,
    C: lch.C,
    h: lch.h,
    value: munsellValueFromY(yFromLightness(lab.L)),
    warmCool: warmCoolIndex(lab),
    inGamut: labToSrgb(lab).inGamut,
  };
}

/** Warm, cool or in between, by the warm–cool index (−0.5 is where every neutral sits). */
export function temperatureWord(warmCool: number): string {
  if (warmCool > 0.3) return 'warm';
  if (warmCool > -0.2) return 'mildly warm';
  if (warmCool < -0.8) return 'cool';
  return 'neutral to cool';
}
