import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
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
});
