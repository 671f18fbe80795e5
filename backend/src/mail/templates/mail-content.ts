/** One mail ready to send: the subject and the same message as plain text and as HTML. */
export interface MailContent {
  subject: string;
  text: string;
  html: string;
}
