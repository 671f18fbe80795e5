export type ClassSummary = {
  id: string;
  name: string;
  /** Null once the class is archived (its code no longer lets anyone join). */
  code: string | null;
  teacher: { id: string; displayName: string };
  archived: boolean;
  studentCount: number;
  createdAt: string;
};

export type RosterEntry = { id: string; displayName: string; email: string; joinedAt: string };

export type InvitationSummary = {
  id: string;
  email: string;
  expiresAt: string;
  createdAt: string;
};

export type InvitationPreview = {
  className: string;
  teacherName: string;
  email: string;
  expiresAt: string;
};
