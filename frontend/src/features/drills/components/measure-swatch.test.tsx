import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
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
});
