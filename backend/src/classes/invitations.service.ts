import { GoneException, Injectable, Logger, NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, IsNull, MoreThan, Repository } from 'typeorm';
import { hashSecret, newSecret, secretMatches, splitToken } from '../auth/tokens';
import type { AuthUser } from '../common/decorators/current-user.decorator';
import type { AllConfigType } from '../config/config.type';
import { MailService } from '../mail/mail.service';
import { invitationMail } from '../mail/templates';
import { User } from '../users/entities/user.entity';
import { ClassesService, type ClassSummary } from './classes.service';
import { Invitation } from './entities/invitation.entity';

/** A pending invitation as the teacher sees it: never the token, nor when it was accepted. */
export interface InvitationSummary {
  id: string;
  email: string;
  createdAt: Date;
  expiresAt: Date;
}

export interface InvitationPreview {
  className: string;
  teacherName: string;
  email: string;
  expiresAt: Date;
}

const unknownInvitation = () =>
  new NotFoundException({ code: 'invitation_unknown', message: 'This invitation link is not valid. Ask your teacher for a new one.' });

/** The row of a pending (neither accepted nor revoked) invitation of this class. */
const pendingIn = (classId: string, id: string) => ({ id, classId, acceptedAt: IsNull(), revokedAt: IsNull() });

/** A teacher's route naming an invitation that is not pending in this class. */
const unknownInvitationRow = () =>
  new NotFoundException({ code: 'invitation_not_found', message: 'There is no pending invitation with this id in this class. Reload the list of invitations.' });

@Injectable()
export class InvitationsService {
  private readonly logger = new Logger(InvitationsService.name);

  constructor(
    @InjectRepository(Invitation) private readonly invitationsRepository: Repository<Invitation>,
    private readonly classesService: ClassesService,
    private readonly mailService: MailService,
    private readonly configService: ConfigService<AllConfigType>,
    private readonly dataSource: DataSource,
  ) {}

  /** Invites each address by e-mail with its own single-use link; returns what was sent. */
  async invite(teacher: AuthUser, classId: string, emails: string[]): Promise<InvitationSummary[]> {
    const klass = await this.classesService.findOwned(teacher, classId);
    const owner = await this.dataSource.getRepository(User).findOneByOrFail({ id: klass.teacherId });
    const sent: InvitationSummary[] = [];
    for (const email of [...new Set(emails)]) {
      const secret = newSecret();
      const invitation = await this.invitationsRepository.save(
        this.invitationsRepository.create({ classId, email, tokenHash: hashSecret(secret), expiresAt: this.freshExpiry() }),
      );
      await this.sendMail(invitation, secret, owner.displayName, klass.name);
      sent.push(this.toSummary(invitation));
    }
    return sent;
  }

  /** Pending invitations only (not accepted, revoked or expired), newest first. */
  async findAll(teacher: AuthUser, classId: string): Promise<InvitationSummary[]> {
    await this.classesService.findOwned(teacher, classId);
    const rows = await this.invitationsRepository.find({
      where: { classId, acceptedAt: IsNull(), revokedAt: IsNull(), expiresAt: MoreThan(new Date()) },
      order: { createdAt: 'DESC', id: 'DESC' },
    });
    return rows.map((row) => this.toSummary(row));
  }

  /**
   * Sends a pending invitation again with a new secret and a fresh expiry on the same row, so
   * the link in the earlier mail stops working. An accepted or revoked invitation is a 404
   * (it is not pending); an expired one may be sent again.
   */
  async resend(teacher: AuthUser, classId: string, invitationId: string): Promise<InvitationSummary> {
    const klass = await this.classesService.findOwned(teacher, classId);
    const owner = await this.dataSource.getRepository(User).findOneByOrFail({ id: klass.teacherId });
    const secret = newSecret();
    const expiresAt = this.freshExpiry();
    const result = await this.invitationsRepository.update(
      pendingIn(classId, invitationId),
      { tokenHash: hashSecret(secret), expiresAt },
    );
    if (result.affected !== 1) throw unknownInvitationRow();
    const invitation = await this.invitationsRepository.findOneByOrFail({ id: invitationId });
    await this.sendMail(invitation, secret, owner.displayName, klass.name);
    return this.toSummary(invitation);
  }

  /** Revokes a pending invitation: its link then answers invitation_unknown (404). */
  async revoke(teacher: AuthUser, classId: string, invitationId: string): Promise<void> {
    await this.classesService.findOwned(teacher, classId);
    const result = await this.invitationsRepository.update(
      pendingIn(classId, invitationId),
      { revokedAt: new Date() },
    );
    if (result.affected !== 1) throw unknownInvitationRow();
  }

  /** What the accept page shows before the person signs in or registers. */
  async preview(token: string): Promise<InvitationPreview> {
    const invitation = await this.findUsable(token);
    const [row] = await this.dataSource.query<{ class_name: string; teacher_name: string }[]>(
      `SELECT c.name AS class_name, u.display_name AS teacher_name FROM classes c JOIN users u ON u.id = c.teacher_id WHERE c.id = $1`,
      [invitation.classId],
    );
    return { className: row.class_name, teacherName: row.teacher_name, email: invitation.email, expiresAt: invitation.expiresAt };
  }

  /** Puts the signed-in student on the class roster; the link works once. */
  async accept(student: AuthUser, token: string): Promise<ClassSummary> {
    const invitation = await this.findUsable(token);
    const result = await this.invitationsRepository.update(
      { id: invitation.id, tokenHash: invitation.tokenHash, acceptedAt: IsNull(), revokedAt: IsNull() },
      { acceptedAt: new Date(), acceptedById: student.id },
    );
    if (result.affected !== 1) {
      // Revoked or re-sent meanwhile: findUsable names which; otherwise it was used just now.
      await this.findUsable(token);
      throw new GoneException({ code: 'invitation_used', message: 'This invitation has already been used.' });
    }
    await this.classesService.addMember(invitation.classId, student.id);
    return this.classesService.findOne(student, invitation.classId);
  }

  private async findUsable(token: string): Promise<Invitation> {
    const parts = splitToken(token);
    if (!parts) throw unknownInvitation();
    const invitation = await this.invitationsRepository.findOneBy({ id: parts.id });
    if (!invitation || invitation.revokedAt || !secretMatches(parts.secret, invitation.tokenHash)) throw unknownInvitation();
    if (invitation.acceptedAt) throw new GoneException({ code: 'invitation_used', message: 'This invitation has already been used.' });
    if (invitation.expiresAt.getTime() <= Date.now()) {
      throw new GoneException({ code: 'invitation_expired', message: 'This invitation has expired. Ask your teacher to send a new one.' });
    }
    return invitation;
  }

  private freshExpiry(): Date {
    const days = this.configService.getOrThrow('auth.invitationTtlDays', { infer: true });
    return new Date(Date.now() + days * 86_400_000);
  }

  private async sendMail(invitation: Invitation, secret: string, teacherName: string, className: string): Promise<void> {
    const publicUrl = this.configService.getOrThrow('app.publicUrl', { infer: true });
    const acceptUrl = `${publicUrl}/invitations/${invitation.id}.${secret}`;
    await this.mailService.send({ to: invitation.email, ...invitationMail({ teacherName, className, acceptUrl, expiresAt: invitation.expiresAt }) });
  }

  private toSummary(row: Invitation): InvitationSummary {
    return { id: row.id, email: row.email, createdAt: row.createdAt, expiresAt: row.expiresAt };
  }
}
