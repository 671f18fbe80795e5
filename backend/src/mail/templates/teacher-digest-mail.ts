import { assertWebUrl, formatMailDate } from './mail-format';
import { actionLink, bulletList, note, paragraph, renderMailLayout } from './mail-layout';
import type { MailContent } from './mail-content';
import { markup, type SafeHtml } from './safe-html';

/** One assignment of a class in the digest: due last week or in the coming one. */
export interface TeacherDigestAssignment {
  title: string;
  dueAt: Date;
  /** Students who handed something in (names). */
  handedIn: string[];
  /** Students behind on it, with where they stand in words ("not started", "needs a retake"). */
  behind: Array<{ name: string; standing: string }>;
}

/** One class in the teacher's weekly digest. */
export interface TeacherDigestClass {
  name: string;
  /** Attempts the class's students sent that week (assignments of this class). */
  attempts: number;
  assignments: TeacherDigestAssignment[];
  /** Attempts of that week the machine marked below the pass line, with no mark of the teacher's yet. */
  waitingForReview: number;
  gradebookUrl: string;
}

export interface TeacherDigestMailInput {
  displayName: string;
  /** The first day (Monday) of the week summed up. */
  weekOf: Date;
  classes: TeacherDigestClass[];
  dashboardUrl: string;
  /** The account page, where the digest is turned off. */
  accountUrl: string;
}

const count = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** The lines said about one class, the same in the text and the HTML mail. */
function classLines(klass: TeacherDigestClass): string[] {
  const lines = [
    `${count(klass.attempts, 'attempt')} sent that week; ${count(klass.waitingForReview, 'attempt')} marked below the pass line and waiting for your review.`,
  ];
  for (const a of klass.assignments) {
    const handedIn = a.handedIn.length > 0 ? `handed in by ${a.handedIn.join(', ')}` : 'nobody has handed it in yet';
    const behind = a.behind.length > 0 ? `; behind: ${a.behind.map((b) => `${b.name} (${b.standing})`).join(', ')}` : '; nobody is behind';
    lines.push(`${a.title}, due ${formatMailDate(a.dueAt)}: ${handedIn}${behind}.`);
  }
  return lines;
}

/**
 * The teacher's weekly summary: per class, who handed in and who is behind on the assignments due
 * around that week, and how many attempts wait for review.
 * @throws Error when a link is not an http(s) address or `weekOf` is not a date
 * @example teacherDigestMail({ displayName: 'Tamsin', weekOf: new Date('2031-03-03T00:00:00Z'),
 *   classes: [{ name: 'Tuesday watercolour', attempts: 9, waitingForReview: 2, assignments: [],
 *   gradebookUrl: 'https://mixmark.test/teacher/classes/1/gradebook' }],
 *   dashboardUrl: 'https://mixmark.test/teacher', accountUrl: 'https://mixmark.test/account' })
 */
export function teacherDigestMail(input: TeacherDigestMailInput): MailContent {
  assertWebUrl('dashboardUrl', input.dashboardUrl);
  assertWebUrl('accountUrl', input.accountUrl);
  for (const klass of input.classes) assertWebUrl('gradebookUrl', klass.gradebookUrl);
  const week = formatMailDate(input.weekOf);
  const subject = `Your classes at Mixmark: the week of ${week}`;
  const intro = `Here is where your ${input.classes.length === 1 ? 'class stands' : 'classes stand'} after the week of ${week}.`;
  const stop = 'To stop these weekly summaries, turn them off on your account page:';

  const textParts = [`Hello ${input.displayName},`, intro];
  const body: SafeHtml[] = [paragraph(`Hello ${input.displayName},`), paragraph(intro)];
  for (const klass of input.classes) {
    const lines = classLines(klass);
    textParts.push(`${klass.name}\n${lines.map((line) => `- ${line}`).join('\n')}\nGradebook: ${klass.gradebookUrl}`);
    body.push(
      markup`<h2 style="margin:20px 0 8px 0;font-size:18px;font-weight:normal;">${klass.name}</h2>`,
      bulletList(lines),
      paragraph(markup`<a href="${klass.gradebookUrl}">Open the gradebook of ${klass.name}</a>`),
    );
  }
  textParts.push(`Your classes:\n${input.dashboardUrl}`, `${stop}\n${input.accountUrl}`, 'Mixmark');
  body.push(actionLink(input.dashboardUrl, 'Open your classes'), note(markup`${stop} <a href="${input.accountUrl}">${input.accountUrl}</a>`));

  return {
    subject,
    text: `${textParts.join('\n\n')}\n`,
    html: renderMailLayout({
      title: subject,
      heading: `Your classes, the week of ${week}`,
      body,
      footer: 'You get this summary once a week while you teach on Mixmark.',
    }),
  };
}
