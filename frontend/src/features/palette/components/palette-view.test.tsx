import { pigmentCautions, pigmentSafety } from '@mixmark/common';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import type { Palette } from '../types';
import { PaletteView } from './palette-view';

const palette: Palette = {
  paints: [
    { id: 'p1', name: 'Deep warm red', pigments: ['PR108'], opacity: 'opaque', staining: 'low', granulating: false, swatchLab: { L: 42, a: 58, b: 36 }, safety: pigmentSafety(['PR108']) },
    { id: 'p2', name: 'Night blue', pigments: ['PB29'], opacity: 'transparent', staining: null, granulating: true, swatchLab: null, safety: [] },
  ],
  cautions: [...pigmentCautions],
};

describe('PaletteView', () => {
  it('should list the paints and show the cautions for a hazardous pigment, deferring to the label', async () => {
    signInAs('student');
    server.use(http.get('*/api/palette', () => HttpResponse.json(palette)));
    renderApp(<PaletteView />);
    expect(await screen.findByText('Deep warm red')).toBeInTheDocument();
    expect(screen.getByText('Handle with care')).toBeInTheDocument();
    expect(screen.getByText(pigmentCautions[0])).toBeInTheDocument();
    expect(screen.getByText(/label, its safety data sheet and your local rules come first/)).toBeInTheDocument();
    expect(screen.getByText(/Contains PR108 \(cadmium\)/)).toBeInTheDocument();
    expect(screen.getByText('Transparent · Granulating')).toBeInTheDocument();
    // The measured swatch sits on the neutral grey stage.
    expect(screen.getByRole('img', { name: /Deep warm red, measured/ }).closest('[data-surface="swatch-stage"]')).not.toBeNull();
  });

  it('should check a paint against the shared schema and send it', async () => {
    signInAs('student');
    let posted: unknown;
    server.use(
      http.get('*/api/palette', () => HttpResponse.json({ paints: [], cautions: [] })),
      http.post('*/api/palette/paints', async ({ request }) => {
        posted = await request.json();
        return HttpResponse.json({ id: 'p3', ...(posted as object), safety: [] }, { status: 201 });
      }),
    );
    renderApp(<PaletteView />);
    expect(await screen.findByText('No paints yet')).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText('Pigments'), 'PX12');
    await userEvent.click(screen.getByRole('button', { name: 'Add paint' }));
    expect(await screen.findByText(/Colour Index codes such as PB29 or PR209, up to six/)).toBeInTheDocument();
    expect(posted).toBeUndefined();
    await userEvent.clear(screen.getByLabelText('Pigments'));
    await userEvent.type(screen.getByLabelText('Pigments'), 'pb29, PV19');
    await userEvent.type(screen.getByLabelText('Name'), 'Cool violet mix');
    await userEvent.click(screen.getByRole('checkbox', { name: 'Granulating' }));
    await userEvent.click(screen.getByRole('button', { name: 'Add paint' }));
    await waitFor(() =>
      expect(posted).toEqual({ name: 'Cool violet mix', pigments: ['PB29', 'PV19'], opacity: null, staining: null, granulating: true, swatchLab: null }),
    );
  });
});
