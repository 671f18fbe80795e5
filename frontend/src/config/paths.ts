/** Every route, defined once. */
const withQuery = (path: string, query: Record<string, string | undefined>) => {
  const search = new URLSearchParams(
    Object.entries(query).filter((entry): entry is [string, string] => Boolean(entry[1])),
  ).toString();
  return search ? `${path}?${search}` : path;
};

export const paths = {
  home: { path: '/', getHref: () => '/' },
  status: { path: '/status', getHref: () => '/status' },
  auth: {
    signIn: {
      path: '/sign-in',
      getHref: (redirectTo?: string) => withQuery('/sign-in', { redirectTo }),
    },
    register: {
      path: '/register',
      /** `email` fills in the form's address (an invitation link passes the invited one). */
      getHref: (redirectTo?: string, email?: string) => withQuery('/register', { redirectTo, email }),
    },
    forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
    resetPassword: {
      path: '/reset-password/:token',
      getHref: (token: string) => `/reset-password/${encodeURIComponent(token)}`,
    },
  },
  invitation: {
    path: '/invitations/:token',
    getHref: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  },
  student: {
    assignments: { path: '/student', getHref: () => '/student' },
    join: { path: '/student/join', getHref: () => '/student/join' },
    library: { path: '/student/practice', getHref: () => '/student/practice' },
    drill: {
      path: '/student/drills/:drillId',
      getHref: (drillId: string, assignmentId?: string) =>
        withQuery(`/student/drills/${drillId}`, { assignmentId }),
    },
    history: { path: '/student/history', getHref: () => '/student/history' },
    progress: { path: '/student/progress', getHref: () => '/student/progress' },
  },
  palette: { path: '/palette', getHref: () => '/palette' },
  /** The signed-in person's own settings (the weekly digest mail links here). */
  account: { path: '/account', getHref: () => '/account' },
  /** One address for an attempt (the mail links to it): the result for a student, review for a teacher. */
  attempt: { path: '/attempts/:attemptId', getHref: (attemptId: string) => `/attempts/${attemptId}` },
  teacher: {
    dashboard: { path: '/teacher', getHref: () => '/teacher' },
    class: { path: '/teacher/classes/:classId', getHref: (classId: string) => `/teacher/classes/${classId}` },
    gradebook: {
      path: '/teacher/classes/:classId/gradebook',
      getHref: (classId: string) => `/teacher/classes/${classId}/gradebook`,
    },
    studentProgress: {
      path: '/teacher/students/:studentId/progress',
      getHref: (studentId: string) => `/teacher/students/${studentId}/progress`,
    },
    drills: { path: '/teacher/drills', getHref: () => '/teacher/drills' },
    newDrill: { path: '/teacher/drills/new', getHref: () => '/teacher/drills/new' },
    editDrill: {
      path: '/teacher/drills/:drillId/edit',
      getHref: (drillId: string) => `/teacher/drills/${drillId}/edit`,
    },
    assign: {
      path: '/teacher/assign',
      getHref: (query: { classId?: string; drillId?: string } = {}) => withQuery('/teacher/assign', query),
    },
    assignment: {
      path: '/teacher/assignments/:assignmentId',
      getHref: (assignmentId: string) => `/teacher/assignments/${assignmentId}`,
    },
  },
  /** The e-mails a development server keeps instead of sending (absent in production). */
  devOutbox: {
    path: '/dev/outbox',
    getHref: () => '/dev/outbox',
    message: {
      path: '/dev/outbox/:messageId',
      getHref: (messageId: string) => `/dev/outbox/${encodeURIComponent(messageId)}`,
    },
  },
  admin: { users: { path: '/admin/users', getHref: () => '/admin/users' } },
} as const;

/** Where each role starts after signing in. */
export function homeFor(role: 'admin' | 'teacher' | 'student'): string {
  if (role === 'teacher') return paths.teacher.dashboard.getHref();
  if (role === 'admin') return paths.admin.users.getHref();
  return paths.student.assignments.getHref();
}
