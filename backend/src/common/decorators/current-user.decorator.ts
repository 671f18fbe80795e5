import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { UserRole } from '../../users/entities/user.entity';

/** Who is calling, as the access token says. */
export interface AuthUser {
  id: string;
  role: UserRole;
}

/** The signed-in caller of a guarded route. */
export const CurrentUser = createParamDecorator(
  (_data: unknown, context: ExecutionContext): AuthUser => context.switchToHttp().getRequest().user,
);
