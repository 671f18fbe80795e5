import {
  Injectable,
  Logger,
  ServiceUnavailableException,
  type OnModuleDestroy,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createTransport, type Transporter } from 'nodemailer';
import type { AllConfigType } from '../config/config.type';

/** One mail to one recipient, usually the output of a template plus the address. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

const loopbackHosts = new Set(['127.0.0.1', 'localhost', '::1', '[::1]']);

/** The SMTP URL without its password, for messages and logs. */
function redact(smtpUrl: string): string {
  try {
    const url = new URL(smtpUrl);
    if (url.password) url.password = '***';
    return url.toString().replace(/\/$/, '');
  } catch {
    return 'the configured SMTP server';
  }
}

/**
 * Sends mail over SMTP with nodemailer. The server is `mail.smtpUrl` (the fake SMTP server in
 * development and tests); every mail goes out from `mail.from`, as text and HTML.
 */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private readonly transporter: Transporter;
  private readonly from: string;
  private readonly server: string;

  constructor(configService: ConfigService<AllConfigType>) {
    const config = configService.getOrThrow('mail', { infer: true });
    this.from = config.from;
    this.server = redact(config.smtpUrl);
    const host = new URL(config.smtpUrl).hostname;
    this.transporter = createTransport({
      url: config.smtpUrl,
      // A server on this machine (the fake) offers no TLS; anywhere else STARTTLS is used when
      // offered. `?ignoreTLS=false` or `?requireTLS=true` in SMTP_URL overrides this.
      ignoreTLS: loopbackHosts.has(host),
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 30_000,
    });
  }

  /**
   * Hands one mail to the SMTP server; resolves once the server has accepted it.
   * @throws Error when the message has no recipient or subject (a bug in the caller)
   * @throws ServiceUnavailableException (503, code `mail_unavailable`) when the server cannot
   *   be reached or refuses the mail; the reason is logged
   */
  async send(message: MailMessage): Promise<void> {
    const to = message.to?.trim();
    if (!to || !/^[^@\s]+@[^@\s]+$/.test(to.replace(/^.*<([^<>]+)>$/, '$1'))) {
      throw new Error(
        `MailService.send needs one recipient address in "to", but got "${message.to}"`,
      );
    }
    if (!message.subject?.trim()) {
      throw new Error(`MailService.send needs a subject (mail to ${to})`);
    }
    try {
      await this.transporter.sendMail({
        from: this.from,
        to,
        subject: message.subject,
        text: message.text,
        html: message.html,
      });
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      this.logger.error(
        `The mail "${message.subject}" to ${to} was not accepted by ${this.server}: ${reason}`,
      );
      throw new ServiceUnavailableException({
        code: 'mail_unavailable',
        message: 'The e-mail could not be sent just now. Please try again in a few minutes.',
      });
    }
  }

  /** Closes the SMTP connection when the app shuts down. */
  onModuleDestroy(): void {
    this.transporter.close();
  }
}
