import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { RosterTable } from '@/features/classes/components/roster-table';
import { TeacherAssignmentList } from '@/features/assignments/components/teacher-assignment-list';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

// The menu button follows the WAI-ARIA Authoring Practices' menu button pattern
// (https://www.w3.org/WAI/ARIA/apg/patterns/menu-button/): aria-haspopup="menu", aria-expanded,
// aria-controls naming the open menu, Escape closing it. The row names and actions are the app's own.

const roster = [
  {
    id: 's1',
    displayName: 'Ines Podmore',
    email: 'ines@example.test',
    joinedAt: '2025-01-06T09:00:00.000Z',
  },
  {
    id: 's2',
    displayName: 'Theo Brackenridge',
    email: 'theo@example.test',
    joinedAt: '2025-01-07T09:00:00.000Z',
  },
];

describe('Row actions at phone width', () => {
  it('should offer a roster row’s actions behind a button naming the student, and remove after the confirm', async () => {
    signInAs('teacher');
    const removed: string[] = [];
    server.use(
      http.get('*/api/classes/c1/students', () => HttpResponse.json(roster)),
      http.delete('*/api/classes/c1/students/:studentId', ({ params }) => {
        removed.push(String(params.studentId));
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const confirm = vi.spyOn(window, 'confirm').mockReturnValue(true);
    renderApp(
      <RosterTable classId="c1" progressHref={(id) => `/teacher/students/${id}/progress`} />,
    );
    const button = await screen.findByRole('button', { name: 'Actions for Theo Brackenridge' });
    expect(button).toHaveAttribute('aria-haspopup', 'menu');
    expect(button).toHaveAttribute('aria-expanded', 'false');
    await userEvent.click(button);
    const menu = await screen.findByRole('menu', { name: 'Actions for Theo Brackenridge' });
    expect(button).toHaveAttribute('aria-expanded', 'true');
    // MUI puts the id on the menu's popover, around the list.
    expect(document.getElementById(button.getAttribute('aria-controls')!)).toContainElement(menu);
    expect(within(menu).getByRole('menuitem', { name: 'See progress' })).toHaveAttribute(
      'href',
      '/teacher/students/s2/progress',
    );
    await userEvent.click(within(menu).getByRole('menuitem', { name: 'Remove from the class' }));
    expect(confirm).toHaveBeenCalledWith('Remove Theo Brackenridge from this class?');
    await waitFor(() => expect(removed).toEqual(['s2']));
    confirm.mockRestore();
  });

  it('should send nothing when the confirm is declined, and close on Escape', async () => {
    signInAs('teacher');
    const removed: string[] = [];
    server.use(
      http.get('*/api/classes/c1/students', () => HttpResponse.json(roster)),
      http.delete('*/api/classes/c1/students/:studentId', ({ params }) => {
        removed.push(String(params.studentId));
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const confirm = vi.spyOn(window, 'confirm').mockReturnValue(false);
    renderApp(<RosterTable classId="c1" />);
    await userEvent.click(await screen.findByRole('button', { name: 'Actions for Ines Podmore' }));
    const menu = await screen.findByRole('menu', { name: 'Actions for Ines Podmore' });
    // No progress link without a progressHref: removing is the only action.
    expect(
      within(menu)
        .getAllByRole('menuitem')
        .map((item) => item.textContent),
    ).toEqual(['Remove from the class']);
    await userEvent.click(within(menu).getByRole('menuitem', { name: 'Remove from the class' }));
    expect(confirm).toHaveBeenCalledOnce();
    await userEvent.click(await screen.findByRole('button', { name: 'Actions for Ines Podmore' }));
    await screen.findByRole('menu', { name: 'Actions for Ines Podmore' });
    await userEvent.keyboard('{Escape}');
    await waitFor(() => expect(screen.queryByRole('menu')).not.toBeInTheDocument());
    expect(removed).toEqual([]);
    confirm.mockRestore();
  });

  it('should offer an assignment row’s attempts link behind a button naming the drill', async () => {
    signInAs('teacher');
    server.use(
      http.get('*/api/assignments', () =>
        HttpResponse.json([
          {
            id: 'a1',
            classId: 'c1',
            className: 'Thursday watercolour',
            drill: { id: 'd1', title: 'Flat wash of raw sienna', kind: 'graded-wash' },
            dueAt: '2099-03-01T17:00:00.000Z',
            note: '',
            createdAt: '2025-01-06T09:00:00.000Z',
          },
        ]),
      ),
    );
    renderApp(<TeacherAssignmentList assignmentHref={(id) => `/teacher/assignments/${id}`} />);
    await userEvent.click(
      await screen.findByRole('button', { name: 'Actions for Flat wash of raw sienna' }),
    );
    const menu = await screen.findByRole('menu', { name: 'Actions for Flat wash of raw sienna' });
    expect(within(menu).getByRole('menuitem', { name: 'See the attempts' })).toHaveAttribute(
      'href',
      '/teacher/assignments/a1',
    );
  });
});
