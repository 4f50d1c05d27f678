import { registerAs } from '@nestjs/config';
import { readAppConfig } from './app.config';
import { EnvironmentError, requireInteger, requireText } from './validate-environment';

export interface AuthConfig {
  jwtSecret: string;
  /** Access-token lifetime in seconds (short: the session behind it is what lasts). */
  tokenTtlSeconds: number;
  /** `iss` and `aud` every access token carries and must carry. */
  jwtIssuer: string;
  jwtAudience: string;
  /** A session ends this many hours after sign-in, used or not. */
  sessionTtlHours: number;
  /** A session ends after this many hours without a request. */
  sessionIdleHours: number;
  /** True when APP_URL is https: the session cookie is then sent over TLS only. */
  secureCookie: boolean;
  /** Failed sign-ins to one account (known or not) before it is locked. */
  loginMaxFailures: number;
  /** Failed sign-ins from one client address, over any accounts, before it is locked. */
  loginAddressMaxFailures: number;
  /** The first lockout's length; each further failure after a lockout doubles it, up to the maximum. */
  loginLockSeconds: number;
  loginLockMaxSeconds: number;
  /** Failures older than this are forgotten. */
  loginForgetSeconds: number;
  /** Express `trust proxy`: the proxies whose X-Forwarded-For names the client; false trusts none. */
  trustProxy: string[] | false;
  /** bcrypt cost factor (work = 2^cost). */
  bcryptCost: number;
  /** How long an e-mailed password-reset link works. */
  passwordResetTtlMinutes: number;
  /** Requests per minute one client address may make to any one route of the API. */
  requestsPerMinute: number;
  /** Sign-in attempts per minute one client address may make, right or wrong. */
  loginAttemptsPerMinute: number;
}

function readTrustProxy(env: NodeJS.ProcessEnv): string[] | false {
  const raw = (env.TRUST_PROXY ?? '').trim();
  if (raw === '' || raw === 'false' || raw === 'none') return false;
  const entries = raw.split(',').map((entry) => entry.trim()).filter(Boolean);
  const known = /^(loopback|linklocal|uniquelocal|[0-9a-fA-F.:]+(\/\d{1,3})?)$/;
  const bad = entries.find((entry) => !known.test(entry));
  if (bad) throw new EnvironmentError(`TRUST_PROXY must list proxy addresses or subnets (or loopback, linklocal, uniquelocal), comma-separated; "${bad}" is none of these.`);
  return entries;
}

export function readAuthConfig(env: NodeJS.ProcessEnv = process.env): AuthConfig {
  const jwtSecret = requireText(env, 'JWT_SECRET');
  if (jwtSecret.length < 32) {
    throw new EnvironmentError('JWT_SECRET must be at least 32 characters long.');
  }
  return {
    jwtSecret,
    tokenTtlSeconds: requireInteger(env, 'JWT_TTL_SECONDS', 900, 60, 24 * 3600),
    jwtIssuer: requireText(env, 'JWT_ISSUER', 'friable'),
    jwtAudience: requireText(env, 'JWT_AUDIENCE', 'friable-api'),
    sessionTtlHours: requireInteger(env, 'SESSION_TTL_HOURS', 7 * 24, 1, 90 * 24),
    sessionIdleHours: requireInteger(env, 'SESSION_IDLE_HOURS', 24, 1, 90 * 24),
    secureCookie: readAppConfig(env).appUrl.startsWith('https://'),
    loginMaxFailures: requireInteger(env, 'LOGIN_MAX_FAILURES', 5, 1, 1000),
    loginAddressMaxFailures: requireInteger(env, 'LOGIN_ADDRESS_MAX_FAILURES', 20, 1, 100_000),
    loginLockSeconds: requireInteger(env, 'LOGIN_LOCK_SECONDS', 60, 1, 24 * 3600),
    loginLockMaxSeconds: requireInteger(env, 'LOGIN_LOCK_MAX_SECONDS', 3600, 1, 7 * 24 * 3600),
    loginForgetSeconds: requireInteger(env, 'LOGIN_FORGET_SECONDS', 24 * 3600, 60, 30 * 24 * 3600),
    trustProxy: readTrustProxy(env),
    bcryptCost: requireInteger(env, 'BCRYPT_COST', 12, 4, 15),
    passwordResetTtlMinutes: requireInteger(env, 'PASSWORD_RESET_TTL_MINUTES', 60, 5, 7 * 24 * 60),
    requestsPerMinute: requireInteger(env, 'RATE_LIMIT_PER_MINUTE', 1200, 1, 1_000_000),
    loginAttemptsPerMinute: requireInteger(env, 'LOGIN_ATTEMPTS_PER_MINUTE', 60, 1, 100_000),
  };
}

export const authConfig = registerAs('auth', () => readAuthConfig());
