import { assertWebUrl, oneLine } from './mail-format';
import { actionLink, bulletList, paragraph, quotation, renderMailLayout } from './mail-layout';
import type { MailContent } from './mail-content';
import { markup } from './safe-html';

/** What the mail about a marked (or commented) attempt says. */
export interface AttemptMarkedMailInput {
  /** The student's display name. */
  displayName: string;
  drillTitle: string;
  /** The mark's score, 0–100 (the teacher's override when there is one). */
  score: number;
  pass: boolean;
  /** The mark's feedback, one painter's sentence per line. */
  feedbackLines: string[];
  attemptUrl: string;
  /** Who commented, when the mail is about a teacher's comment or override. */
  commentBy?: string;
  comment?: string;
}

/**
 * The mail that tells a student their attempt is marked, or that their teacher commented on it.
 * @throws Error when `attemptUrl` is not an http(s) address or `score` is not a number
 * @example attemptMarkedMail({ displayName: 'Maren', drillTitle: 'Value ladder in burnt umber',
 *   score: 82, pass: true, feedbackLines: ['Step 3 is a little light.'],
 *   attemptUrl: 'https://mixmark.test/attempts/41' })
 */
export function attemptMarkedMail(input: AttemptMarkedMailInput): MailContent {
  const { displayName, drillTitle, pass, feedbackLines, attemptUrl, commentBy } = input;
  assertWebUrl('attemptUrl', attemptUrl);
  if (!Number.isFinite(input.score)) {
    throw new Error(`score must be a number from 0 to 100, but is ${String(input.score)}`);
  }
  const score = Math.round(input.score);
  const comment = input.comment?.trim() ? input.comment.trim() : undefined;
  const commenter = commentBy?.trim() ? commentBy.trim() : 'Your teacher';
  const outcome = pass ? 'passed' : 'not passed yet';

  const subject = oneLine(
    comment
      ? `${commenter} commented on your attempt at ${drillTitle}`
      : `Your attempt at ${drillTitle} is marked: ${score}, ${outcome}`,
  );
  const verdict = `Your attempt at "${drillTitle}" scored ${score} out of 100: ${outcome}.`;
  const encouragement = pass
    ? 'Well mixed. Repeating a drill you have passed still trains the eye.'
    : 'Read the notes below, mix again and take a new photo when you are ready.';

  const textParts = [`Hello ${displayName},`, `${verdict} ${encouragement}`];
  if (comment) textParts.push(`${commenter} wrote:\n${comment.replace(/^/gm, '> ')}`);
  if (feedbackLines.length > 0) {
    textParts.push(
      `What the measurement says:\n${feedbackLines.map((line) => `- ${line}`).join('\n')}`,
    );
  }
  textParts.push(`See the attempt, the photo and what was measured:\n${attemptUrl}`, 'Mixmark');

  const body = [
    paragraph(`Hello ${displayName},`),
    paragraph(
      markup`Your attempt at <strong>${drillTitle}</strong> scored <strong>${score}</strong> out of 100: ${outcome}. ${encouragement}`,
    ),
    comment ? paragraph(`${commenter} wrote:`) : undefined,
    comment ? quotation(comment) : undefined,
    feedbackLines.length > 0 ? paragraph('What the measurement says:') : undefined,
    feedbackLines.length > 0 ? bulletList(feedbackLines) : undefined,
    actionLink(attemptUrl, 'See the attempt'),
  ].filter((part) => part !== undefined);

  return {
    subject,
    text: `${textParts.join('\n\n')}\n`,
    html: renderMailLayout({
      title: subject,
      heading: comment ? `A comment on ${drillTitle}` : `${drillTitle}: ${outcome}`,
      body,
      footer: 'You get this mail because you submitted an attempt on Mixmark.',
    }),
  };
}
