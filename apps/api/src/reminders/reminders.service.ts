import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { SchedulerRegistry } from '@nestjs/schedule';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { CronJob } from 'cron';
import { QueryTypes, UniqueConstraintError } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { appConfig } from '../config/app.config';
import { mailConfig } from '../config/mail.config';
import { MailService } from '../mail/mail.service';
import { calendarDate } from './calendar-date';
import { RoundReminder } from './models/round-reminder.model';
import { reminderEmail } from './reminder-email';
import { SchedulerLease } from './scheduler-lease';

/** How long the elected instance holds the daily run: longer than a run takes, far shorter than a day. */
const LEASE_SECONDS = 15 * 60;

interface DueRow {
  roundId: number;
  roundLabel: string;
  trialId: number;
  trialCode: string;
  trialTitle: string;
  safetyNotes: string | null;
  siteId: number;
  siteName: string;
  userId: number;
  userName: string;
  email: string;
  locale: string | null;
}

export interface ReminderRun {
  dueDate: string;
  /** E-mails sent in this run (one per collaborator and round). */
  sent: number;
  /** E-mails that could not be sent; they are tried again on the next run. */
  failed: number;
}

// Collaborators of active trials whose site has a round due on the date and who have not had this reminder yet.
const DUE_SQL = `
  SELECT r.id AS roundId, r.label AS roundLabel, t.id AS trialId, t.code AS trialCode, t.title AS trialTitle,
         t.safety_notes AS safetyNotes, s.id AS siteId, s.name AS siteName, u.id AS userId, u.name AS userName, u.email AS email, u.locale AS locale
    FROM assessment_rounds r
    JOIN trials t ON t.id = r.trial_id AND t.status = 'active' AND t.start_date IS NOT NULL
    JOIN sites s ON s.trial_id = t.id AND s.deleted_at IS NULL
    JOIN trial_memberships m ON m.trial_id = t.id AND m.role = 'collaborator' AND m.site_id = s.id
    JOIN users u ON u.id = m.user_id AND u.is_active = 1 AND u.email_reminders = 1
   WHERE DATE_ADD(t.start_date, INTERVAL r.day_offset DAY) = :dueDate AND r.deleted_at IS NULL
     AND NOT EXISTS (SELECT 1 FROM round_reminders rr
                      WHERE rr.round_id = r.id AND rr.site_id = s.id AND rr.user_id = u.id AND rr.due_date = :dueDate)
   ORDER BY u.id, r.id, s.name`;

/** Round reminders: the day before a round is due, each collaborator at a site gets one e-mail. */
@Injectable()
export class RemindersService implements OnApplicationBootstrap {
  private readonly logger = new Logger('Reminders');

  constructor(
    @InjectModel(RoundReminder) private readonly reminders: typeof RoundReminder,
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(mailConfig.KEY) private readonly mailSettings: ConfigType<typeof mailConfig>,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
    private readonly mail: MailService,
    private readonly scheduler: SchedulerRegistry,
    private readonly lease: SchedulerLease,
  ) {}

  /**
   * Schedules the daily run at REMINDER_HOUR (local time) on every instance; at each tick one instance is
   * elected through a database lease (scheduler-lease.ts) and runs it. Test runs call sendDueReminders
   * themselves; SCHEDULER_ENABLED=false keeps an instance out of the election altogether.
   */
  onApplicationBootstrap(): void {
    if (this.app.nodeEnv === 'test' || !this.mailSettings.schedulerEnabled) return;
    const job = CronJob.from({
      cronTime: `0 0 ${this.mailSettings.reminderHour} * * *`,
      onTick: () => {
        this.runIfElected(new Date()).catch((error: unknown) => this.logger.error(`reminder run failed: ${String(error)}`));
      },
      start: true,
    });
    this.scheduler.addCronJob('round-reminders', job);
  }

  /** The scheduled run: sends the reminders when this instance wins the lease, else leaves them (null). */
  async runIfElected(now: Date): Promise<ReminderRun | null> {
    if (!(await this.lease.acquire('round-reminders', LEASE_SECONDS))) return null;
    return this.sendDueReminders(now);
  }

  /**
   * Sends every reminder for rounds due the day after `now` (server's calendar) that has not been sent yet.
   * Each e-mail is recorded in round_reminders in the same transaction, so a second run sends nothing
   * and a failed e-mail is tried again next time.
   */
  async sendDueReminders(now: Date): Promise<ReminderRun> {
    const dueDate = calendarDate(now, 1);
    const rows = await this.sequelize.query<DueRow>(DUE_SQL, { replacements: { dueDate }, type: QueryTypes.SELECT });
    const groups = new Map<string, DueRow[]>();
    for (const row of rows) {
      const key = `${row.userId}:${row.roundId}`;
      groups.set(key, [...(groups.get(key) ?? []), row]);
    }
    const measures = await this.measuresOf([...new Set(rows.map((r) => Number(r.roundId)))]);
    let sent = 0;
    let failed = 0;
    for (const group of groups.values()) {
      const first = group[0];
      try {
        await this.sequelize.transaction(async (transaction) => {
          const sentAt = new Date();
          for (const row of group) {
            await this.reminders.create({ roundId: row.roundId, siteId: row.siteId, userId: row.userId, dueDate, sentAt }, { transaction });
          }
          await this.mail.send(
            reminderEmail({
              to: first.email,
              personName: first.userName,
              trialCode: first.trialCode,
              trialTitle: first.trialTitle,
              roundLabel: first.roundLabel,
              dueDate,
              sites: group.map((row) => ({ name: row.siteName, link: `${this.mailSettings.appUrl}/trials/${row.trialId}/plot-plan?site=${row.siteId}` })),
              measures: measures.get(Number(first.roundId)) ?? [],
              safetyNotes: first.safetyNotes,
              locale: first.locale,
            }),
          );
        });
        sent += 1;
      } catch (error) {
        // Another instance recorded the same reminder first: it sent it, so this one stays quiet.
        if (error instanceof UniqueConstraintError) continue;
        failed += 1;
        this.logger.error(`reminder for round ${first.roundId} to user ${first.userId} not sent: ${error instanceof Error ? error.message : String(error)}`);
      }
    }
    if (sent || failed) this.logger.log(`rounds due ${dueDate}: ${sent} reminder(s) sent, ${failed} failed`);
    return { dueDate, sent, failed };
  }

  private async measuresOf(roundIds: number[]): Promise<Map<number, string[]>> {
    const byRound = new Map<number, string[]>();
    if (!roundIds.length) return byRound;
    const rows = await this.sequelize.query<{ roundId: number; name: string }>(
      `SELECT rm.round_id AS roundId, ms.name AS name FROM round_measures rm JOIN measures ms ON ms.id = rm.measure_id AND ms.deleted_at IS NULL
        WHERE rm.round_id IN (:roundIds) ORDER BY ms.position, ms.id`,
      { replacements: { roundIds }, type: QueryTypes.SELECT },
    );
    for (const row of rows) byRound.set(Number(row.roundId), [...(byRound.get(Number(row.roundId)) ?? []), row.name]);
    return byRound;
  }
}
