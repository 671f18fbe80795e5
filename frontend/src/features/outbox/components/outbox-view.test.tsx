import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { Route, Routes } from 'react-router-dom';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';
import type { OutboxEntry, OutboxMessage } from '../types';
import { OutboxLink } from './outbox-link';
import { OutboxView } from './outbox-view';

// Invented mail, shaped as backend/src/outbox/outbox.service.ts answers it.
const older: OutboxEntry = {
  id: 'msg-older',
  receivedAt: '2026-03-10T09:00:00.000Z',
  from: 'Mixmark <no-reply@mixmark.test>',
  to: ['ines.waterford@example.test'],
  subject: 'Reset your Mixmark password',
};
const newer: OutboxEntry = {
  id: 'msg-newer',
  receivedAt: '2026-03-11T14:30:00.000Z',
  from: 'Mixmark <no-reply@mixmark.test>',
  to: ['tobi.fenwick@example.test'],
  subject: 'Join Saltmarsh Lane Studio on Mixmark',
};
const newerMessage: OutboxMessage = {
  ...newer,
  text: 'Marta invited you. Open http://localhost:4310/invitations/abc123 to join.',
  html: '<p>Marta invited you.</p><p><a href="http://localhost:4310/invitations/abc123">Join the class</a></p><script>alert(1)</script>',
};

function renderOutbox(route = '/dev/outbox') {
  return renderApp(
    <Routes>
      <Route path="/dev/outbox" element={<OutboxView messageHref={(id) => `/dev/outbox/${id}`} />} />
      <Route
        path="/dev/outbox/:messageId"
        element={<OutboxView selectedId={route.split('/').pop()} messageHref={(id) => `/dev/outbox/${id}`} />}
      />
    </Routes>,
    { route },
  );
}

describe('OutboxView', () => {
  it('should list the kept e-mails newest first with recipient, subject and time', async () => {
    server.use(http.get('*/api/dev/outbox', () => HttpResponse.json([older, newer])));
    renderOutbox();
    const list = await screen.findByRole('navigation', { name: 'Messages' });
    const items = within(list).getAllByRole('link');
    expect(items.map((item) => item.textContent)).toEqual([
      expect.stringContaining('Join Saltmarsh Lane Studio on Mixmark'),
      expect.stringContaining('Reset your Mixmark password'),
    ]);
    expect(items[0]).toHaveTextContent('To tobi.fenwick@example.test');
    expect(items[0]).toHaveAttribute('href', '/dev/outbox/msg-newer');
    expect(items[0]).toHaveTextContent(new Date(newer.receivedAt).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' }));
  });

  it('should show one message: its HTML in a sandboxed frame without scripts, and its text with working links', async () => {
    server.use(
      http.get('*/api/dev/outbox', () => HttpResponse.json([newer, older])),
      http.get('*/api/dev/outbox/msg-newer', () => HttpResponse.json(newerMessage)),
    );
    renderOutbox('/dev/outbox/msg-newer');
    const frame = await screen.findByTitle('The e-mail “Join Saltmarsh Lane Studio on Mixmark”');
    expect(frame.tagName).toBe('IFRAME');
    const sandbox = frame.getAttribute('sandbox') ?? '';
    expect(sandbox.split(' ')).not.toContain('allow-scripts');
    expect(sandbox.split(' ')).not.toContain('allow-same-origin');
    expect(sandbox.split(' ')).toContain('allow-popups');
    const srcDoc = frame.getAttribute('srcdoc') ?? '';
    expect(srcDoc).toContain('<base target="_blank">');
    expect(srcDoc).toContain('href="http://localhost:4310/invitations/abc123"');

    const textLink = screen.getByRole('link', { name: 'http://localhost:4310/invitations/abc123' });
    expect(textLink).toHaveAttribute('href', 'http://localhost:4310/invitations/abc123');
    expect(screen.getByText(/From Mixmark <no-reply@mixmark.test> to tobi.fenwick@example.test/)).toBeInTheDocument();
    expect(within(screen.getByRole('navigation', { name: 'Messages' })).getAllByRole('link')[0]).toHaveAttribute('aria-current', 'page');
  });

  it('should empty the outbox through the API', async () => {
    let kept: OutboxEntry[] = [newer];
    server.use(
      http.get('*/api/dev/outbox', () => HttpResponse.json(kept)),
      http.delete('*/api/dev/outbox', () => {
        kept = [];
        return new HttpResponse(null, { status: 204 });
      }),
    );
    renderOutbox();
    await userEvent.click(await screen.findByRole('button', { name: 'Empty the outbox' }));
    expect(await screen.findByText('No e-mails yet')).toBeInTheDocument();
  });

  it('should say the outbox exists only in development when the API answers 404 (production)', async () => {
    renderOutbox();
    expect(await screen.findByText(/The outbox exists only in development/)).toBeInTheDocument();
  });
});

describe('OutboxLink', () => {
  it('should show the link when the server keeps e-mails', async () => {
    server.use(http.get('*/api/dev/outbox', () => HttpResponse.json([])));
    renderApp(<OutboxLink href="/dev/outbox" />);
    expect(await screen.findByRole('link', { name: 'Outbox (development)' })).toHaveAttribute('href', '/dev/outbox');
  });

  it('should stay hidden when the API has no outbox (404 in production)', async () => {
    let asked = 0;
    server.use(
      http.get('*/api/dev/outbox', () => {
        asked += 1;
        return HttpResponse.json({ statusCode: 404, code: 'not_found', message: 'Cannot GET /api/dev/outbox' }, { status: 404 });
      }),
    );
    renderApp(<OutboxLink href="/dev/outbox" />);
    await waitFor(() => expect(asked).toBe(1));
    expect(screen.queryByRole('link', { name: 'Outbox (development)' })).not.toBeInTheDocument();
  });
});
