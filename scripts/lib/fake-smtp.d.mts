// Types for `fake-smtp.mjs`, so the backend's TypeScript tests can import it.

/** One kept message, as written to its `.json` sidecar. */
export interface FakeSmtpMessage {
  id: string;
  /** ISO 8601, UTC. */
  receivedAt: string;
  /** The From header as sent (display name and address), or the envelope sender. */
  from: string;
  /** Envelope recipients: every address the message was delivered to (Bcc included). */
  to: string[];
  subject: string;
  text: string;
  html: string;
  messageId: string | null;
  envelope: { from: string; to: string[] };
}

/** A running fake SMTP server. */
export interface FakeSmtp {
  host: string;
  /** The port it really listens on (a free one when 0 was asked for). */
  port: number;
  /** Absolute path of the folder the messages are kept in. */
  dir: string;
  close(): Promise<void>;
}

/** Starts a local SMTP server that keeps every message in `dir` as `.eml` + `.json`. */
export function startFakeSmtp(options: {
  host?: string;
  port?: number;
  dir: string;
  onMessage?: (message: FakeSmtpMessage) => void;
}): Promise<FakeSmtp>;

/** The kept messages in `dir`, newest first; an absent folder is an empty outbox. */
export function listMessages(dir: string): Promise<FakeSmtpMessage[]>;
