import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosHeaders } from 'axios';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { api } from '@/lib/api-client';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import type { Drill } from '../types';
import { DrillEditor } from './drill-editor';

const photo = () => new File([new Uint8Array(4096)], 'my-swatch.jpg', { type: 'image/jpeg' });
const reading = (L: number, a: number, b: number, hex: string) => ({
  lab: { L, a, b },
  hex,
  spread: { L: 0.4, a: 0.3, b: 0.3 },
});

async function openAndSend() {
  await userEvent.click(screen.getByRole('button', { name: 'Measure my painted swatch' }));
  await userEvent.upload(screen.getByLabelText('Take or choose the photo'), photo());
}

describe('Measure my painted swatch', () => {
  it('should send the photo and fill the target with the measured Lab, with the cautions in words', async () => {
    signInAs('teacher');
    let sent = 'missing';
    server.use(
      http.post('*/api/drills/targets/measure', async ({ request }) => {
        // jsdom's multipart hand-over to MSW loses the file's name and bytes; check the part is there.
        sent = (await request.formData()).has('photo') ? 'sent' : 'missing';
        return HttpResponse.json(
          {
            cardKind: 'match',
            targets: [reading(62.04, -18.31, 24.26, '#8aa26e')],
            warnings: [
              { code: 'TOO_DARK', message: 'The photo is too dark. Take it in brighter light.' },
            ],
          },
          { status: 201 },
        );
      }),
    );
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    await openAndSend();
    expect(
      await screen.findByText(/Measured 1 window: the targets above now hold your swatch/),
    ).toBeInTheDocument();
    expect(sent).toBe('sent');
    const target = screen.getByRole('group', { name: 'Target 1' });
    expect(within(target).getByLabelText('L*')).toHaveValue(62);
    expect(within(target).getByLabelText('a*')).toHaveValue(-18.3);
    expect(within(target).getByLabelText('b*')).toHaveValue(24.3);
    expect(
      screen.getByText('The photo is too dark. Take it in brighter light.'),
    ).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Window 1: #8aa26e' })).toBeInTheDocument();
  });

  it('should say in words why a photo could not be measured, and leave the targets alone', async () => {
    signInAs('teacher');
    server.use(
      http.post('*/api/drills/targets/measure', () =>
        HttpResponse.json(
          {
            statusCode: 422,
            code: 'CARD_NOT_FOUND',
            message:
              'The reference card was not found. Make sure the whole printed card is in the photo.',
            details: { photo: 'CARD_NOT_FOUND' },
          },
          { status: 422 },
        ),
      ),
    );
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    await openAndSend();
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent(
      'The swatch could not be measured. The reference card was not found. Make sure the whole printed card is in the photo.',
    );
    expect(
      within(screen.getByRole('group', { name: 'Target 1' })).getByLabelText('Hex'),
    ).toHaveValue('#8a5a3c');
    expect(screen.getByLabelText('Measure another photo')).toBeInTheDocument();
  });

  it('should let the teacher choose which reading goes where when the card has more windows than the drill has targets', async () => {
    signInAs('teacher');
    server.use(
      http.post('*/api/drills/targets/measure', () =>
        HttpResponse.json(
          {
            cardKind: 'temperature-pair',
            targets: [reading(55, 12, 30, '#a87a4e'), reading(55.2, 2, 14, '#8c8470')],
            warnings: [],
          },
          { status: 201 },
        ),
      ),
    );
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    await openAndSend();
    expect(
      await screen.findByText(
        /Measured 2 windows; a match drill takes 1 target\. Choose where each reading goes\./,
      ),
    ).toHaveTextContent('The card in the photo was printed for a temperature pair drill.');
    const readings = within(
      screen.getByRole('list', { name: 'Readings from your swatch' }),
    ).getAllByRole('listitem');
    await userEvent.click(within(readings[1]).getByRole('button', { name: 'Use for target 1' }));
    expect(within(readings[1]).getByRole('button', { name: 'In target 1' })).toBeInTheDocument();
    const target = screen.getByRole('group', { name: 'Target 1' });
    expect(within(target).getByLabelText('L*')).toHaveValue(55.2);
    expect(within(target).getByLabelText('b*')).toHaveValue(14);
  });

  it('should print a card by kind for a drill not saved yet, with the ladder steps from the form', async () => {
    signInAs('teacher');
    // jsdom's XHR cannot hand MSW a blob body, so the axios instance's get is stubbed.
    const get = vi.spyOn(api, 'get').mockImplementation(async (url: string) => ({
      data: new Blob(['pdf']),
      status: 200,
      statusText: 'OK',
      headers: { 'content-disposition': `attachment; filename="${url.split('/')[2]}-card.pdf"` },
      config: { headers: new AxiosHeaders() },
    }));
    Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:card'), revokeObjectURL: vi.fn() });
    const saved: string[] = [];
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      saved.push(this.download);
    });
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Measure my painted swatch' }));
    expect(screen.queryByText(/save it first/)).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Download a match card (PDF, A4)' }));
    await waitFor(() => expect(saved).toEqual(['match-card.pdf']));
    expect(get).toHaveBeenLastCalledWith('/cards/match/card.pdf', {
      params: { paper: 'A4' },
      responseType: 'blob',
    });

    await userEvent.click(screen.getByRole('combobox', { name: 'Kind' }));
    await userEvent.click(await screen.findByRole('option', { name: 'Value ladder' }));
    await userEvent.click(screen.getByRole('button', { name: 'Add a step' }));
    expect(
      screen.getByText(
        /this prints a value ladder card with 6 steps, for the drill as it is set now/,
      ),
    ).toBeInTheDocument();
    await userEvent.click(
      screen.getByRole('button', { name: 'Download a value ladder card (PDF, US Letter)' }),
    );
    await waitFor(() => expect(saved).toEqual(['match-card.pdf', 'value-ladder-card.pdf']));
    expect(get).toHaveBeenLastCalledWith('/cards/value-ladder/card.pdf', {
      params: { steps: 6, paper: 'letter' },
      responseType: 'blob',
    });
    click.mockRestore();
    get.mockRestore();
  });

  it("should offer a saved drill's own card", async () => {
    signInAs('teacher');
    const get = vi.spyOn(api, 'get').mockImplementation(async () => ({
      data: new Blob(['pdf']),
      status: 200,
      statusText: 'OK',
      headers: {},
      config: { headers: new AxiosHeaders() },
    }));
    Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:card'), revokeObjectURL: vi.fn() });
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => {});
    const drill: Drill = {
      id: 'd1',
      ownerId: 'u1',
      title: 'Earth red, by eye',
      kind: 'match',
      instructions: 'Mix it from two paints.',
      targets: [{ lab: { L: 45, a: 28, b: 24 }, enteredAs: 'lab' }],
      tolerance: { deltaE: 3 },
      palette: [],
      visibility: 'private',
      createdAt: '2025-01-06T09:00:00.000Z',
      updatedAt: '2025-01-06T09:00:00.000Z',
    };
    renderApp(<DrillEditor drill={drill} onSaved={vi.fn()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Measure my painted swatch' }));
    await userEvent.click(
      screen.getByRole('button', { name: "Download this drill's card (PDF, A4)" }),
    );
    await waitFor(() => expect(click).toHaveBeenCalled());
    expect(get).toHaveBeenCalledWith('/drills/d1/card.pdf', {
      params: { paper: 'A4' },
      responseType: 'blob',
    });
    click.mockRestore();
    get.mockRestore();
  });
});
