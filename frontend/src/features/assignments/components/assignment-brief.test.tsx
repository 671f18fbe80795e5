import { screen, waitFor } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { AssignmentBrief } from './assignment-brief';

const id = '5b2e7c1a-3d4f-4e6a-9b8c-7d6e5f4a3b2c';
const assignment = {
  id,
  classId: 'c1',
  className: 'Tuesday watercolour',
  drill: { id: 'd1', title: 'Sienna match', kind: 'match' },
  dueAt: '2030-03-14T18:00:00.000Z',
  note: 'Mix it from two paints only.\nLet the wash dry flat.',
  createdAt: '2030-03-01T09:00:00.000Z',
  status: 'not-started',
};

describe('AssignmentBrief', () => {
  it("should show the teacher's note and the due date above the upload", async () => {
    signInAs('student');
    server.use(http.get(`*/api/assignments/${id}`, () => HttpResponse.json(assignment)));
    renderApp(<AssignmentBrief assignmentId={id} />);
    expect(await screen.findByText(/Mix it from two paints only\./)).toBeInTheDocument();
    expect(screen.getByText(/Let the wash dry flat\./)).toBeInTheDocument();
    expect(screen.getByText(/Tuesday watercolour: due in \d+ days/)).toBeInTheDocument();
    // A note, not an alert: the drill page's alerts are kept for what went wrong (WAI-ARIA 1.2,
    // roles "note" and "alert").
    expect(screen.getByRole('note', { name: 'From your teacher' })).toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('should show only the due date when the teacher left no note', async () => {
    signInAs('student');
    server.use(
      http.get(`*/api/assignments/${id}`, () => HttpResponse.json({ ...assignment, note: '' })),
    );
    renderApp(<AssignmentBrief assignmentId={id} />);
    expect(await screen.findByText(/Tuesday watercolour: due in/)).toBeInTheDocument();
    expect(screen.queryByText(/teacher’s note/)).not.toBeInTheDocument();
  });

  it('should show nothing when the assignment cannot be read', async () => {
    signInAs('student');
    let asked = false;
    server.use(
      http.get(`*/api/assignments/${id}`, () => {
        asked = true;
        return HttpResponse.json(
          { statusCode: 404, code: 'not_found', message: 'Not found.' },
          { status: 404 },
        );
      }),
    );
    renderApp(<AssignmentBrief assignmentId={id} />);
    await waitFor(() => expect(asked).toBe(true));
    expect(screen.queryByLabelText('From your teacher')).not.toBeInTheDocument();
  });
});
