import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosHeaders } from 'axios';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { api } from '@/lib/api-client';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { PaletteView } from './palette-view';

const photo = () => new File([new Uint8Array(4096)], 'my-paint.jpg', { type: 'image/jpeg' });
const reading = (L: number, a: number, b: number, hex: string) => ({
  lab: { L, a, b },
  hex,
  spread: { L: 0.4, a: 0.3, b: 0.3 },
});

/** An empty palette, and what the add form posts. */
function emptyPalette() {
  const posted: unknown[] = [];
  server.use(
    http.get('*/api/palette', () => HttpResponse.json({ paints: [], cautions: [] })),
    http.post('*/api/palette/paints', async ({ request }) => {
      const body = (await request.json()) as object;
      posted.push(body);
      return HttpResponse.json({ id: 'p9', ...body, safety: [] }, { status: 201 });
    }),
  );
  return posted;
}

async function openAndSend() {
  expect(await screen.findByText('No paints yet')).toBeInTheDocument();
  await userEvent.click(screen.getByRole('button', { name: 'Measure from a photo' }));
  await userEvent.upload(screen.getByLabelText('Take or choose the photo'), photo());
}

describe('Measure from a photo (paint form)', () => {
  it('should put the one reading in the swatch fields, show it on the grey stage, and save it with the paint', async () => {
    signInAs('student');
    const posted = emptyPalette();
    let sent = 'missing';
    server.use(
      http.post('*/api/palette/swatch/measure', async ({ request }) => {
        // jsdom's multipart hand-over to MSW loses the file's bytes; check the part is there.
        sent = (await request.formData()).has('photo') ? 'sent' : 'missing';
        return HttpResponse.json({
          cardKind: 'match',
          swatches: [reading(38.26, 21.04, -42.57, '#4f5aa8')],
          warnings: [
            {
              code: 'UNEVEN_LIGHT',
              message: 'The light across the card is uneven. Move out of the shadow.',
            },
          ],
        });
      }),
    );
    renderApp(<PaletteView />);
    await openAndSend();
    expect(
      await screen.findByText('Measured: the reading is in the form. Save the paint to keep it.'),
    ).toBeInTheDocument();
    expect(sent).toBe('sent');
    expect(
      screen.getByText('The light across the card is uneven. Move out of the shadow.'),
    ).toBeInTheDocument();
    expect(
      screen.getByRole('checkbox', { name: 'I have measured a swatch of it (CIELAB)' }),
    ).toBeChecked();
    expect(screen.getByLabelText('L*')).toHaveValue(38.3);
    expect(screen.getByLabelText('a*')).toHaveValue(21);
    expect(screen.getByLabelText('b*')).toHaveValue(-42.6);
    const swatch = screen.getByRole('img', { name: /This paint's swatch: L\* 38\.3/ });
    expect(swatch.closest('[data-surface="swatch-stage"]')).not.toBeNull();

    await userEvent.type(screen.getByLabelText('Name'), 'Deep evening blue');
    await userEvent.click(screen.getByRole('button', { name: 'Add paint' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]).toMatchObject({
      name: 'Deep evening blue',
      swatchLab: { L: 38.3, a: 21, b: -42.6 },
    });
  });

  it('should let the person pick which window holds the paint when the card had several', async () => {
    signInAs('student');
    emptyPalette();
    server.use(
      http.post('*/api/palette/swatch/measure', () =>
        HttpResponse.json({
          cardKind: 'temperature-pair',
          swatches: [reading(55, 12, 30, '#a87a4e'), reading(61.2, -4.4, 8.05, '#8f9a88')],
          warnings: [],
        }),
      ),
    );
    renderApp(<PaletteView />);
    await openAndSend();
    expect(
      await screen.findByText('The card had 2 windows. Choose the one that shows this paint.'),
    ).toBeInTheDocument();
    // Nothing goes into the form before the choice.
    expect(screen.queryByLabelText('L*')).not.toBeInTheDocument();
    const windows = within(
      screen.getByRole('list', { name: 'Readings from your photo' }),
    ).getAllByRole('listitem');
    expect(windows).toHaveLength(2);
    await userEvent.click(within(windows[1]).getByRole('button', { name: 'Use window 2' }));
    expect(within(windows[1]).getByRole('button', { name: 'In the form' })).toHaveAttribute(
      'aria-pressed',
      'true',
    );
    expect(
      screen.getByText("Window 2's reading is in the form. Save the paint to keep it."),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('L*')).toHaveValue(61.2);
    expect(screen.getByLabelText('a*')).toHaveValue(-4.4);
    expect(screen.getByLabelText('b*')).toHaveValue(8.1);
  });

  it('should say in words why the photo could not be measured, and leave the form alone', async () => {
    signInAs('student');
    emptyPalette();
    server.use(
      http.post('*/api/palette/swatch/measure', () =>
        HttpResponse.json(
          {
            statusCode: 422,
            code: 'GLARE',
            message:
              'Part of the card shines in the photo. Turn it away from the window. The photo is blurred. Hold the phone still.',
            details: { photo: 'GLARE' },
          },
          { status: 422 },
        ),
      ),
    );
    renderApp(<PaletteView />);
    await openAndSend();
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The swatch could not be measured. Part of the card shines in the photo. Turn it away from the window. The photo is blurred. Hold the phone still.',
    );
    expect(
      screen.getByRole('checkbox', { name: 'I have measured a swatch of it (CIELAB)' }),
    ).not.toBeChecked();
    expect(screen.getByLabelText('Measure another photo')).toBeInTheDocument();
  });

  it('should word a photo too large for the server', async () => {
    signInAs('student');
    emptyPalette();
    server.use(
      http.post('*/api/palette/swatch/measure', () =>
        HttpResponse.json(
          { statusCode: 413, code: 'payload_too_large', message: 'File too large' },
          { status: 413 },
        ),
      ),
    );
    renderApp(<PaletteView />);
    await openAndSend();
    expect(await screen.findByRole('alert')).toHaveTextContent('This file is too large to send.');
  });

  it('should fetch a match card by kind for the paper chosen', async () => {
    signInAs('student');
    emptyPalette();
    // jsdom's XHR cannot hand MSW a blob body, so the axios instance's get is stubbed.
    const palette = api.get.bind(api);
    const get = vi.spyOn(api, 'get').mockImplementation(async (url: string, config) => {
      if (!url.endsWith('.pdf')) return palette(url, config);
      return {
        data: new Blob(['pdf']),
        status: 200,
        statusText: 'OK',
        headers: { 'content-disposition': 'attachment; filename="mixmark-card-match-letter.pdf"' },
        config: { headers: new AxiosHeaders() },
      };
    });
    Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:card'), revokeObjectURL: vi.fn() });
    let savedAs = '';
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      savedAs = this.download;
    });
    renderApp(<PaletteView />);
    await userEvent.click(await screen.findByRole('button', { name: 'Measure from a photo' }));
    await userEvent.click(
      screen.getByRole('button', { name: 'Download a match card (PDF, US Letter)' }),
    );
    await waitFor(() => expect(savedAs).toBe('mixmark-card-match-letter.pdf'));
    expect(get).toHaveBeenCalledWith('/cards/match/card.pdf', {
      params: { paper: 'letter' },
      responseType: 'blob',
    });
    click.mockRestore();
    get.mockRestore();
  });
});
