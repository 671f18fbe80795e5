import type { UserRole } from '@/lib/auth-store';

const withArticle: Record<UserRole, string> = {
  student: 'a student',
  teacher: 'a teacher',
  admin: 'an admin',
};

/** "a student", "a teacher", "an admin". */
export const roleWithArticle = (role: UserRole) => withArticle[role];

/**
 * What a role change means for the person, sentence by sentence, as the server enforces it:
 * admins pass every role check and see every class, drill, assignment and attempt (RolesGuard,
 * the services' admin branches); teachers' own lists are their classes' (attempts: only those of
 * their classes' students); only students join classes and send photos (@Roles('student')).
 * Nothing is deleted by a role change (UsersService.updateRole sets the role and nothing else).
 */
export function roleChangeEffects(from: UserRole, to: UserRole): string[] {
  const lines: string[] = [];
  if (to === 'admin') {
    lines.push(
      "They will see and can change every account's data: all classes, drills, assignments, photos and marks, and every account and role on this page.",
    );
  }
  if (from === 'admin') {
    lines.push(
      `They lose this page and every other account's data, and keep only what ${roleWithArticle(to)} sees.`,
    );
  }
  if (from === 'teacher' && to === 'student') {
    lines.push(
      "They lose access to their classes' pages, drills, assignments and marking until made a teacher again. Nothing is deleted: their classes, drills and their students' marks stay.",
    );
  }
  if (from === 'student' && to === 'teacher') {
    lines.push(
      "They will be able to make classes and drills, set assignments and mark their students' work. They can no longer join a class or send a photo for marking; the classes they belong to and their own attempts are kept, but out of their sight until made a student again.",
    );
  }
  lines.push(
    'The change reaches them when their sign-in is next renewed (within 15 minutes with the standard settings).',
  );
  return lines;
}
