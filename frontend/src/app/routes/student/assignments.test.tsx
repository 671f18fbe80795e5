import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { delay, http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { Route, Routes } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import StudentAssignmentsRoute from './assignments';
import JoinClassRoute from './join';

// A self-learner is a student account on no class (PRODUCT.md, "Who uses it"); the app's own rule
// here: GET /classes?archived=true (every class the student is on, archived ones too) is empty.

const onClass = {
  id: 'c1',
  name: 'Thursday watercolour',
  code: 'K7M2QX',
  teacher: { id: 't1', displayName: 'Marta Ocheltree' },
  archived: false,
  studentCount: 3,
  createdAt: '2025-01-06T09:00:00.000Z',
};

const assignment = {
  id: 'a1',
  classId: 'c1',
  className: 'Thursday watercolour',
  drill: { id: 'd1', title: 'Payne’s grey value ladder', kind: 'value-ladder' },
  dueAt: '2099-03-01T17:00:00.000Z',
  note: '',
  createdAt: '2025-01-06T09:00:00.000Z',
  status: 'not-started',
};

function serve({ classes, assignments }: { classes: unknown[] | 'fails'; assignments: unknown[] }) {
  const asked: string[] = [];
  server.use(
    http.get('*/api/classes', ({ request }) => {
      asked.push(new URL(request.url).search);
      return classes === 'fails'
        ? HttpResponse.json(
            { statusCode: 500, code: 'internal_error', message: 'Boom.' },
            { status: 500 },
          )
        : HttpResponse.json(classes);
    }),
    http.get('*/api/assignments', () => HttpResponse.json(assignments)),
  );
  return asked;
}

/** Every address the stand-in practice page was shown at, in order. */
const practiceShown: string[] = [];
function PracticeStandIn() {
  practiceShown.push('shown');
  return <h1>Practice library (stand-in)</h1>;
}

const page = () => (
  <Routes>
    <Route element={<AppLayout />}>
      <Route path="/student" element={<StudentAssignmentsRoute />} />
      <Route path="/student/practice" element={<PracticeStandIn />} />
      <Route path="/student/join" element={<JoinClassRoute />} />
    </Route>
  </Routes>
);

describe('Student start page', () => {
  it('should send a self-learner arriving at their start page on to the practice library', async () => {
    signInAs('student');
    const asked = serve({ classes: [], assignments: [] });
    renderApp(page(), { route: '/student' });
    expect(
      await screen.findByRole('heading', { name: 'Practice library (stand-in)' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'Your assignments' })).not.toBeInTheDocument();
    expect(asked).toEqual(['?archived=true']);
  });

  it('should keep a student on a class on their assignments', async () => {
    signInAs('student');
    serve({ classes: [onClass], assignments: [assignment] });
    renderApp(page(), { route: '/student' });
    expect(await screen.findByRole('heading', { name: 'Your assignments' })).toBeInTheDocument();
    expect(
      await screen.findByRole('heading', { name: 'Payne’s grey value ladder' }),
    ).toBeInTheDocument();
    expect(screen.queryByText('You are not on a class')).not.toBeInTheDocument();
  });

  it('should keep a student whose only class is archived on their assignments', async () => {
    signInAs('student');
    serve({ classes: [{ ...onClass, archived: true, code: null }], assignments: [assignment] });
    renderApp(page(), { route: '/student' });
    expect(
      await screen.findByRole('heading', { name: 'Payne’s grey value ladder' }),
    ).toBeInTheDocument();
  });

  it('should show a self-learner who picks Assignments from the menu where to practise and how to join', async () => {
    signInAs('student');
    serve({ classes: [], assignments: [] });
    renderApp(page(), { route: '/student/join' });
    await userEvent.click(await screen.findByRole('button', { name: 'Menu' }));
    const drawer = await screen.findByRole('dialog', { name: 'Menu' });
    await userEvent.click(within(drawer).getByRole('link', { name: 'Assignments' }));
    expect(await screen.findByRole('heading', { name: 'Your assignments' })).toBeInTheDocument();
    const notice = await screen.findByRole('region', { name: 'You are not on a class' });
    expect(within(notice).getByRole('link', { name: 'Open the practice library' })).toHaveAttribute(
      'href',
      '/student/practice',
    );
    expect(within(notice).getByRole('link', { name: 'Join a class with a code' })).toHaveAttribute(
      'href',
      '/student/join',
    );
    expect(await screen.findByText('No assignments yet')).toBeInTheDocument();
  });

  it('should keep a self-learner who has just joined a class on their assignments (not the list cached before)', async () => {
    signInAs('student');
    practiceShown.length = 0;
    let joined = false;
    serve({ classes: [], assignments: [] });
    server.use(
      // After the join the list comes a little late, as over a network: the cached empty one must
      // not decide meanwhile.
      http.get('*/api/classes', async () => {
        if (joined) await delay(300);
        return HttpResponse.json(joined ? [onClass] : []);
      }),
      http.get('*/api/assignments', () => HttpResponse.json(joined ? [assignment] : [])),
      http.post('*/api/classes/join', () => {
        joined = true;
        return HttpResponse.json(onClass);
      }),
    );
    renderApp(page(), { route: '/student/join' });
    // Assignments picked from the menu first: the empty class list is in the cache.
    await userEvent.click(await screen.findByRole('button', { name: 'Menu' }));
    await userEvent.click(
      within(await screen.findByRole('dialog', { name: 'Menu' })).getByRole('link', {
        name: 'Assignments',
      }),
    );
    await userEvent.click(await screen.findByRole('link', { name: 'Join a class with a code' }));
    await userEvent.type(await screen.findByLabelText('Class code'), 'K7M2QX');
    await userEvent.click(screen.getByRole('button', { name: 'Join the class' }));
    // The join page goes on to /student by itself, 1.2 s after saying which class was joined.
    expect(
      await screen.findByRole('heading', { name: 'Payne’s grey value ladder' }, { timeout: 4000 }),
    ).toBeInTheDocument();
    expect(practiceShown).toEqual([]);
  });

  it('should show the assignments page as before when the classes cannot be read', async () => {
    signInAs('student');
    serve({ classes: 'fails', assignments: [assignment] });
    renderApp(page(), { route: '/student' });
    expect(await screen.findByRole('heading', { name: 'Your assignments' })).toBeInTheDocument();
    expect(
      await screen.findByRole('heading', { name: 'Payne’s grey value ladder' }),
    ).toBeInTheDocument();
    expect(screen.queryByText('You are not on a class')).not.toBeInTheDocument();
  });
});
