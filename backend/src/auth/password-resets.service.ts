import { GoneException, Injectable, NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { IsNull, Repository } from 'typeorm';
import type { AllConfigType } from '../config/config.type';
import { MailService } from '../mail/mail.service';
import { passwordResetMail } from '../mail/templates';
import { UsersService } from '../users/users.service';
import { AuthService } from './auth.service';
import { PasswordReset } from './entities/password-reset.entity';
import { hashSecret, newSecret, secretMatches, splitToken } from './tokens';

const badLink = () =>
  new NotFoundException({ code: 'reset_link_unknown', message: 'This reset link is not valid. Ask for a new one from the sign-in page.' });

@Injectable()
export class PasswordResetsService {
  constructor(
    @InjectRepository(PasswordReset) private readonly resetsRepository: Repository<PasswordReset>,
    private readonly usersService: UsersService,
    private readonly authService: AuthService,
    private readonly mailService: MailService,
    private readonly configService: ConfigService<AllConfigType>,
  ) {}

  /**
   * E-mails a single-use, expiring link when the address has an account. The reply is the same
   * either way, so the form does not reveal who has an account.
   */
  async request(email: string): Promise<void> {
    const user = await this.usersService.findByEmail(email);
    if (!user) return;
    const minutes = this.configService.getOrThrow('auth.passwordResetTtlMinutes', { infer: true });
    const publicUrl = this.configService.getOrThrow('app.publicUrl', { infer: true });
    const secret = newSecret();
    const reset = await this.resetsRepository.save(
      this.resetsRepository.create({ userId: user.id, tokenHash: hashSecret(secret), expiresAt: new Date(Date.now() + minutes * 60_000) }),
    );
    await this.mailService.send({
      to: user.email,
      ...passwordResetMail({ displayName: user.displayName, resetUrl: `${publicUrl}/reset-password/${reset.id}.${secret}`, expiresAt: reset.expiresAt }),
    });
  }

  /** Sets the new password, uses up the link and signs the account out everywhere. */
  async reset(token: string, password: string): Promise<void> {
    const parts = splitToken(token);
    if (!parts) throw badLink();
    const reset = await this.resetsRepository.findOneBy({ id: parts.id });
    if (!reset || !secretMatches(parts.secret, reset.tokenHash)) throw badLink();
    if (reset.expiresAt.getTime() <= Date.now()) {
      throw new GoneException({ code: 'reset_link_expired', message: 'This reset link has expired. Ask for a new one from the sign-in page.' });
    }
    const used = await this.resetsRepository.update({ id: reset.id, usedAt: IsNull() }, { usedAt: new Date() });
    if (used.affected !== 1) throw new GoneException({ code: 'reset_link_used', message: 'This reset link has already been used.' });
    await this.usersService.updatePassword(reset.userId, await this.authService.hashPassword(password));
    await this.authService.revokeAllFor(reset.userId);
  }
}
