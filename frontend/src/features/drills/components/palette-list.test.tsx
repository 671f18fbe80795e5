import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { PaletteList } from './palette-list';

describe('PaletteList', () => {
  it('should show the studio cautions when a paint names a cadmium pigment', () => {
    render(<PaletteList palette={[{ name: 'Deep yellow', pigments: ['PY35'] }, { name: 'Ultramarine', pigments: ['PB29'] }]} />);
    expect(screen.getByText('Handle with care')).toBeInTheDocument();
    expect(screen.getByText(/PY35 \(cadmium\)/)).toBeInTheDocument();
    expect(screen.getByText('Do not point brushes with your lips or mouth.')).toBeInTheDocument();
    expect(screen.getByText(/label, its safety data sheet and your local rules come first/)).toBeInTheDocument();
  });

  it('should show no cautions for a palette without such pigments', () => {
    render(<PaletteList palette={[{ name: 'Ultramarine', pigments: ['PB29'] }]} />);
    expect(screen.queryByText('Handle with care')).not.toBeInTheDocument();
  });
});
