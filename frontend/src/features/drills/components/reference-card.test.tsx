import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosHeaders } from 'axios';
import { describe, expect, it, vi } from 'vitest';
import { api } from '@/lib/api-client';
import { renderApp } from '@/testing/test-utils';
import { ReferenceCard } from './reference-card';

describe('ReferenceCard', () => {
  it('should show the printing words and fetch the PDF for the chosen paper through the client', async () => {
    // jsdom's XHR cannot hand MSW a blob body, so the axios instance's get is stubbed.
    const get = vi.spyOn(api, 'get').mockImplementation(async (url: string) => ({
      data: new Blob([url.endsWith('.png') ? 'png' : 'pdf']),
      status: 200,
      statusText: 'OK',
      headers: url.endsWith('.pdf') ? { 'content-disposition': 'attachment; filename="mixmark-card-match-letter.pdf"' } : {},
      config: { headers: new AxiosHeaders() },
    }));
    Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:card'), revokeObjectURL: vi.fn() });
    let savedAs = '';
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      savedAs = this.download;
    });
    renderApp(<ReferenceCard drillId="d1" />);
    expect(screen.getByText(/Print at 100 %, no scaling, on matte paper; cut out the window\(s\)/)).toBeInTheDocument();
    expect(await screen.findByRole('img', { name: /Preview of the reference card/ })).toHaveAttribute('src', 'blob:card');
    await userEvent.click(screen.getByRole('radio', { name: 'US Letter' }));
    await userEvent.click(screen.getByRole('button', { name: 'Download the card (PDF)' }));
    await waitFor(() => expect(savedAs).toBe('mixmark-card-match-letter.pdf'));
    expect(get).toHaveBeenCalledWith('/drills/d1/card.pdf', { params: { paper: 'letter' }, responseType: 'blob' });
    click.mockRestore();
    get.mockRestore();
  });
});
