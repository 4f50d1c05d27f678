import { registerAs } from '@nestjs/config';
import { EnvironmentError, requireInteger, requireText } from './validate-environment';

export interface AuthConfig {
  jwtSecret: string;
  /** Token lifetime in seconds. */
  tokenTtlSeconds: number;
  loginMaxFailures: number;
  loginWindowSeconds: number;
}

export function readAuthConfig(env: NodeJS.ProcessEnv = process.env): AuthConfig {
  const jwtSecret = requireText(env, 'JWT_SECRET');
  if (jwtSecret.length < 32) {
    throw new EnvironmentError('JWT_SECRET must be at least 32 characters long.');
  }
  return {
    jwtSecret,
    tokenTtlSeconds: requireInteger(env, 'JWT_TTL_SECONDS', 8 * 3600, 60, 30 * 24 * 3600),
    loginMaxFailures: requireInteger(env, 'LOGIN_MAX_FAILURES', 5, 1, 1000),
    loginWindowSeconds: requireInteger(env, 'LOGIN_WINDOW_SECONDS', 60, 1, 24 * 3600),
  };
}

export const authConfig = registerAs('auth', () => readAuthConfig());
