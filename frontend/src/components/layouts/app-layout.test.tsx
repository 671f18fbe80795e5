import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { Route, Routes, useLocation } from 'react-router-dom';
import { authStore, type UserRole } from '@/lib/auth-store';
import { renderApp, signInAs } from '@/testing/test-utils';
import { AppLayout } from './app-layout';

// The checks follow the WAI-ARIA Authoring Practices' disclosure and modal dialog patterns
// (https://www.w3.org/WAI/ARIA/apg/patterns/disclosure/ and .../dialog-modal/): the button says
// whether what it controls is open (aria-expanded) and names it (aria-controls); Escape closes a
// modal dialog and the focus goes back to what opened it. aria-current="page" on the link of the
// page shown is from WAI-ARIA 1.2 (aria-current). The links per role are the app's own.

/** Shows the address, so a test can tell where a link went. */
function Where() {
  const { pathname } = useLocation();
  return <p>Page at {pathname}</p>;
}

const page = () => (
  <Routes>
    <Route element={<AppLayout />}>
      <Route path="*" element={<Where />} />
    </Route>
  </Routes>
);

async function openMenu() {
  const button = await screen.findByRole('button', { name: 'Menu' });
  await userEvent.click(button);
  const drawer = await screen.findByRole('dialog', { name: 'Menu' });
  return { button, drawer };
}

/** The links of the "Main" navigation inside `box`, as [words, address]. */
const linksIn = async (box: HTMLElement) =>
  within(await within(box).findByRole('navigation', { name: 'Main' }))
    .getAllByRole('link')
    .map((link) => [link.textContent, link.getAttribute('href')]);

describe('AppLayout menu drawer (phone width)', () => {
  const expected: Record<UserRole, [string, string][]> = {
    student: [
      ['Assignments', '/student'],
      ['Practice', '/student/practice'],
      ['History', '/student/history'],
      ['Progress', '/student/progress'],
      ['My palette', '/palette'],
      ['Join a class', '/student/join'],
    ],
    teacher: [
      ['Dashboard', '/teacher'],
      ['Drills', '/teacher/drills'],
      ['Assign', '/teacher/assign'],
      ['My palette', '/palette'],
    ],
    admin: [
      ['Users', '/admin/users'],
      ['My palette', '/palette'],
    ],
  };

  it.each(Object.keys(expected) as UserRole[])(
    'should list the %s’s places, the same as the top bar’s row',
    async (role) => {
      signInAs(role);
      renderApp(page(), { route: '/palette' });
      // The row under the top bar (shown from MUI's `sm` width up; jsdom applies no media query).
      expect(await linksIn(screen.getByRole('banner'))).toEqual(expected[role]);
      const { drawer } = await openMenu();
      expect(await linksIn(drawer)).toEqual(expected[role]);
    },
  );

  it('should say it is open, name the drawer, and mark the page shown', async () => {
    signInAs('student');
    renderApp(page(), { route: '/student/history' });
    const button = await screen.findByRole('button', { name: 'Menu' });
    expect(button).toHaveAttribute('aria-expanded', 'false');
    expect(button).not.toHaveAttribute('aria-controls');
    const { drawer } = await openMenu();
    expect(button).toHaveAttribute('aria-expanded', 'true');
    expect(button.getAttribute('aria-controls')).toBe(drawer.id);
    const nav = within(drawer).getByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'History' })).toHaveAttribute(
      'aria-current',
      'page',
    );
    const others = within(nav)
      .getAllByRole('link')
      .filter((link) => link.textContent !== 'History');
    for (const link of others) expect(link).not.toHaveAttribute('aria-current');
  });

  it('should close on Escape and give the focus back to the menu button', async () => {
    signInAs('teacher');
    renderApp(page(), { route: '/teacher' });
    const { button } = await openMenu();
    await userEvent.keyboard('{Escape}');
    await waitFor(() =>
      expect(screen.queryByRole('dialog', { name: 'Menu' })).not.toBeInTheDocument(),
    );
    expect(button).toHaveAttribute('aria-expanded', 'false');
    expect(button).toHaveFocus();
  });

  it('should close when a link is followed, on the new page, with the focus on the menu button', async () => {
    signInAs('student');
    renderApp(page(), { route: '/student' });
    const { button, drawer } = await openMenu();
    await userEvent.click(within(drawer).getByRole('link', { name: 'Progress' }));
    expect(await screen.findByText('Page at /student/progress')).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.queryByRole('dialog', { name: 'Menu' })).not.toBeInTheDocument(),
    );
    expect(button).toHaveAttribute('aria-expanded', 'false');
    expect(button).toHaveFocus();
    // Opened again, it marks the new page.
    const again = await openMenu();
    expect(within(again.drawer).getByRole('link', { name: 'Progress' })).toHaveAttribute(
      'aria-current',
      'page',
    );
  });

  it('should close on its own close button', async () => {
    signInAs('admin');
    renderApp(page(), { route: '/admin/users' });
    const { button, drawer } = await openMenu();
    await userEvent.click(within(drawer).getByRole('button', { name: 'Close the menu' }));
    await waitFor(() =>
      expect(screen.queryByRole('dialog', { name: 'Menu' })).not.toBeInTheDocument(),
    );
    expect(button).toHaveFocus();
  });

  it('should show no menu button to someone signed out', async () => {
    authStore.signOut();
    renderApp(page(), { route: '/' });
    expect(await screen.findByRole('link', { name: 'Sign in' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Menu' })).not.toBeInTheDocument();
  });
});
