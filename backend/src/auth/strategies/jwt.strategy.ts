import { createSecretKey } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { AuthUser } from '../../common/decorators/current-user.decorator';
import type { AllConfigType } from '../../config/config.type';
import type { UserRole } from '../../users/entities/user.entity';

interface AccessTokenPayload {
  sub: string;
  role: UserRole;
}

/** Reads the short-lived access token from `Authorization: Bearer …`. */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(configService: ConfigService<AllConfigType>) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      ignoreExpiration: false,
      // A KeyObject, made once: given the secret as a string, jsonwebtoken first tries to read it as
      // a PEM public key on every request (createPublicKey, which throws) before falling back to
      // createSecretKey, and that was about a fifth of the server's CPU per signed-in request.
      // jsonwebtoken takes a KeyObject (its documented secretOrPublicKey types); passport-jwt's
      // types only list string | Buffer, hence the cast.
      secretOrKey: createSecretKey(Buffer.from(configService.getOrThrow('auth.jwtSecret', { infer: true }), 'utf8')) as unknown as Buffer,
      algorithms: ['HS256'],
    });
  }

  validate(payload: AccessTokenPayload): AuthUser {
    return { id: payload.sub, role: payload.role };
  }
}
