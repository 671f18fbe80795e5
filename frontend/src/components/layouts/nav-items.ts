import { paths } from '@/config/paths';
import type { UserRole } from '@/lib/auth-store';

export type NavItem = { label: string; href: string };

/** Each role's places, in the top bar above MUI's `sm` width and in the menu drawer below it. */
export const navByRole: Record<UserRole, NavItem[]> = {
  student: [
    { label: 'Assignments', href: paths.student.assignments.getHref() },
    { label: 'Practice', href: paths.student.library.getHref() },
    { label: 'History', href: paths.student.history.getHref() },
    { label: 'Progress', href: paths.student.progress.getHref() },
    { label: 'My palette', href: paths.palette.getHref() },
    { label: 'Join a class', href: paths.student.join.getHref() },
  ],
  teacher: [
    { label: 'Dashboard', href: paths.teacher.dashboard.getHref() },
    { label: 'Drills', href: paths.teacher.drills.getHref() },
    { label: 'Assign', href: paths.teacher.assign.getHref() },
    { label: 'My palette', href: paths.palette.getHref() },
  ],
  admin: [
    { label: 'Users', href: paths.admin.users.getHref() },
    { label: 'My palette', href: paths.palette.getHref() },
  ],
};

/**
 * The history state a main-menu link carries: the person picked the page themselves. The
 * student's assignments page reads it: reached as someone's start page with no class, it sends
 * a self-learner on to the practice library; picked from the menu, it stays.
 */
export const pickedFromMenu = { pickedFromMenu: true } as const;

export function wasPickedFromMenu(state: unknown): boolean {
  return (
    typeof state === 'object' &&
    state !== null &&
    (state as { pickedFromMenu?: unknown }).pickedFromMenu === true
  );
}

/** Below MUI's `sm` breakpoint (600 px in the default theme): the menu button instead of the row of links. */
export const phoneQuery = '(max-width: 599.95px)';
