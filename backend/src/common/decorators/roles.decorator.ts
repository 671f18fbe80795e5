import { SetMetadata } from '@nestjs/common';
import type { UserRole } from '../../users/entities/user.entity';

export const ROLES_KEY = 'roles';

/** Limits a route to the given roles (admins pass everywhere a role is required). */
export const Roles = (...roles: UserRole[]) => SetMetadata(ROLES_KEY, roles);
