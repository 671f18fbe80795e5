import { Injectable, UnauthorizedException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import type { Request } from 'express';
import type { AuthUser } from '../../common/decorators/current-user.decorator';
import { IS_PUBLIC_KEY } from '../../common/decorators/public.decorator';
import { VerifiedTokens } from '../verified-tokens';

const bearer = /^Bearer (\S+)$/;

/**
 * Global guard: every route needs a valid access token unless marked `@Public()`. passport-jwt
 * verifies a token the first time the process sees it; later requests with the same token
 * (a session sends it with every call) are answered from the verified tokens until it expires.
 */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  private readonly verified = new VerifiedTokens();

  constructor(private readonly reflector: Reflector) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [context.getHandler(), context.getClass()]);
    if (isPublic) return true;
    const request = context.switchToHttp().getRequest<Request & { user?: AuthUser }>();
    const token = bearer.exec(request.headers.authorization ?? '')?.[1];
    const known = token === undefined ? undefined : this.verified.find(token);
    if (known) {
      request.user = { ...known };
      return true;
    }
    const allowed = (await super.canActivate(context)) as boolean;
    if (allowed && token !== undefined && request.user) this.verified.remember(token, request.user);
    return allowed;
  }

  override handleRequest<TUser>(error: unknown, user: TUser | false): TUser {
    if (error || !user) {
      throw new UnauthorizedException({ code: 'unauthorized', message: 'Please sign in again: your session is missing or has expired.' });
    }
    return user;
  }
}
