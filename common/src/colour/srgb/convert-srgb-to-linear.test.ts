import { describe, expect, it } from 'vitest';
import { srgbTransfer } from '../constants.js';
import { iecTransferConstants, transferCheckValues } from '../fixtures/reference-values.js';
import { linearChannelToSrgb, linearToSrgb } from './convert-linear-to-srgb.js';
import { srgbChannelToLinear, srgbToLinear } from './convert-srgb-to-linear.js';

describe('sRGB transfer function (IEC 61966-2-1:1999 §5.2)', () => {
  it('should use the IEC 61966-2-1 constants', () => {
    expect(srgbTransfer.slope).toBe(iecTransferConstants.slope);
    expect(srgbTransfer.offset).toBe(iecTransferConstants.offset_a);
    expect(srgbTransfer.scale).toBe(iecTransferConstants.scale);
    expect(srgbTransfer.exponent).toBe(iecTransferConstants.exponent);
    expect(srgbTransfer.decodeThreshold).toBe(iecTransferConstants.decode_threshold);
    expect(srgbTransfer.encodeThreshold).toBe(iecTransferConstants.encode_threshold);
  });

  // 0.18 -> 0.461356… is colour-science's test_srgb.py value; 0.5 -> 0.214… computed in the notes.
  it.each(transferCheckValues)('should map linear $L to encoded $V and back', ({ L, V }) => {
    expect(linearChannelToSrgb(L)).toBeCloseTo(V, 12);
    expect(srgbChannelToLinear(V)).toBeCloseTo(L, 11);
  });

  it('should use the straight segment below the thresholds', () => {
    expect(srgbChannelToLinear(0.04)).toBe(0.04 / 12.92);
    expect(linearChannelToSrgb(0.003)).toBe(0.003 * 12.92);
  });

  it('should round-trip every 8-bit code value to 1e-12', () => {
    for (let v = 0; v <= 255; v++) {
      expect(linearChannelToSrgb(srgbChannelToLinear(v / 255))).toBeCloseTo(v / 255, 12);
    }
  });

  it('should mirror negative values so out-of-gamut colours round-trip', () => {
    expect(srgbChannelToLinear(-0.5)).toBe(-srgbChannelToLinear(0.5));
    expect(linearToSrgb(srgbToLinear({ r: -0.2, g: 1.3, b: 0.5 })).r).toBeCloseTo(-0.2, 12);
    expect(linearToSrgb(srgbToLinear({ r: -0.2, g: 1.3, b: 0.5 })).g).toBeCloseTo(1.3, 12);
  });
});
