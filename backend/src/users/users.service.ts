import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { User, type UserRole } from './entities/user.entity';

/** What the API shows of a user (never the password hash). */
export interface PublicUser {
  id: string;
  email: string;
  displayName: string;
  role: UserRole;
  createdAt: Date;
}

export function toPublicUser(user: User): PublicUser {
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role, createdAt: user.createdAt };
}

/** What the signed-in person sees of their own account (`GET /api/auth/me`): also their settings. */
export interface Profile extends PublicUser {
  /** Whether the weekly progress digest is e-mailed to them. */
  weeklyDigest: boolean;
}

export function toProfile(user: User): Profile {
  return { ...toPublicUser(user), weeklyDigest: user.weeklyDigest };
}

@Injectable()
export class UsersService {
  constructor(@InjectRepository(User) private readonly usersRepository: Repository<User>) {}

  async create(input: { email: string; displayName: string; role: UserRole; passwordHash: string }): Promise<User> {
    const email = input.email.trim().toLowerCase();
    if (await this.usersRepository.existsBy({ email })) {
      throw new ConflictException({ code: 'email_taken', message: 'An account with this e-mail already exists. Sign in, or reset the password.', details: { email: 'taken' } });
    }
    return this.usersRepository.save(this.usersRepository.create({ ...input, email }));
  }

  /** The user with the password hash, for sign-in only. */
  findByEmailWithPassword(email: string): Promise<User | null> {
    return this.usersRepository
      .createQueryBuilder('user')
      .addSelect('user.passwordHash')
      .where('user.email = :email', { email: email.trim().toLowerCase() })
      .getOne();
  }

  findByEmail(email: string): Promise<User | null> {
    return this.usersRepository.findOneBy({ email: email.trim().toLowerCase() });
  }

  async findOne(id: string): Promise<User> {
    const user = await this.usersRepository.findOneBy({ id });
    if (!user) throw new NotFoundException({ code: 'not_found', message: 'There is no user with this id.' });
    return user;
  }

  findAll(): Promise<User[]> {
    return this.usersRepository.find({ order: { createdAt: 'ASC' } });
  }

  async updateRole(id: string, role: UserRole): Promise<User> {
    const user = await this.findOne(id);
    user.role = role;
    return this.usersRepository.save(user);
  }

  /** Changes the person's own settings; fields left out stay as they are. */
  async updateProfile(id: string, changes: { displayName?: string; weeklyDigest?: boolean }): Promise<User> {
    const user = await this.findOne(id);
    if (changes.displayName !== undefined) user.displayName = changes.displayName;
    if (changes.weeklyDigest !== undefined) user.weeklyDigest = changes.weeklyDigest;
    return this.usersRepository.save(user);
  }

  async updatePassword(id: string, passwordHash: string): Promise<void> {
    await this.usersRepository.update({ id }, { passwordHash });
  }
}
