export { attemptMarkedMail, type AttemptMarkedMailInput } from './attempt-marked-mail';
export { escapeHtml } from './escape-html';
export { invitationMail, type InvitationMailInput } from './invitation-mail';
export type { MailContent } from './mail-content';
export { passwordResetMail, type PasswordResetMailInput } from './password-reset-mail';
export {
  weeklyDigestMail,
  type DigestDueItem,
  type DigestSkill,
  type WeeklyDigestMailInput,
} from './weekly-digest-mail';
export {
  teacherDigestMail,
  type TeacherDigestAssignment,
  type TeacherDigestClass,
  type TeacherDigestMailInput,
} from './teacher-digest-mail';
