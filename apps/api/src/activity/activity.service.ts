import type { ActivityEntry } from '@friable/contracts';
import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction, WhereOptions } from 'sequelize';
import { User } from '../users/models/user.model';
import { ActivityEntryRow } from './models/activity-entry.model';

/** What a change tells the activity log. `kind` is `<thing>.<verb>`, e.g. 'site.randomized', 'invitation.sent'. */
export interface ActivityRecord {
  trialId: number;
  /** The person who made the change; null for the system (e.g. the demo loader without a person). */
  userId: number | null;
  kind: string;
  siteId?: number | null;
  /** One sentence for people, e.g. "Randomized Millbrook Allotments with seed clay-2026." */
  summary: string;
  details?: Record<string, unknown>;
}

export interface ActivityFilter {
  kind?: string;
  siteId?: number;
  userId?: number;
}

function toEntry(row: ActivityEntryRow): ActivityEntry {
  return {
    id: row.id,
    at: row.createdAt.toISOString(),
    userId: row.userId,
    userName: row.user?.name ?? null,
    kind: row.kind,
    siteId: row.siteId,
    summary: row.summary,
    details: JSON.parse(row.details) as Record<string, unknown>,
  };
}

/**
 * Activity log — records every change to a trial and lists them newest first.
 * Call `record` inside the transaction that makes the change, so the log and the change
 * are written together or not at all.
 */
@Injectable()
export class ActivityService {
  constructor(@InjectModel(ActivityEntryRow) private readonly entries: typeof ActivityEntryRow) {}

  async record(transaction: Transaction | null, entry: ActivityRecord): Promise<void> {
    await this.entries.create(
      {
        trialId: entry.trialId,
        userId: entry.userId,
        kind: entry.kind,
        siteId: entry.siteId ?? null,
        summary: entry.summary.slice(0, 500),
        details: JSON.stringify(entry.details ?? {}),
      },
      { transaction: transaction ?? undefined },
    );
  }

  /** The trial's entries, newest first, optionally only one kind, site or person. */
  async list(trialId: number, filter: ActivityFilter = {}): Promise<ActivityEntry[]> {
    const where: WhereOptions = { trialId };
    if (filter.kind) Object.assign(where, { kind: filter.kind });
    if (filter.siteId !== undefined) Object.assign(where, { siteId: filter.siteId });
    if (filter.userId !== undefined) Object.assign(where, { userId: filter.userId });
    const rows = await this.entries.findAll({
      where,
      include: [{ model: User, attributes: ['id', 'name'] }],
      order: [['id', 'DESC']],
      limit: 1000,
    });
    return rows.map(toEntry);
  }
}
