import { describe, expect, it } from 'vitest';
import { readMailConfig } from './mail.config';
import { EnvironmentError } from './validate-environment';

describe('readMailConfig', () => {
  it('has defaults for one machine and takes links from APP_URL', () => {
    const config = readMailConfig({ APP_URL: 'https://friable.example.org/' });
    expect(config).toMatchObject({ smtpHost: '127.0.0.1', smtpPort: 2525, appUrl: 'https://friable.example.org', invitationTtlHours: 168, reminderHour: 7 });
    expect(config.outboxDir).toMatch(/\.data\/outbox$/);
  });

  it('names the variable that is wrong', () => {
    expect(() => readMailConfig({ SMTP_PORT: 'mail' })).toThrow(new EnvironmentError('SMTP_PORT must be a whole number from 1 to 65535; got "mail".'));
    expect(() => readMailConfig({ REMINDER_HOUR: '24' })).toThrow(/^REMINDER_HOUR must be a whole number from 0 to 23/);
    expect(() => readMailConfig({ INVITATION_TTL_HOURS: '0' })).toThrow(/^INVITATION_TTL_HOURS/);
    expect(() => readMailConfig({ MAIL_FROM: 'Friable' })).toThrow(/^MAIL_FROM must contain an e-mail address/);
    expect(() => readMailConfig({ SCHEDULER_ENABLED: 'sometimes' })).toThrow(new EnvironmentError('SCHEDULER_ENABLED must be true or false; got "sometimes".'));
  });

  it('runs the reminder schedule unless SCHEDULER_ENABLED is false', () => {
    expect(readMailConfig({}).schedulerEnabled).toBe(true);
    expect(readMailConfig({ SCHEDULER_ENABLED: 'false' }).schedulerEnabled).toBe(false);
    expect(readMailConfig({ SCHEDULER_ENABLED: '1' }).schedulerEnabled).toBe(true);
  });
});
