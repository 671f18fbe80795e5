import type { Lab } from '../../types/colour.js';

/** Parametric weights of CIEDE2000 (all 1 under the reference conditions; textiles use kL = 2). */
export type DeltaE2000Weights = { kL?: number; kC?: number; kH?: number };

/**
 * CIEDE2000 broken into its parts. Differences are "second minus first": pass the
 * target first and the reading second, and a positive `deltaLPrime` means the reading
 * is lighter.
 */
export type DeltaE2000Parts = {
  /** The total ΔE00. */
  deltaE: number;
  /** ΔL′ = L₂ − L₁. */
  deltaLPrime: number;
  /** ΔC′ = C′₂ − C′₁. */
  deltaCPrime: number;
  /** ΔH′ = 2√(C′₁C′₂)·sin(Δh′/2), the metric hue difference. */
  deltaHPrime: number;
  /** Δh′, the hue-angle difference in degrees (−180..180), 0 when either colour is neutral. */
  deltahPrime: number;
  /** ΔL′ / (kL·SL). */
  lightnessTerm: number;
  /** ΔC′ / (kC·SC). */
  chromaTerm: number;
  /** ΔH′ / (kH·SH). */
  hueTerm: number;
  /** RT·(ΔC′/(kC·SC))·(ΔH′/(kH·SH)), the blue-region rotation term (may be negative). */
  rotationTerm: number;
  /** The intermediate values of Sharma, Wu & Dalal (2005) eqs. (2)–(22), hues in degrees. */
  intermediate: {
    G: number;
    a1Prime: number;
    a2Prime: number;
    C1Prime: number;
    C2Prime: number;
    h1Prime: number;
    h2Prime: number;
    hBarPrime: number;
    T: number;
    SL: number;
    SC: number;
    SH: number;
    RT: number;
  };
};

const pow25to7 = 6103515625; // 25^7
const TWO_PI = 2 * Math.PI;
const toDeg = 180 / Math.PI;
const rad = Math.PI / 180;
// Constants of T, eq. (15), for the multiple-angle form used below.
const cos30 = Math.cos(30 * rad);
const sin30 = Math.sin(30 * rad);
const cos6 = Math.cos(6 * rad);
const sin6 = Math.sin(6 * rad);
const cos63 = Math.cos(63 * rad);
const sin63 = Math.sin(63 * rad);

/**
 * sin x for 0 <= x <= π/3 (2Δθ of eq. 22 never exceeds 60°): its Taylor series to x¹⁷,
 * whose first omitted term is below 1.2e-16 there, i.e. as exact as Math.sin in double
 * precision and several times cheaper in V8.
 */
function sinSmall(x: number): number {
  const x2 = x * x;
  return (
    x *
    (1 +
      x2 *
        (-1 / 6 +
          x2 *
            (1 / 120 +
              x2 *
                (-1 / 5040 +
                  x2 *
                    (1 / 362880 +
                      x2 *
                        (-1 / 39916800 +
                          x2 *
                            (1 / 6227020800 +
                              x2 * (-1 / 1307674368000 + x2 / 355687428096000))))))))
  );
}

/** Scratch space for the parts, filled only when `deltaE2000Parts` asks for them. */
type Scratch = Float64Array;

/**
 * The whole CIEDE2000 formula, step by step as in Sharma, Wu & Dalal, "The CIEDE2000
 * color-difference formula: implementation notes, supplementary test data, and
 * mathematical observations", Color Res. Appl. 30(1):21–30 (2005), eqs. (1)–(22);
 * the formula itself is CIE 142-2001 / ISO/CIE 11664-6:2014. Works on plain numbers so
 * the hot path allocates nothing; `out` receives the parts when given.
 */
function ciede2000(
  L1: number,
  a1: number,
  b1: number,
  L2: number,
  a2: number,
  b2: number,
  kL: number,
  kC: number,
  kH: number,
  out?: Scratch,
): number {
  // (2)–(4): G lifts a* of low-chroma colours, where CIELAB's hue spacing is too tight.
  const Cab = (Math.sqrt(a1 * a1 + b1 * b1) + Math.sqrt(a2 * a2 + b2 * b2)) / 2;
  const Cab3 = Cab * Cab * Cab;
  const Cab7 = Cab3 * Cab3 * Cab;
  const G = 0.5 * (1 - Math.sqrt(Cab7 / (Cab7 + pow25to7)));
  // (5)–(6): a′ and C′.
  const a1p = (1 + G) * a1;
  const a2p = (1 + G) * a2;
  const C1p = Math.sqrt(a1p * a1p + b1 * b1);
  const C2p = Math.sqrt(a2p * a2p + b2 * b2);
  const CpProduct = C1p * C2p;

  // (7)–(14) without the hue angles themselves. With the unit hue vectors
  // uᵢ = (a′ᵢ, bᵢ)/C′ᵢ: |u₁ − u₂| = 2·|sin(Δh′/2)|, so ΔH′ = 2√(C′₁C′₂)·sin(Δh′/2) is
  // ±√(C′₁C′₂)·|u₁ − u₂|, signed like sin Δh′ (free of cancellation: identical hues give
  // exactly 0); and the mean hue h̄′, the middle of the shorter arc (Sharma eq. 14),
  // points along u₁ + u₂, so T needs no trigonometric call. A neutral (C′ = 0) has
  // h′ = 0 and Δh′ = 0 (eqs. 7, 10), so h̄′ is the other colour's hue.
  const dLp = L2 - L1;
  const dCp = C2p - C1p;
  let dHp = 0;
  let c1: number; // cos h̄′
  let s1: number; // sin h̄′
  let hbar: number; // h̄′ in radians, 0..2π
  if (CpProduct !== 0) {
    const inv1 = 1 / C1p;
    const inv2 = 1 / C2p;
    const ux1 = a1p * inv1;
    const uy1 = b1 * inv1;
    const ux2 = a2p * inv2;
    const uy2 = b2 * inv2;
    const dx = ux1 - ux2;
    const dy = uy1 - uy2;
    dHp = Math.sqrt(CpProduct * (dx * dx + dy * dy));
    if (ux1 * uy2 - ux2 * uy1 < 0) dHp = -dHp;
    const ux = ux1 + ux2;
    const uy = uy1 + uy2;
    const norm = Math.sqrt(ux * ux + uy * uy);
    if (norm > 1e-6) {
      c1 = ux / norm;
      s1 = uy / norm;
      hbar = Math.atan2(uy, ux);
      if (hbar < 0) hbar += TWO_PI;
    } else {
      // Hues (almost) exactly opposite: the mean is ill-defined, so follow Sharma's
      // case analysis on the angles literally (pairs 10 and 14 sit here).
      let h1 = Math.atan2(b1, a1p);
      if (h1 < 0) h1 += TWO_PI;
      let h2 = Math.atan2(b2, a2p);
      if (h2 < 0) h2 += TWO_PI;
      const d = h2 - h1;
      dHp =
        2 *
        Math.sqrt(CpProduct) *
        Math.sin((d > Math.PI ? d - TWO_PI : d < -Math.PI ? d + TWO_PI : d) / 2);
      hbar = h1 + h2;
      if (Math.abs(h1 - h2) > Math.PI) hbar += hbar < TWO_PI ? TWO_PI : -TWO_PI;
      hbar /= 2;
      c1 = Math.cos(hbar);
      s1 = Math.sin(hbar);
    }
  } else {
    // One or both neutral: h̄′ = h′₁ + h′₂, i.e. the hue of the one with chroma (or 0).
    const a = C1p !== 0 ? a1p : a2p;
    const b = C1p !== 0 ? b1 : b2;
    const C = C1p !== 0 ? C1p : C2p;
    c1 = C === 0 ? 1 : a / C;
    s1 = C === 0 ? 0 : b / C;
    hbar = C === 0 ? 0 : Math.atan2(b, a);
    if (hbar < 0) hbar += TWO_PI;
  }

  // (12)–(13): means.
  const Lbar = (L1 + L2) / 2;
  const Cbar = (C1p + C2p) / 2;

  // (15): T, with cos(n·h̄′ + θ) expanded from cos h̄′ and sin h̄′ (multiple angles).
  const c2 = 2 * c1 * c1 - 1;
  const s2 = 2 * s1 * c1;
  const c3 = c1 * (2 * c2 - 1);
  const s3 = s1 * (2 * c2 + 1);
  const c4 = 2 * c2 * c2 - 1;
  const s4 = 2 * s2 * c2;
  const T =
    1 -
    0.17 * (c1 * cos30 + s1 * sin30) +
    0.24 * c2 +
    0.32 * (c3 * cos6 - s3 * sin6) -
    0.2 * (c4 * cos63 + s4 * sin63);

  // (16)–(17): the rotation term's angle and chroma factor (blue region, h̄′ near 275°).
  // Far from 275° (|h̄′ − 275°| > 150°) exp(−x²) < 1e-16, so RT is 0 to double precision.
  const hx = (hbar * toDeg - 275) / 25;
  const dTheta = hx < -6 ? 0 : 30 * Math.exp(-hx * hx);
  const Cbar3 = Cbar * Cbar * Cbar;
  const Cbar7 = Cbar3 * Cbar3 * Cbar;
  const RC = 2 * Math.sqrt(Cbar7 / (Cbar7 + pow25to7));

  // (18)–(21): weighting functions.
  const Lm50 = (Lbar - 50) * (Lbar - 50);
  const SL = 1 + (0.015 * Lm50) / Math.sqrt(20 + Lm50);
  const SC = 1 + 0.045 * Cbar;
  const SH = 1 + 0.015 * Cbar * T;
  const RT = dTheta === 0 ? 0 : -sinSmall(2 * dTheta * rad) * RC;

  // (22): the total.
  const tL = dLp / (kL * SL);
  const tC = dCp / (kC * SC);
  const tH = dHp / (kH * SH);
  const rotation = RT * tC * tH;
  const dE = Math.sqrt(tL * tL + tC * tC + tH * tH + rotation);

  if (out !== undefined) {
    // The hue angles themselves are only needed for the reported parts.
    let h1p = b1 === 0 && a1p === 0 ? 0 : Math.atan2(b1, a1p);
    if (h1p < 0) h1p += TWO_PI;
    let h2p = b2 === 0 && a2p === 0 ? 0 : Math.atan2(b2, a2p);
    if (h2p < 0) h2p += TWO_PI;
    let dhp = 0;
    if (CpProduct !== 0) {
      dhp = h2p - h1p;
      if (dhp > Math.PI) dhp -= TWO_PI;
      else if (dhp < -Math.PI) dhp += TWO_PI;
    }
    out[0] = dE;
    out[1] = dLp;
    out[2] = dCp;
    out[3] = dHp;
    out[4] = dhp * toDeg;
    out[5] = tL;
    out[6] = tC;
    out[7] = tH;
    out[8] = rotation;
    out[9] = G;
    out[10] = a1p;
    out[11] = a2p;
    out[12] = C1p;
    out[13] = C2p;
    out[14] = h1p * toDeg;
    out[15] = h2p * toDeg;
    out[16] = hbar * toDeg;
    out[17] = T;
    out[18] = SL;
    out[19] = SC;
    out[20] = SH;
    out[21] = RT;
  }
  return dE;
}

/**
 * CIEDE2000 colour difference ΔE00 (CIE 142-2001; ISO/CIE 11664-6:2014), symmetric in
 * its arguments. Both colours must be CIELAB with the same white (Mixmark: D65).
 *
 * @param reference - the first colour (in grading: the target)
 * @param sample - the second colour (in grading: the reading)
 * @param weights - parametric factors kL, kC, kH (default 1)
 * @returns ΔE00
 * @example
 * deltaE2000({ L: 50, a: 2.6772, b: -79.7751 }, { L: 50, a: 0, b: -82.7485 }); // 2.0425 (Sharma pair 1)
 */
export function deltaE2000(reference: Lab, sample: Lab, weights?: DeltaE2000Weights): number {
  return ciede2000(
    reference.L,
    reference.a,
    reference.b,
    sample.L,
    sample.a,
    sample.b,
    weights?.kL ?? 1,
    weights?.kC ?? 1,
    weights?.kH ?? 1,
  );
}

/**
 * CIEDE2000 with its parts: ΔL′, ΔC′, ΔH′, the weighted terms and the rotation term,
 * so feedback can say which attribute dominates. Differences are sample − reference.
 *
 * @param reference - the first colour (in grading: the target)
 * @param sample - the second colour (in grading: the reading)
 * @param weights - parametric factors kL, kC, kH (default 1)
 * @returns the total and its parts
 * @example
 * const p = deltaE2000Parts({ L: 50, a: 20, b: 0 }, { L: 55, a: 20, b: 0 });
 * p.deltaLPrime; // 5 (the sample is lighter)
 */
export function deltaE2000Parts(
  reference: Lab,
  sample: Lab,
  weights?: DeltaE2000Weights,
): DeltaE2000Parts {
  const o = new Float64Array(22);
  ciede2000(
    reference.L,
    reference.a,
    reference.b,
    sample.L,
    sample.a,
    sample.b,
    weights?.kL ?? 1,
    weights?.kC ?? 1,
    weights?.kH ?? 1,
    o,
  );
  return {
    deltaE: o[0],
    deltaLPrime: o[1],
    deltaCPrime: o[2],
    deltaHPrime: o[3],
    deltahPrime: o[4],
    lightnessTerm: o[5],
    chromaTerm: o[6],
    hueTerm: o[7],
    rotationTerm: o[8],
    intermediate: {
      G: o[9],
      a1Prime: o[10],
      a2Prime: o[11],
      C1Prime: o[12],
      C2Prime: o[13],
      h1Prime: o[14],
      h2Prime: o[15],
      hBarPrime: o[16],
      T: o[17],
      SL: o[18],
      SC: o[19],
      SH: o[20],
      RT: o[21],
    },
  };
}

/**
 * ΔE00 over packed arrays of Lab triples (L, a, b, L, a, b, …), for bulk work such as
 * per-pixel differences. `out[i]` receives the difference of pair i.
 *
 * @param first - packed Lab triples
 * @param second - packed Lab triples, same length
 * @param out - receives one ΔE00 per pair (length ≥ first.length / 3)
 * @param weights - parametric factors kL, kC, kH (default 1)
 * @returns `out`
 * @example
 * deltaE2000Batch(Float64Array.of(50, 0, 0), Float64Array.of(51, 0, 0), new Float64Array(1));
 */
export function deltaE2000Batch<T extends Float64Array | Float32Array>(
  first: Float64Array | Float32Array,
  second: Float64Array | Float32Array,
  out: T,
  weights?: DeltaE2000Weights,
): T {
  const kL = weights?.kL ?? 1;
  const kC = weights?.kC ?? 1;
  const kH = weights?.kH ?? 1;
  const n = Math.floor(first.length / 3);
  for (let i = 0, j = 0; i < n; i++, j += 3) {
    out[i] = ciede2000(
      first[j],
      first[j + 1],
      first[j + 2],
      second[j],
      second[j + 1],
      second[j + 2],
      kL,
      kC,
      kH,
    );
  }
  return out;
}
