import { assertWebUrl, formatMailDateTime, oneLine } from './mail-format';
import { actionLink, note, paragraph, renderMailLayout } from './mail-layout';
import type { MailContent } from './mail-content';
import { markup } from './safe-html';

/** What an invitation to a class says. */
export interface InvitationMailInput {
  /** The inviting teacher's display name. */
  teacherName: string;
  className: string;
  /** The tokenised link that accepts the invitation. */
  acceptUrl: string;
  /** When the link stops working. */
  expiresAt: Date;
}

/**
 * The mail that invites someone to join a teacher's class.
 * @throws Error when `acceptUrl` is not an http(s) address or `expiresAt` is not a date
 * @example invitationMail({ teacherName: 'Wren Halloway', className: 'Thursday watercolour',
 *   acceptUrl: 'https://mixmark.test/invitations/abc', expiresAt: new Date('2031-03-04T17:30:00Z') })
 */
export function invitationMail(input: InvitationMailInput): MailContent {
  const { teacherName, className, acceptUrl } = input;
  assertWebUrl('acceptUrl', acceptUrl);
  const expires = formatMailDateTime(input.expiresAt);
  const subject = oneLine(`${teacherName} invited you to the class ${className} on Mixmark`);

  const text = [
    'Hello,',
    `${teacherName} has invited you to join the class "${className}" on Mixmark. In the class you paint the drills your teacher sets, photograph each swatch beside the printed reference card, and see how close your mix came in value, temperature and chroma.`,
    `To join, open this link:\n${acceptUrl}`,
    `The link works until ${expires}. If you did not expect this invitation, you can ignore this mail: nothing happens unless you open the link.`,
    'Mixmark',
  ].join('\n\n');

  const body = [
    paragraph('Hello,'),
    paragraph(
      markup`<strong>${teacherName}</strong> has invited you to join the class <strong>${className}</strong> on Mixmark. In the class you paint the drills your teacher sets, photograph each swatch beside the printed reference card, and see how close your mix came in value, temperature and chroma.`,
    ),
    actionLink(acceptUrl, 'Join the class'),
    note(
      `The link works until ${expires}. If you did not expect this invitation, you can ignore this mail: nothing happens unless you open the link.`,
    ),
  ];

  return {
    subject,
    text: `${text}\n`,
    html: renderMailLayout({
      title: subject,
      heading: `An invitation to ${className}`,
      body,
      footer: `You get this mail because ${teacherName} entered your address to invite you to a class on Mixmark.`,
    }),
  };
}
