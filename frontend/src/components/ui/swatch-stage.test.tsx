import { hexToLab } from '@mixmark/common';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { swatchSurface } from '@/theme/theme';
import { SwatchStage } from './swatch-stage';

describe('SwatchStage', () => {
  it('should sit swatches on a neutral mid-grey (L* about 50, a* = b* = 0)', () => {
    // CIE 1976 L*a*b* of the stage colour, through common's own sRGB conversion.
    const lab = hexToLab(swatchSurface)!;
    expect(lab.L).toBeCloseTo(50, 0);
    expect(Math.abs(lab.a)).toBeLessThan(0.01);
    expect(Math.abs(lab.b)).toBeLessThan(0.01);
  });

  it('should render its children on the stage', () => {
    render(<SwatchStage aria-label="stage">swatch</SwatchStage>);
    expect(screen.getByLabelText('stage')).toHaveTextContent('swatch');
  });
});
