import { registerAs } from '@nestjs/config';
import { requireInteger } from '../config/validate-environment';

export interface IntakeConfig {
  /** Largest CSV file Intake reads (INTAKE_MAX_BYTES, default 10 MB). */
  maxBytes: number;
}

export const INTAKE_DEFAULT_MAX_BYTES = 10 * 1_048_576;

export function readIntakeConfig(env: NodeJS.ProcessEnv = process.env): IntakeConfig {
  return { maxBytes: requireInteger(env, 'INTAKE_MAX_BYTES', INTAKE_DEFAULT_MAX_BYTES, 1024, 200 * 1_048_576) };
}

export const intakeConfig = registerAs('intake', () => readIntakeConfig());
