import type { IntakeImport, IntakeRefusal, IntakeResult, IntakeStage } from '@friable/contracts';
import { Injectable, Logger, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { randomUUID } from 'node:crypto';
import { User } from '../users/models/user.model';
import { IntakeImportRow, type IntakeImportStage } from './models/intake-import.model';

/** How often a running import tells it is alive, and how long a silence means the server stopped while it ran. */
const HEARTBEAT_MS = 5_000;
const INTERRUPTED_AFTER_MS = 60_000;
/** Least time between two progress writes of the checking stage. */
const PROGRESS_EVERY_MS = 400;
const RECENT_IMPORTS = 10;

export interface ImportStart {
  ticket?: string;
  trialId: number;
  siteId: number;
  roundId: number;
  userId: number | null;
  fileName: string;
  sizeBytes: number;
  format: 'csv' | 'xlsx';
  dryRun: boolean;
}

const finalStages: ReadonlySet<IntakeImportStage> = new Set(['done', 'refused', 'failed']);

function present(row: IntakeImportRow & { user?: User | null }, now = Date.now()): IntakeImport {
  const outcome = row.outcome ? (JSON.parse(row.outcome) as { result?: IntakeResult; refusal?: IntakeRefusal }) : {};
  const silent = !finalStages.has(row.stage) && now - row.updatedAt.getTime() > INTERRUPTED_AFTER_MS;
  const stage: IntakeStage = silent ? 'interrupted' : row.stage;
  return {
    ticket: row.ticket,
    siteId: row.siteId,
    roundId: row.roundId,
    fileName: row.fileName,
    sizeBytes: Number(row.sizeBytes),
    format: row.format,
    dryRun: Boolean(row.dryRun),
    stage,
    rowsChecked: row.rowsChecked,
    bytesRead: Number(row.bytesRead),
    valuesTotal: row.valuesTotal,
    valuesDone: row.valuesDone,
    message: silent ? 'The server stopped while this upload was being read or saved; nothing was written. Send the file again.' : row.message,
    userName: row.user?.name ?? null,
    startedAt: row.startedAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
    result: outcome.result ?? null,
    refusal: outcome.refusal ?? null,
  };
}

/**
 * One running import's record: its stage and counts are written as it goes (outside the import's
 * own transaction, so others see them at once), a heartbeat every few seconds shows it is alive,
 * and its answer is kept when it ends.
 */
export class ImportProgress {
  private lastWrite = 0;
  private writing: Promise<unknown> = Promise.resolve();
  private readonly heartbeat: NodeJS.Timeout;
  private ended = false;

  constructor(
    readonly ticket: string,
    private readonly row: IntakeImportRow,
    private readonly logger: Logger,
  ) {
    this.heartbeat = setInterval(() => this.write({}), HEARTBEAT_MS);
    this.heartbeat.unref();
  }

  /** Rows checked so far; written at most every 400 ms. */
  checking(rowsChecked: number, bytesRead: number): void {
    const now = Date.now();
    if (now - this.lastWrite < PROGRESS_EVERY_MS) return;
    this.lastWrite = now;
    this.write({ rowsChecked, bytesRead });
  }

  async stage(stage: 'checking' | 'comparing' | 'writing', counts: { rowsChecked?: number; valuesTotal?: number | null; valuesDone?: number; message?: string } = {}): Promise<void> {
    this.lastWrite = Date.now();
    await this.write({ stage, ...counts });
  }

  async done(result: IntakeResult): Promise<void> {
    await this.end({ stage: 'done', message: result.message, valuesDone: result.created + result.updated, outcome: JSON.stringify({ result }) });
  }

  async refused(refusal: IntakeRefusal): Promise<void> {
    await this.end({ stage: 'refused', message: refusal.message, outcome: JSON.stringify({ refusal }) });
  }

  async failed(message: string): Promise<void> {
    await this.end({ stage: 'failed', message: message.slice(0, 1000) });
  }

  private async end(values: Partial<Record<string, unknown>>): Promise<void> {
    if (this.ended) return;
    this.ended = true;
    clearInterval(this.heartbeat);
    await this.writing;
    await this.write({ ...values, finishedAt: new Date() });
  }

  /** One write at a time, in order; a failed progress write is logged, never fatal to the import. */
  private write(values: Partial<Record<string, unknown>>): Promise<void> {
    const next = this.writing.then(async () => {
      try {
        this.row.set({ ...values, updatedAt: new Date() });
        this.row.changed('updatedAt', true);
        await this.row.save({ silent: false });
      } catch (error) {
        this.logger.warn(`progress of import ${this.ticket} not recorded: ${error instanceof Error ? error.message : String(error)}`);
      }
    });
    this.writing = next;
    return next;
  }
}

/**
 * Intake imports — the record of every upload sent to Intake, so its progress can be followed
 * (also after a page reload, and from any API instance) and its answer read again.
 * Throws: NotFoundException for a ticket the trial does not have.
 */
@Injectable()
export class IntakeImportsService {
  private readonly logger = new Logger('Intake');

  constructor(@InjectModel(IntakeImportRow) private readonly imports: typeof IntakeImportRow) {}

  async start(start: ImportStart): Promise<ImportProgress> {
    const ticket = start.ticket ?? randomUUID();
    const now = new Date();
    const row = await this.imports.create({
      ticket,
      trialId: start.trialId,
      siteId: start.siteId,
      roundId: start.roundId,
      userId: start.userId,
      fileName: start.fileName.slice(0, 255),
      sizeBytes: start.sizeBytes,
      format: start.format,
      dryRun: start.dryRun,
      stage: 'checking',
      message: start.format === 'xlsx' ? 'Unpacking the workbook and checking its rows…' : 'Checking every row…',
      startedAt: now,
    });
    return new ImportProgress(ticket, row, this.logger);
  }

  async one(trialId: number, ticket: string): Promise<IntakeImport> {
    const row = await this.imports.findOne({ where: { trialId, ticket }, include: [{ model: User, attributes: ['name'] }] });
    if (!row) throw new NotFoundException('No such upload in this trial.');
    return present(row as IntakeImportRow & { user?: User | null });
  }

  /** The latest uploads for a site and round, newest first (running ones included). */
  async recent(trialId: number, siteId: number, roundId: number): Promise<IntakeImport[]> {
    const rows = await this.imports.findAll({
      where: { trialId, siteId, roundId },
      include: [{ model: User, attributes: ['name'] }],
      order: [['id', 'DESC']],
      limit: RECENT_IMPORTS,
    });
    const now = Date.now();
    return rows.map((row) => present(row as IntakeImportRow & { user?: User | null }, now));
  }
}
