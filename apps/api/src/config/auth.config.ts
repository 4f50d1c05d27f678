import { registerAs } from '@nestjs/config';
import { EnvironmentError, requireInteger, requireText } from './validate-environment';

export interface AuthConfig {
  jwtSecret: string;
  /** Token lifetime in seconds. */
  tokenTtlSeconds: number;
  loginMaxFailures: number;
  loginWindowSeconds: number;
  /** Requests per minute one client address may make to any one route of the API. */
  requestsPerMinute: number;
  /** Sign-in attempts per minute one client address may make, right or wrong. */
  loginAttemptsPerMinute: number;
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
    requestsPerMinute: requireInteger(env, 'RATE_LIMIT_PER_MINUTE', 1200, 1, 1_000_000),
    loginAttemptsPerMinute: requireInteger(env, 'LOGIN_ATTEMPTS_PER_MINUTE', 60, 1, 100_000),
  };
}

export const authConfig = registerAs('auth', () => readAuthConfig());
