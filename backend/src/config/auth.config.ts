import { registerAs } from '@nestjs/config';
import { number, object, string } from 'yup';
import { validateConfig } from './validate-config';
import type { AuthConfig } from './config.type';

/** Used only outside production, so that a fresh clone signs in without any set-up. */
const developmentSecret = 'mixmark-development-secret-not-for-production-use';

const schema = object({
  NODE_ENV: string().default('development'),
  JWT_SECRET: string()
    .min(32, 'JWT_SECRET must be at least 32 characters')
    .when('NODE_ENV', {
      is: 'production',
      then: (s) => s.required('JWT_SECRET must be set in production'),
      otherwise: (s) => s.default(developmentSecret),
    }),
  ACCESS_TOKEN_TTL_SECONDS: number().integer().min(60).max(86400).default(900),
  REFRESH_TOKEN_TTL_DAYS: number().integer().min(1).max(365).default(30),
  PASSWORD_RESET_TTL_MINUTES: number().integer().min(5).max(1440).default(60),
  INVITATION_TTL_DAYS: number().integer().min(1).max(90).default(14),
  // bcrypt cost: 12 by default (~0.25 s a hash here); tests may lower it to 4 for speed.
  BCRYPT_ROUNDS: number().integer().min(4).max(15).default(12),
  SIGN_IN_LIMIT_PER_MINUTE: number().integer().min(1).max(100000).default(10),
  // A whole class often signs in at once from one studio network: the per-address limit is higher.
  SIGN_IN_IP_LIMIT_PER_MINUTE: number().integer().min(1).max(100000).default(120),
});

export default registerAs('auth', (): AuthConfig => {
  const env = validateConfig(schema, process.env);
  return {
    jwtSecret: env.JWT_SECRET as string,
    accessTokenTtlSeconds: env.ACCESS_TOKEN_TTL_SECONDS,
    refreshTokenTtlDays: env.REFRESH_TOKEN_TTL_DAYS,
    passwordResetTtlMinutes: env.PASSWORD_RESET_TTL_MINUTES,
    invitationTtlDays: env.INVITATION_TTL_DAYS,
    bcryptRounds: env.BCRYPT_ROUNDS,
    signInLimitPerMinute: env.SIGN_IN_LIMIT_PER_MINUTE,
    signInIpLimitPerMinute: env.SIGN_IN_IP_LIMIT_PER_MINUTE,
  };
});
