import { randomUUID } from 'node:crypto';
import { Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import type { RegisterInput, SignInInput } from '@mixmark/common';
import bcrypt from 'bcryptjs';
import { IsNull, Repository } from 'typeorm';
import type { AllConfigType } from '../config/config.type';
import type { User } from '../users/entities/user.entity';
import { toPublicUser, UsersService, type PublicUser } from '../users/users.service';
import { RefreshToken } from './entities/refresh-token.entity';
import { hashSecret, newSecret, secretMatches, splitToken } from './tokens';


export interface Session {
  accessToken: string;
  expiresIn: number;
  user: PublicUser;
  /** Goes into the httpOnly cookie, never into the JSON body. */
  refreshToken: string;
  refreshExpiresAt: Date;
}

const invalidSession = () =>
  new UnauthorizedException({ code: 'session_expired', message: 'Your session has ended. Please sign in again.' });

@Injectable()
export class AuthService {
  private readonly rounds: number;
  // A real hash to compare against when the e-mail is unknown, so timing does not tell.
  private readonly decoyHash: string;

  constructor(
    private readonly usersService: UsersService,
    private readonly jwtService: JwtService,
    private readonly configService: ConfigService<AllConfigType>,
    @InjectRepository(RefreshToken) private readonly refreshTokensRepository: Repository<RefreshToken>,
  ) {
    this.rounds = configService.getOrThrow('auth.bcryptRounds', { infer: true });
    this.decoyHash = bcrypt.hashSync('decoy-password-for-timing', this.rounds);
  }

  /** bcrypt with the configured cost (12 by default: slows guessing, fine for sign-in). */
  hashPassword(password: string): Promise<string> {
    return bcrypt.hash(password, this.rounds);
  }

  async register(input: RegisterInput): Promise<Session> {
    const user = await this.usersService.create({
      email: input.email,
      displayName: input.displayName,
      role: input.role,
      passwordHash: await this.hashPassword(input.password),
    });
    return this.startSession(user);
  }

  async signIn(input: SignInInput): Promise<Session> {
    const user = await this.usersService.findByEmailWithPassword(input.email);
    const ok = await bcrypt.compare(input.password, user?.passwordHash ?? this.decoyHash);
    if (!user || !ok) {
      throw new UnauthorizedException({ code: 'bad_credentials', message: 'That e-mail and password do not match an account.' });
    }
    return this.startSession(user);
  }

  /**
   * Rotates a refresh token: the presented one is revoked and replaced. A token that was already
   * revoked is being replayed (stolen, or a copy kept): its whole family is revoked.
   */
  async refresh(token: string | undefined): Promise<Session> {
    const parts = splitToken(token);
    if (!parts) throw invalidSession();
    const row = await this.refreshTokensRepository.findOneBy({ id: parts.id });
    if (!row || !secretMatches(parts.secret, row.tokenHash)) throw invalidSession();
    if (row.revokedAt) {
      await this.revokeFamily(row.familyId);
      throw invalidSession();
    }
    if (row.expiresAt.getTime() <= Date.now()) throw invalidSession();
    const user = await this.usersService.findOne(row.userId).catch(() => {
      throw invalidSession();
    });
    const session = await this.startSession(user, row.familyId);
    // Only the first of two concurrent refreshes wins the rotation; the loser is treated as a replay.
    const result = await this.refreshTokensRepository.update(
      { id: row.id, revokedAt: IsNull() },
      { revokedAt: new Date(), replacedById: splitToken(session.refreshToken)!.id },
    );
    if (result.affected !== 1) {
      await this.revokeFamily(row.familyId);
      throw invalidSession();
    }
    return session;
  }

  /** Signs out: revokes the family of the presented token (all its rotations). */
  async signOut(token: string | undefined): Promise<void> {
    const parts = splitToken(token);
    if (!parts) return;
    const row = await this.refreshTokensRepository.findOneBy({ id: parts.id });
    if (row && secretMatches(parts.secret, row.tokenHash)) await this.revokeFamily(row.familyId);
  }

  /** Revokes every sign-in of a user (after a password reset). */
  async revokeAllFor(userId: string): Promise<void> {
    await this.refreshTokensRepository.update({ userId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async revokeFamily(familyId: string): Promise<void> {
    await this.refreshTokensRepository.update({ familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async startSession(user: User, familyId: string = randomUUID()): Promise<Session> {
    const auth = this.configService.getOrThrow('auth', { infer: true });
    const secret = newSecret();
    const refreshExpiresAt = new Date(Date.now() + auth.refreshTokenTtlDays * 86_400_000);
    const row = await this.refreshTokensRepository.save(
      this.refreshTokensRepository.create({ userId: user.id, familyId, tokenHash: hashSecret(secret), expiresAt: refreshExpiresAt }),
    );
    const accessToken = await this.jwtService.signAsync(
      { sub: user.id, role: user.role },
      { secret: auth.jwtSecret, expiresIn: auth.accessTokenTtlSeconds, algorithm: 'HS256' },
    );
    return {
      accessToken,
      expiresIn: auth.accessTokenTtlSeconds,
      user: toPublicUser(user),
      refreshToken: `${row.id}.${secret}`,
      refreshExpiresAt,
    };
  }
}
