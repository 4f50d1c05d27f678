import { registerAs } from '@nestjs/config';
import { tmpdir } from 'node:os';
import { EnvironmentError, requireInteger } from '../config/validate-environment';

export type BulkLoadSetting = 'infile' | 'insert';

export interface IntakeConfig {
  /** Largest file Intake takes (INTAKE_MAX_BYTES, default 100 MB: a million rows of the template). */
  maxBytes: number;
  /** Folder for uploads on their way in and the spool of checked values (INTAKE_WORK_DIR, default the system's temporary folder). */
  workDir: string;
  /** How checked values reach the database (INTAKE_BULK_LOAD): `infile` (LOAD DATA LOCAL INFILE) or `insert` (multi-row INSERTs). */
  bulkLoad: BulkLoadSetting;
}

export const INTAKE_DEFAULT_MAX_BYTES = 100 * 1_048_576;

export function readIntakeConfig(env: NodeJS.ProcessEnv = process.env): IntakeConfig {
  const bulkLoad = (env.INTAKE_BULK_LOAD ?? '').trim() || 'infile';
  if (bulkLoad !== 'infile' && bulkLoad !== 'insert') {
    throw new EnvironmentError(`INTAKE_BULK_LOAD must be infile or insert; got "${env.INTAKE_BULK_LOAD}".`);
  }
  return {
    maxBytes: requireInteger(env, 'INTAKE_MAX_BYTES', INTAKE_DEFAULT_MAX_BYTES, 1024, 2048 * 1_048_576),
    workDir: (env.INTAKE_WORK_DIR ?? '').trim() || tmpdir(),
    bulkLoad,
  };
}

export const intakeConfig = registerAs('intake', () => readIntakeConfig());
