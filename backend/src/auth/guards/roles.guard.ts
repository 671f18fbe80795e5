import { ForbiddenException, Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { AuthUser } from '../../common/decorators/current-user.decorator';
import { ROLES_KEY } from '../../common/decorators/roles.decorator';
import type { UserRole } from '../../users/entities/user.entity';

/** Global guard after the JWT guard: enforces `@Roles(...)`; admins pass every role check. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<UserRole[] | undefined>(ROLES_KEY, [context.getHandler(), context.getClass()]);
    if (!roles || roles.length === 0) return true;
    const user = context.switchToHttp().getRequest().user as AuthUser | undefined;
    if (user && (user.role === 'admin' || roles.includes(user.role))) return true;
    throw new ForbiddenException({ code: 'forbidden', message: `This is for ${roles.join(' or ')} accounts.` });
  }
}
