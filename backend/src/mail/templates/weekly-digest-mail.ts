import { assertWebUrl, formatMailDate } from './mail-format';
import { actionLink, bulletList, figures, note, paragraph, renderMailLayout } from './mail-layout';
import type { MailContent } from './mail-content';
import { markup } from './safe-html';

/** The skills progress is tracked in (value, temperature and hue, chroma). */
export type DigestSkill = 'value' | 'temperature' | 'chroma';

/** An assignment still open for the reader: due last week or in the coming one, not passed. */
export interface DigestDueItem {
  title: string;
  className: string;
  dueAt: Date;
  /** Where the reader stands on it, in words (e.g. "not started", "needs a retake"). */
  standing: string;
}

/** What the weekly progress summary says. */
export interface WeeklyDigestMailInput {
  displayName: string;
  /** The first day (Monday) of the week summed up. */
  weekOf: Date;
  /** Attempts submitted that week (assignments and practice). */
  attempts: number;
  /** Share of that week's graded attempts that passed, from 0 to 1; `null` when none was graded. */
  passRate: number | null;
  /** Mean ΔE00 from target over the week's graded attempts; `null` when there were none. */
  meanDeltaE: number | null;
  /** The week's mean errors by skill: |ΔL*|, |ΔWC| (warm–cool index), |ΔC′|; null when unknown. */
  errors?: { value: number | null; temperature: number | null; chroma: number | null };
  bestSkill: DigestSkill | null;
  weakestSkill: DigestSkill | null;
  /** Consecutive days with at least one attempt, up to the end of the week. */
  streakDays?: number;
  /** Assignments still open. */
  due?: DigestDueItem[];
  progressUrl: string;
  /** The account page, where the digest is turned off. */
  accountUrl?: string;
}

const skillNames: Record<DigestSkill, string> = {
  value: 'value (how light or dark)',
  temperature: 'temperature (warm or cool)',
  chroma: 'chroma (how intense or greyed)',
};

const skillTips: Record<DigestSkill, string> = {
  value:
    'For value: squint at your swatch beside the target. With the colour blurred, a difference in lightness is easier to see.',
  temperature:
    'For temperature: lay your mix between a warmer and a cooler neighbour; which way it leans is easier to judge in company.',
  chroma:
    'For chroma: to grey a mix without moving its value much, add a little of its complement rather than black.',
};

/**
 * What a mean ΔE00 roughly looks like side by side. The bands are approximate: how visible a
 * difference is depends on the colours, the light and the viewer.
 */
function describeDeltaE(deltaE: number): string {
  if (deltaE <= 1) return 'side by side, hard to tell apart';
  if (deltaE <= 2.5) return 'close: a careful eye sees the difference side by side';
  if (deltaE <= 5) return 'a visible difference side by side';
  return 'clearly a different colour';
}

const days = (n: number) => `${n} ${n === 1 ? 'day' : 'days'}`;

/**
 * The weekly summary of a student's or self-learner's practice: the week's figures, the streak,
 * what is still due, and how to stop these mails.
 * @throws Error when a link is not an http(s) address, `weekOf` is not a date,
 *   or `passRate` is outside 0–1
 * @example weeklyDigestMail({ displayName: 'Maren', weekOf: new Date('2031-03-03T00:00:00Z'),
 *   attempts: 7, passRate: 5 / 7, meanDeltaE: 3.4, bestSkill: 'value', weakestSkill: 'chroma',
 *   progressUrl: 'https://mixmark.test/student/progress', accountUrl: 'https://mixmark.test/account' })
 */
export function weeklyDigestMail(input: WeeklyDigestMailInput): MailContent {
  const { displayName, attempts, passRate, meanDeltaE, bestSkill, weakestSkill, progressUrl, accountUrl } = input;
  assertWebUrl('progressUrl', progressUrl);
  if (accountUrl !== undefined) assertWebUrl('accountUrl', accountUrl);
  if (passRate !== null && (!Number.isFinite(passRate) || passRate < 0 || passRate > 1)) {
    throw new Error(`passRate must be a share from 0 to 1, but is ${String(passRate)}`);
  }
  const week = formatMailDate(input.weekOf);
  const subject = `Your week at Mixmark: the week of ${week}`;

  const hasDeltaE = attempts > 0 && meanDeltaE !== null && Number.isFinite(meanDeltaE);
  const rows: Array<[string, string]> = [];
  if (attempts > 0) {
    rows.push(['Attempts', String(attempts)]);
    if (passRate !== null) rows.push(['Passed', `${Math.round(passRate * 100)} %`]);
    if (hasDeltaE) {
      rows.push(['Mean ΔE00 from target', `${(meanDeltaE as number).toFixed(1)}, ${describeDeltaE(meanDeltaE as number)}`]);
    }
    const errors = input.errors;
    if (errors?.value != null) rows.push(['Value error (|ΔL*|)', errors.value.toFixed(1)]);
    if (errors?.temperature != null) rows.push(['Temperature error (warm–cool index)', errors.temperature.toFixed(2)]);
    if (errors?.chroma != null) rows.push(['Chroma error (|ΔC′|)', errors.chroma.toFixed(1)]);
    if (bestSkill) rows.push(['Strongest', skillNames[bestSkill]]);
    if (weakestSkill) rows.push(['Most room to grow', skillNames[weakestSkill]]);
  }
  if (input.streakDays !== undefined && input.streakDays > 0) rows.push(['Practice streak', days(input.streakDays)]);
  const summary =
    attempts > 0
      ? 'Here is how your week went at the palette.'
      : `You did not send any attempts in the week of ${week}. One short drill is enough to keep your eye in.`;
  const tip = attempts > 0 && weakestSkill ? skillTips[weakestSkill] : undefined;
  const due = (input.due ?? []).map(
    (item) => `${item.title} (${item.className}): due ${formatMailDate(item.dueAt)}, ${item.standing}`,
  );
  const stop = accountUrl ? 'To stop these weekly summaries, turn them off on your account page:' : undefined;

  const textParts = [`Hello ${displayName},`, summary];
  if (rows.length > 0) textParts.push(rows.map(([label, value]) => `${label}: ${value}`).join('\n'));
  if (tip) textParts.push(tip);
  if (due.length > 0) textParts.push(`Still to do:\n${due.map((line) => `- ${line}`).join('\n')}`);
  textParts.push(`Your progress, week by week:\n${progressUrl}`);
  if (stop) textParts.push(`${stop}\n${accountUrl}`);
  textParts.push('Mixmark');

  const body = [
    paragraph(`Hello ${displayName},`),
    paragraph(summary),
    rows.length > 0 ? figures(rows) : undefined,
    tip ? paragraph(tip) : undefined,
    due.length > 0 ? paragraph('Still to do:') : undefined,
    due.length > 0 ? bulletList(due) : undefined,
    actionLink(progressUrl, 'See your progress'),
    hasDeltaE
      ? note('ΔE00 is the CIEDE2000 colour difference between your swatch and the target, measured from your photos.')
      : undefined,
    stop ? note(markup`${stop} <a href="${accountUrl}">${accountUrl}</a>`) : undefined,
  ].filter((part) => part !== undefined);

  return {
    subject,
    text: `${textParts.join('\n\n')}\n`,
    html: renderMailLayout({
      title: subject,
      heading: `The week of ${week}`,
      body,
      footer: 'You get this summary once a week while you practise on Mixmark.',
    }),
  };
}
