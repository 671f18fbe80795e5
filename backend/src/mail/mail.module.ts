import { Global, Module } from '@nestjs/common';
import { MailService } from './mail.service';

/**
 * E-mail for every feature: inject `MailService` and send a template's output, e.g.
 * `mailService.send({ to, ...invitationMail({ … }) })`. Global, so features need not import it.
 * Needs the `mail` config namespace loaded (`config/mail.config.ts`).
 */
@Global()
@Module({
  providers: [MailService],
  exports: [MailService],
})
export class MailModule {}
