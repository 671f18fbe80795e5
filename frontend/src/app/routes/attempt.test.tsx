import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { Route, Routes } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import AttemptRoute from './attempt';
import { attemptReply } from '@/testing/mocks/fixtures';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

// The photo is not what these tests are about, and jsdom's Blob cannot carry the image body that
// axios asks for (msw: "object.stream is not a function"), so the image stands in as its alt text.
vi.mock('@/features/attempts/components/attempt-image', () => ({
  AttemptImage: ({ alt }: { alt: string }) => <span>{alt}</span>,
}));

const teacherId = '44444444-4444-4444-8444-444444444444';
const reply = attemptReply({
  score: 78,
  pass: true,
  machine: { score: 61, pass: false },
  override: {
    score: 78,
    pass: true,
    comment: 'Reads evenly from across the room. Accepted.',
    by: teacherId,
    at: '2025-03-11T09:30:00.000Z',
  },
});
const classes = [
  {
    id: 'c1',
    name: 'Thursday watercolour',
    code: 'ABC234',
    teacher: { id: teacherId, displayName: 'Tamsin Arvello' },
    archived: false,
    studentCount: 8,
    createdAt: '2025-01-01T00:00:00.000Z',
  },
];

const page = () => (
  <Routes>
    <Route path="/attempts/:attemptId" element={<AttemptRoute />} />
  </Routes>
);

function serve({ withClasses = true } = {}) {
  let classRequests = 0;
  server.use(
    http.get(`*/api/attempts/${reply.id}`, () => HttpResponse.json(reply)),
    http.get('*/api/classes', () => {
      classRequests += 1;
      return HttpResponse.json(withClasses ? classes : []);
    }),
  );
  return { classRequests: () => classRequests };
}

describe('AttemptRoute with a teacher-marked attempt', () => {
  it("should name the student's teacher from their classes as the one who marked it", async () => {
    signInAs('student');
    serve();
    renderApp(page(), { route: `/attempts/${reply.id}` });
    const teacher = await screen.findByRole('region', { name: "The teacher's mark" });
    expect(await within(teacher).findByText(/^Marked by Tamsin Arvello on /)).toBeInTheDocument();
    expect(within(teacher).getByText('Pass · 78/100')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'What the machine measured' })).toHaveTextContent(
      'marked it Not yet · 61/100',
    );
  });

  it('should say "your teacher" when the marker is not among the student\'s classes', async () => {
    signInAs('student');
    const requests = serve({ withClasses: false });
    renderApp(page(), { route: `/attempts/${reply.id}` });
    const teacher = await screen.findByRole('region', { name: "The teacher's mark" });
    await expect.poll(() => requests.classRequests()).toBe(1);
    expect(await within(teacher).findByText(/^Marked by your teacher on /)).toBeInTheDocument();
  });

  it('should tell the teacher who marked it that it was them, without asking for classes', async () => {
    signInAs('teacher', { id: teacherId });
    const requests = serve();
    renderApp(page(), { route: `/attempts/${reply.id}` });
    const teacher = await screen.findByRole('region', { name: "The teacher's mark" });
    expect(within(teacher).getByText(/^Marked by you on /)).toBeInTheDocument();
    // The form beside it starts from the mark that stands.
    expect(screen.getByLabelText('Score (0–100)')).toHaveValue(78);
    expect(requests.classRequests()).toBe(0);
  });
});
