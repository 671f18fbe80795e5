import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import type { InvitationSummary } from '../types';
import { InviteForm } from './invite-form';
import { expiryInWords, PendingInvitations } from './pending-invitations';

const classId = '5b0c1f6e-2d7a-4c1e-9f3b-7a1d2e4c6b80';
const hour = 3_600_000;
const day = 24 * hour;

/** Invented invitations, dated from now as the server dates them (a 7-day link). */
function invitation(id: string, email: string, sentDaysAgo: number): InvitationSummary {
  const sent = Date.now() - sentDaysAgo * day;
  return {
    id,
    email,
    createdAt: new Date(sent).toISOString(),
    expiresAt: new Date(sent + 7 * day).toISOString(),
  };
}

/**
 * The invitation routes of one class over a list the test can change, as the API behaves:
 * GET lists what is pending, resend answers the row with a new expiry, DELETE removes it, and
 * an id no longer pending is 404 invitation_not_found (backend/src/classes/invitations.service.ts).
 */
function serveInvitations(initial: InvitationSummary[]) {
  const state = { pending: [...initial], gets: 0, resent: [] as string[], deleted: [] as string[] };
  const notFound = () =>
    HttpResponse.json(
      {
        statusCode: 404,
        code: 'invitation_not_found',
        message:
          'There is no pending invitation with this id in this class. Reload the list of invitations.',
      },
      { status: 404 },
    );
  server.use(
    http.get(`*/api/classes/${classId}/invitations`, () => {
      state.gets += 1;
      return HttpResponse.json(state.pending);
    }),
    http.post(`*/api/classes/${classId}/invitations/:invitationId/resend`, ({ params }) => {
      const row = state.pending.find((item) => item.id === params.invitationId);
      if (!row) return notFound();
      state.resent.push(row.id);
      row.expiresAt = new Date(Date.now() + 7 * day).toISOString();
      return HttpResponse.json(row);
    }),
    http.delete(`*/api/classes/${classId}/invitations/:invitationId`, ({ params }) => {
      const index = state.pending.findIndex((item) => item.id === params.invitationId);
      if (index < 0) return notFound();
      state.deleted.push(String(params.invitationId));
      state.pending.splice(index, 1);
      return new HttpResponse(null, { status: 204 });
    }),
  );
  return state;
}

const rowOf = (email: string) => screen.getByRole('listitem', { name: email });

describe('PendingInvitations', () => {
  it('should list each waiting invitation with its address, when it was sent and when its link expires', async () => {
    signInAs('teacher');
    serveInvitations([
      invitation('i2', 'noor@example.test', 1),
      invitation('i1', 'ada@example.test', 3),
    ]);
    renderApp(<PendingInvitations classId={classId} />);
    const list = await screen.findByRole('list', { name: 'Waiting to join' });
    const rows = within(list).getAllByRole('listitem');
    expect(rows.map((row) => within(row).getByText(/@example\.test$/).textContent)).toEqual([
      'noor@example.test',
      'ada@example.test',
    ]);
    // Sent 1 day ago with a 7-day link: 6 days left; sent 3 days ago: 4 days left.
    expect(
      within(rowOf('noor@example.test')).getByText(/^Sent .* · link expires in 6 days$/),
    ).toBeInTheDocument();
    expect(
      within(rowOf('ada@example.test')).getByText(/^Sent .* · link expires in 4 days$/),
    ).toBeInTheDocument();
    expect(
      within(rowOf('ada@example.test')).getByRole('button', {
        name: 'Send the invitation to ada@example.test again',
      }),
    ).toBeEnabled();
    expect(
      within(rowOf('ada@example.test')).getByRole('button', {
        name: 'Withdraw the invitation to ada@example.test',
      }),
    ).toBeEnabled();
  });

  it('should say in one quiet line that nobody is waiting, with no empty list', async () => {
    signInAs('teacher');
    serveInvitations([]);
    renderApp(<PendingInvitations classId={classId} />);
    expect(
      await screen.findByText('No invitations are waiting for an answer.'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('list')).not.toBeInTheDocument();
  });

  it('should call the resend route on Send again, say a new link went out and refresh the list', async () => {
    signInAs('teacher');
    const state = serveInvitations([invitation('i1', 'ada@example.test', 3)]);
    renderApp(<PendingInvitations classId={classId} />);
    await userEvent.click(
      await screen.findByRole('button', { name: 'Send the invitation to ada@example.test again' }),
    );
    expect(
      await screen.findByText(
        /^A new link is on its way to ada@example\.test\. It works until .*; the earlier link no longer does\.$/,
      ),
    ).toBeInTheDocument();
    expect(state.resent).toEqual(['i1']);
    // The fresh expiry comes back with the refreshed list: 7 days again instead of 4.
    expect(
      await within(rowOf('ada@example.test')).findByText(/link expires in 7 days$/),
    ).toBeInTheDocument();
    expect(state.gets).toBe(2);
  });

  it('should keep both buttons of a row disabled while its Send again request runs', async () => {
    signInAs('teacher');
    serveInvitations([invitation('i1', 'ada@example.test', 3)]);
    let release: () => void = () => undefined;
    const held = new Promise<void>((resolve) => {
      release = resolve;
    });
    server.use(
      http.post(`*/api/classes/${classId}/invitations/:invitationId/resend`, async () => {
        await held;
        return HttpResponse.json(invitation('i1', 'ada@example.test', 0));
      }),
    );
    renderApp(<PendingInvitations classId={classId} />);
    const again = await screen.findByRole('button', {
      name: 'Send the invitation to ada@example.test again',
    });
    await userEvent.click(again);
    expect(again).toBeDisabled();
    expect(
      screen.getByRole('button', { name: 'Withdraw the invitation to ada@example.test' }),
    ).toBeDisabled();
    release();
    await waitFor(() => expect(again).toBeEnabled());
  });

  it('should ask before Withdraw, naming the address, then DELETE the invitation and drop its row', async () => {
    signInAs('teacher');
    const state = serveInvitations([
      invitation('i2', 'noor@example.test', 1),
      invitation('i1', 'ada@example.test', 3),
    ]);
    renderApp(<PendingInvitations classId={classId} />);
    await userEvent.click(
      await screen.findByRole('button', { name: 'Withdraw the invitation to ada@example.test' }),
    );
    let dialog = screen.getByRole('dialog', { name: 'Withdraw this invitation?' });
    expect(within(dialog).getByText('ada@example.test')).toBeInTheDocument();
    await userEvent.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(state.deleted).toEqual([]);

    await userEvent.click(
      screen.getByRole('button', { name: 'Withdraw the invitation to ada@example.test' }),
    );
    dialog = screen.getByRole('dialog', { name: 'Withdraw this invitation?' });
    await userEvent.click(within(dialog).getByRole('button', { name: 'Withdraw' }));
    expect(
      await screen.findByText('ada@example.test can no longer join with the invitation link.'),
    ).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.queryByRole('listitem', { name: 'ada@example.test' })).not.toBeInTheDocument(),
    );
    expect(state.deleted).toEqual(['i1']);
    expect(rowOf('noor@example.test')).toBeInTheDocument();
  });

  it('should say an invitation accepted or withdrawn elsewhere is no longer waiting (404) and refresh the list', async () => {
    signInAs('teacher');
    const state = serveInvitations([invitation('i1', 'ada@example.test', 3)]);
    renderApp(<PendingInvitations classId={classId} />);
    const again = await screen.findByRole('button', {
      name: 'Send the invitation to ada@example.test again',
    });
    state.pending = []; // Ada accepts in another tab before the teacher clicks.
    await userEvent.click(again);
    expect(
      await screen.findByText(
        'The invitation to ada@example.test was no longer waiting: it was accepted or withdrawn in the meantime. The list is up to date again.',
      ),
    ).toBeInTheDocument();
    expect(
      await screen.findByText('No invitations are waiting for an answer.'),
    ).toBeInTheDocument();
    expect(state.resent).toEqual([]);
  });

  it('should close the Withdraw dialog on a 404 invitation_not_found, say so and refresh the list', async () => {
    signInAs('teacher');
    const state = serveInvitations([invitation('i1', 'ada@example.test', 3)]);
    renderApp(<PendingInvitations classId={classId} />);
    await userEvent.click(
      await screen.findByRole('button', { name: 'Withdraw the invitation to ada@example.test' }),
    );
    state.pending = [];
    await userEvent.click(
      within(screen.getByRole('dialog')).getByRole('button', { name: 'Withdraw' }),
    );
    expect(
      await screen.findByText(/^The invitation to ada@example\.test was no longer waiting/),
    ).toBeInTheDocument();
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(
      await screen.findByText('No invitations are waiting for an answer.'),
    ).toBeInTheDocument();
  });

  it("should show the server's sentence in the dialog when Withdraw fails otherwise, and keep the row", async () => {
    signInAs('teacher');
    serveInvitations([invitation('i1', 'ada@example.test', 3)]);
    server.use(
      http.delete(`*/api/classes/${classId}/invitations/:invitationId`, () =>
        HttpResponse.json(
          { statusCode: 404, code: 'class_not_found', message: 'There is no such class of yours.' },
          { status: 404 },
        ),
      ),
    );
    renderApp(<PendingInvitations classId={classId} />);
    await userEvent.click(
      await screen.findByRole('button', { name: 'Withdraw the invitation to ada@example.test' }),
    );
    const dialog = screen.getByRole('dialog');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Withdraw' }));
    expect(await within(dialog).findByText('There is no such class of yours.')).toBeInTheDocument();
    await userEvent.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(rowOf('ada@example.test')).toBeInTheDocument();
  });

  it('should refresh the list when the invite form sends new invitations', async () => {
    signInAs('teacher');
    const state = serveInvitations([]);
    server.use(
      http.post(`*/api/classes/${classId}/invitations`, async ({ request }) => {
        const { emails } = (await request.json()) as { emails: string[] };
        const sent = emails.map((email, index) => invitation(`n${index}`, email, 0));
        state.pending.unshift(...sent);
        return HttpResponse.json(sent, { status: 201 });
      }),
    );
    renderApp(
      <>
        <InviteForm classId={classId} />
        <PendingInvitations classId={classId} />
      </>,
    );
    expect(
      await screen.findByText('No invitations are waiting for an answer.'),
    ).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText('Invite by e-mail'), 'noor@example.test');
    await userEvent.click(screen.getByRole('button', { name: 'Send invitations' }));
    expect(await screen.findByRole('listitem', { name: 'noor@example.test' })).toBeInTheDocument();
    expect(
      within(rowOf('noor@example.test')).getByText(/link expires in 7 days$/),
    ).toBeInTheDocument();
  });
});

describe('expiryInWords', () => {
  // English phrasing as Intl.RelativeTimeFormat words it (ECMA-402, CLDR "en" data).
  const now = Date.parse('2026-03-02T12:00:00Z');
  const at = (ms: number) => new Date(now + ms).toISOString();

  it('should round to whole days from a day on', () => {
    expect(expiryInWords(at(7 * day - 60_000), now, 'en')).toBe('link expires in 7 days');
    expect(expiryInWords(at(30 * hour), now, 'en')).toBe('link expires in 1 day');
  });

  it('should count hours below a day and say "within the hour" below one', () => {
    expect(expiryInWords(at(5 * hour + 10 * 60_000), now, 'en')).toBe('link expires in 5 hours');
    expect(expiryInWords(at(20 * 60_000), now, 'en')).toBe('link expires within the hour');
  });

  it('should say an expiry already past is expired', () => {
    expect(expiryInWords(at(-hour), now, 'en')).toBe('link expired');
  });
});
