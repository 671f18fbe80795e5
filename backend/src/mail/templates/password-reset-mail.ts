import { assertWebUrl, formatMailDateTime } from './mail-format';
import { actionLink, note, paragraph, renderMailLayout } from './mail-layout';
import type { MailContent } from './mail-content';

/** What a password reset mail says. */
export interface PasswordResetMailInput {
  displayName: string;
  /** The single-use link that lets the reader choose a new password. */
  resetUrl: string;
  /** When the link stops working. */
  expiresAt: Date;
}

/**
 * The mail with the single-use link that resets a password.
 * @throws Error when `resetUrl` is not an http(s) address or `expiresAt` is not a date
 * @example passwordResetMail({ displayName: 'Maren', resetUrl: 'https://mixmark.test/reset/xyz',
 *   expiresAt: new Date('2031-03-04T17:30:00Z') })
 */
export function passwordResetMail(input: PasswordResetMailInput): MailContent {
  const { displayName, resetUrl } = input;
  assertWebUrl('resetUrl', resetUrl);
  const expires = formatMailDateTime(input.expiresAt);
  const subject = 'Choose a new password for Mixmark';
  const intro =
    'Someone, we hope you, asked to reset the password of your Mixmark account. To choose a new password, open this link:';
  const expiry = `The link works once, until ${expires}.`;
  const notYou =
    'If you did not ask for this, you can ignore this mail: your password stays as it is unless the link is opened.';

  const text = [`Hello ${displayName},`, `${intro}\n${resetUrl}`, expiry, notYou, 'Mixmark'].join(
    '\n\n',
  );

  return {
    subject,
    text: `${text}\n`,
    html: renderMailLayout({
      title: subject,
      heading: 'Choose a new password',
      body: [
        paragraph(`Hello ${displayName},`),
        paragraph(intro.replace(/:$/, '.')),
        actionLink(resetUrl, 'Choose a new password'),
        note(expiry),
        note(notYou),
      ],
      footer:
        'You get this mail because a password reset was asked for the Mixmark account at this address.',
    }),
  };
}
