import { registerAs } from '@nestjs/config';
import { resolve } from 'node:path';
import { readAppConfig } from './app.config';
import { EnvironmentError, requireFlag, requireInteger, requireText } from './validate-environment';

export interface MailConfig {
  smtpHost: string;
  smtpPort: number;
  /** The sender of every e-mail, e.g. `Friable <no-reply@example.org>`. */
  from: string;
  /** Absolute folder where the local SMTP sink writes caught messages (read by the development Outbox). */
  outboxDir: string;
  /** The address people use to reach the app, for links in e-mails (APP_URL of the app config). */
  appUrl: string;
  invitationTtlHours: number;
  /** Local hour (0–23) at which the daily reminder job runs. */
  reminderHour: number;
  /** False on all but one of several API instances, so reminders go out once. */
  schedulerEnabled: boolean;
}

// The repository root, from src/config or dist/config alike.
const repoRoot = resolve(__dirname, '../../../..');

export function readMailConfig(env: NodeJS.ProcessEnv = process.env): MailConfig {
  const from = requireText(env, 'MAIL_FROM', 'Friable <no-reply@example.org>');
  if (!/@/.test(from)) throw new EnvironmentError(`MAIL_FROM must contain an e-mail address; got "${from}".`);
  return {
    smtpHost: requireText(env, 'SMTP_HOST', '127.0.0.1'),
    smtpPort: requireInteger(env, 'SMTP_PORT', 2525, 1, 65535),
    from,
    outboxDir: resolve(repoRoot, requireText(env, 'MAIL_OUTBOX_DIR', '.data/outbox')),
    appUrl: readAppConfig(env).appUrl,
    invitationTtlHours: requireInteger(env, 'INVITATION_TTL_HOURS', 168, 1, 24 * 90),
    reminderHour: requireInteger(env, 'REMINDER_HOUR', 7, 0, 23),
    schedulerEnabled: requireFlag(env, 'SCHEDULER_ENABLED', true),
  };
}

export const mailConfig = registerAs('mail', () => readMailConfig());
