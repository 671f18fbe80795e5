import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { Route, Routes } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { attemptReply } from '@/testing/mocks/fixtures';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { AttemptList } from './attempt-list';

const override = {
  comment: '',
  by: '44444444-4444-4444-8444-444444444444',
  at: '2025-03-11T09:30:00.000Z',
};

// As GET /api/attempts answers (backend attempt-view.ts): `score`/`pass` are the teacher's when
// overridden, the machine's kept apart in `machine`. Invented data.
const rows = [
  attemptReply({ id: 'a-machine', drill: { id: 'd1', title: 'Machine only', kind: 'match' } }),
  attemptReply({
    id: 'a-lowered',
    drill: { id: 'd2', title: 'Lowered by the teacher', kind: 'match' },
    score: 55,
    pass: false,
    override: { ...override, score: 55, pass: false },
  }),
  attemptReply({
    id: 'a-retake',
    drill: { id: 'd3', title: 'Retake marked by the teacher', kind: 'match' },
    state: 'needs-retake',
    mark: null,
    machine: null,
    score: 70,
    pass: true,
    override: { ...override, score: 70, pass: true },
  }),
  attemptReply({
    id: 'a-retake-plain',
    drill: { id: 'd4', title: 'Retake', kind: 'match' },
    state: 'needs-retake',
    mark: null,
    machine: null,
    score: null,
    pass: null,
  }),
];

const rowOf = (title: string) => screen.getByRole('cell', { name: title }).closest('tr')!;

describe('AttemptList', () => {
  it("should show the mark that stands in each row: the teacher's when overridden, else the machine's", async () => {
    signInAs('student');
    server.use(http.get('*/api/attempts', () => HttpResponse.json(rows)));
    renderApp(<AttemptList attemptHref={(id) => `/attempts/${id}`} emptyText="None" />);
    await screen.findByRole('table', { name: 'Attempts' });
    expect(within(rowOf('Machine only')).getByText('Pass · 92/100')).toBeInTheDocument();
    expect(rowOf('Machine only')).not.toHaveTextContent("teacher's mark");
    expect(
      within(rowOf('Lowered by the teacher')).getByText('Not yet · 55/100'),
    ).toBeInTheDocument();
    expect(rowOf('Lowered by the teacher')).toHaveTextContent("(teacher's mark)");
    expect(within(rowOf('Lowered by the teacher')).queryByText(/92\/100/)).not.toBeInTheDocument();
    expect(
      within(rowOf('Retake marked by the teacher')).getByText('Pass · 70/100'),
    ).toBeInTheDocument();
    expect(rowOf('Retake marked by the teacher')).not.toHaveTextContent('Photo to retake');
    expect(rowOf('Retake')).toHaveTextContent('Photo to retake');
  });

  // Phone width: the Open/Review column lies past the table's edge, so each row's first cell has a
  // button naming the row (WAI-ARIA APG menu button pattern,
  // https://www.w3.org/WAI/ARIA/apg/patterns/menu-button/) opening a menu with the same link.
  // Shown or hidden by CSS at MUI's sm breakpoint (600 px, MUI's default theme breakpoints), as in
  // row-actions-menu.test.tsx: in jsdom both the row's own link and the menu button are in the
  // page (widths are not laid out), so the test reads the menu and follows its link.
  it('should offer a student’s Open link behind a button naming the drill and time, and go to the attempt', async () => {
    signInAs('student');
    server.use(http.get('*/api/attempts', () => HttpResponse.json(rows.slice(0, 1))));
    renderApp(
      <Routes>
        <Route
          path="/"
          element={<AttemptList attemptHref={(id) => `/attempts/${id}`} emptyText="None" />}
        />
        <Route path="/attempts/:attemptId" element={<p>The attempt page</p>} />
      </Routes>,
    );
    const when = new Date(rows[0].createdAt).toLocaleString(undefined, {
      dateStyle: 'medium',
      timeStyle: 'short',
    });
    const button = await screen.findByRole('button', { name: `Actions for Machine only, ${when}` });
    expect(button).toHaveAttribute('aria-haspopup', 'menu');
    await userEvent.click(button);
    const menu = await screen.findByRole('menu', { name: `Actions for Machine only, ${when}` });
    const open = within(menu).getByRole('menuitem', { name: 'Open the attempt' });
    expect(open).toHaveAttribute('href', '/attempts/a-machine');
    await userEvent.click(open);
    expect(await screen.findByText('The attempt page')).toBeInTheDocument();
  });

  it('should offer a teacher’s Review link behind a button naming the student and time', async () => {
    signInAs('teacher');
    const theirs = [
      attemptReply({ id: 'a-ines', student: { id: 's1', displayName: 'Ines Podmore' } }),
      attemptReply({ id: 'a-theo', student: { id: 's2', displayName: 'Theo Brackenridge' } }),
    ];
    server.use(http.get('*/api/attempts', () => HttpResponse.json(theirs)));
    renderApp(
      <Routes>
        <Route
          path="/"
          element={
            <AttemptList
              filter={{ assignmentId: 'as1' }}
              showStudent
              attemptHref={(id) => `/attempts/${id}`}
              emptyText="None"
            />
          }
        />
        <Route path="/attempts/:attemptId" element={<p>The attempt page</p>} />
      </Routes>,
    );
    const when = new Date(theirs[1].createdAt).toLocaleString(undefined, {
      dateStyle: 'medium',
      timeStyle: 'short',
    });
    const button = await screen.findByRole('button', {
      name: `Actions for Theo Brackenridge, ${when}`,
    });
    await userEvent.click(button);
    const menu = await screen.findByRole('menu', {
      name: `Actions for Theo Brackenridge, ${when}`,
    });
    expect(
      within(menu)
        .getAllByRole('menuitem')
        .map((item) => item.textContent),
    ).toEqual(['Review the attempt']);
    const review = within(menu).getByRole('menuitem', { name: 'Review the attempt' });
    expect(review).toHaveAttribute('href', '/attempts/a-theo');
    await userEvent.click(review);
    expect(await screen.findByText('The attempt page')).toBeInTheDocument();
  });
});
