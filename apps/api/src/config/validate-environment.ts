/** Thrown at start-up when the environment is unusable; the message names the variable. */
export class EnvironmentError extends Error {
  override name = 'EnvironmentError';
}

export function requireText(env: NodeJS.ProcessEnv, name: string, fallback?: string): string {
  const value = env[name] ?? fallback;
  if (value === undefined || value.trim() === '') {
    throw new EnvironmentError(`${name} is not set; copy .env.example to .env or set ${name} in the environment.`);
  }
  return value.trim();
}

export function requireInteger(env: NodeJS.ProcessEnv, name: string, fallback: number, min = 1, max = Number.MAX_SAFE_INTEGER): number {
  const raw = env[name];
  if (raw === undefined || raw.trim() === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new EnvironmentError(`${name} must be a whole number from ${min} to ${max}; got "${raw}".`);
  }
  return value;
}

export function requireFlag(env: NodeJS.ProcessEnv, name: string, fallback: boolean): boolean {
  const raw = env[name];
  if (raw === undefined || raw.trim() === '') return fallback;
  const value = raw.trim().toLowerCase();
  if (value === 'true' || value === '1') return true;
  if (value === 'false' || value === '0') return false;
  throw new EnvironmentError(`${name} must be true or false; got "${raw}".`);
}
