import { INTAKE_CHANGE_LIST_CAP, type IntakeChange, type IntakeProblem, type IntakeRefusal, type IntakeResult, type Measure } from '@friable/contracts';
import { ConflictException, HttpException, Inject, Injectable, Logger, NotFoundException, PayloadTooLargeException, UnprocessableEntityException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Connection as MariaDbConnection } from 'mariadb';
import { QueryTypes, Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { refuseIfClosed } from '../common/exceptions/trial-locked.exception';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import { mailConfig } from '../config/mail.config';
import { MailService } from '../mail/mail.service';
import { MeasureRow } from '../measures/models/measure.model';
import { presentMeasure } from '../measures/measure.presenter';
import { BulkLoadIncomplete, type BulkStream } from '../observations/bulk-stream';
import { ObservationBulkStore, type BulkComparison, type BulkWriteContext } from '../observations/observation-bulk-store.service';
import { assertMayWriteSite } from '../observations/site-write-access';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import { checkUpload, type CheckedUpload } from './check-upload';
import { IntakeColumnsService } from './intake-columns.service';
import { IntakeImportsService, type ImportProgress } from './intake-imports.service';
import { intakeConfig } from './intake.config';
import { IntakeUploadRow } from './models/intake-upload.model';
import { IntakeFileError, SitePlotIndex, describeStoredValue, plotLabelKey } from './parsing';
import { openUpload, sniffFormat, sourceSize, type UploadSource } from './read-upload';
import { intakeReceiptEmail } from './receipt-email';
import { isBareBlank, valueLine } from './value-lines';

export interface IntakeUpload {
  fileName: string;
  source: UploadSource;
}

export interface IntakeOptions {
  dryRun: boolean;
  acceptWarnings: boolean;
  /** From the mapping step: column header → role, measure code, or null to ignore the column. */
  columnOverrides?: Readonly<Record<string, string | null>>;
  /** The reason for NA values of rows that give none (the upload dialog's choice for the whole file). */
  missingReason?: string | null;
  /** False to send no receipt e-mail (the demo loader); true by default. */
  receipt?: boolean;
  /** The browser's name for this upload, to follow its progress; one is made up when absent. */
  ticket?: string;
  /** The workbook sheet to read; the first visible one when absent. */
  sheet?: string | null;
}

interface Resolved {
  trial: Trial;
  site: SiteRow;
  round: AssessmentRoundRow;
  measures: Measure[];
}

/** What a run of the file ends in: the answer, and (for a commit) the facts the receipt needs. */
interface Outcome {
  result: IntakeResult;
  rowsRead: number;
  warningsAccepted: number;
}

/** Thrown inside the transaction to roll it back while still answering (a dry run, an identical file). */
class RollBack {
  constructor(readonly outcome: Outcome) {}
}

const count = (value: number) => new Intl.NumberFormat('en').format(value);
const plural = (value: number, one: string, many: string) => `${count(value)} ${value === 1 ? one : many}`;
const PLOT_PAGE = 50_000;

/** The measures whose notes a file gives: all of its measures with a notes column for the whole row, else those with their own. */
function notedMeasures(mapping: CheckedUpload['mapping']): number[] {
  return mapping.notes !== null ? mapping.measures.map((column) => column.measureId) : mapping.measureNotes.map((column) => column.measureId);
}

function refusalBody(message: string, errors: readonly IntakeProblem[]): IntakeRefusal {
  return { statusCode: 422, error: 'Unprocessable Entity', message, errors: [...errors] };
}

function refusal(message: string, errors: readonly IntakeProblem[]): UnprocessableEntityException {
  return new UnprocessableEntityException(refusalBody(message, errors));
}

/** Turns a reader's IntakeFileError into the HTTP answer (413 or 422 with its rows); anything else goes on as it is. */
function fileRefusal(error: unknown): never {
  if (!(error instanceof IntakeFileError)) throw error;
  if (error.status === 413) throw new PayloadTooLargeException(error.message);
  throw refusal(error.message, error.problems.length ? error.problems : [{ row: null, column: null, message: error.message }]);
}

/** Nothing stored yet: every value is new, listed from the first ones kept in memory. */
function freshComparison(checked: CheckedUpload): BulkComparison {
  const listed = checked.firstValues.map((value) => ({
    kind: 'new' as const,
    plotLabel: value.plotLabel,
    measureCode: value.measureCode,
    before: null,
    after: { valueText: value.valueText, censored: value.censored, missingReason: value.missingReason },
  }));
  return { created: checked.values, updated: 0, unchanged: 0, listed };
}

/**
 * Intake — reads an uploaded CSV file or workbook sheet for one site and round, checks every row,
 * and either answers what it would do (dry run) or writes the whole file in one transaction.
 *
 * Purpose: the all-or-nothing rule at the database's own speed, for files of a million rows. The
 * file streams from disk; while its rows are checked, its values stream into the database
 * (`LOAD DATA LOCAL INFILE`): straight into observations where the site and round hold nothing
 * yet, else into a staging table that is then compared with the stored values and merged
 * set-based (`ObservationBulkStore`). All of it runs in one transaction, rolled back on any error
 * (422 listing every problem by row and column), on warnings not accepted, for a dry run, and for
 * a file byte-identical to the last one committed for the site and round (which changes nothing).
 * A commit is an intake_uploads row, a history row per value written, an activity entry and a
 * receipt e-mail; every upload is also an intake_imports record whose stage and counts the
 * browser follows.
 * Throws (as HTTP answers): 403 for a site the caller may not write for, 404 for an unknown site
 * or round, 409 when the trial is locked, the site not randomized, or values were saved for the
 * site and round while the file was read, 413 over INTAKE_MAX_BYTES, 422 with `errors` for a file
 * that is refused.
 */
@Injectable()
export class IntakeService {
  private readonly logger = new Logger('Intake');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(SiteRow) private readonly sites: typeof SiteRow,
    @InjectModel(AssessmentRoundRow) private readonly rounds: typeof AssessmentRoundRow,
    @InjectModel(IntakeUploadRow) private readonly uploads: typeof IntakeUploadRow,
    @Inject(intakeConfig.KEY) private readonly config: ConfigType<typeof intakeConfig>,
    @Inject(mailConfig.KEY) private readonly mailSettings: ConfigType<typeof mailConfig>,
    private readonly gate: ProtocolGateService,
    private readonly bulk: ObservationBulkStore,
    private readonly imports: IntakeImportsService,
    private readonly columns: IntakeColumnsService,
    private readonly activity: ActivityService,
    private readonly mail: MailService,
  ) {}

  async intake(access: TrialAccessContext, user: AuthUser, siteId: number, roundId: number, upload: IntakeUpload, options: IntakeOptions): Promise<IntakeResult> {
    const resolved = await this.resolve(access, siteId, roundId);
    const size = sourceSize(upload.source);
    if (size > this.config.maxBytes) {
      throw new PayloadTooLargeException(`The file is larger than ${count(Math.round(this.config.maxBytes / 1_048_576))} MB, the most accepted for an upload. Split it by site or round.`);
    }
    const progress = await this.imports.start({
      ticket: options.ticket,
      trialId: resolved.trial.id,
      siteId,
      roundId,
      userId: user.id,
      fileName: upload.fileName,
      sizeBytes: size,
      format: await sniffFormat(upload.source),
      dryRun: options.dryRun,
    });
    try {
      const outcome = await this.run(resolved, user, upload, options, progress);
      await progress.done(outcome.result);
      const { result } = outcome;
      if (!result.dryRun && !result.identicalToPrevious && options.receipt !== false) await this.sendReceipt(resolved, user, upload, outcome);
      return result;
    } catch (error) {
      await this.recordFailure(progress, error);
      if (error instanceof BulkLoadIncomplete) {
        throw new ConflictException(
          `Nothing was written: values were saved for ${resolved.site.name}, ${resolved.round.label} while your file was being read. Look at them in the Ledger, then send the file again.`,
        );
      }
      throw error;
    }
  }

  private async recordFailure(progress: ImportProgress, error: unknown): Promise<void> {
    if (error instanceof HttpException && error.getStatus() === 422) {
      const body = error.getResponse();
      const problems = typeof body === 'object' && body !== null && 'errors' in body ? ((body as { errors: IntakeProblem[] }).errors ?? []) : [];
      await progress.refused(refusalBody(error.message, problems));
    } else if (error instanceof HttpException) {
      await progress.failed(error.message);
    } else {
      this.logger.error(`upload ${progress.ticket} failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
      await progress.failed('The server could not finish this upload; nothing was written. Try again, and tell the trial’s investigator if it happens again.');
    }
  }

  /** The trial, site and round of the upload, and whether the caller may write there. */
  private async resolve(access: TrialAccessContext, siteId: number, roundId: number): Promise<Resolved> {
    const site = await this.sites.findOne({ where: { id: siteId, trialId: access.trialId } });
    if (!site) throw new NotFoundException('No such site in this trial.');
    assertMayWriteSite(access, site.id, site.name);
    const trial = (await this.trials.findByPk(access.trialId))!;
    refuseIfClosed(trial);
    const round = await this.rounds.findOne({ where: { id: roundId, trialId: trial.id }, include: [MeasureRow] });
    if (!round) throw new NotFoundException('No such assessment round in this trial.');
    const [plotted] = await this.sequelize.query<{ n: number }>('SELECT EXISTS(SELECT 1 FROM plots WHERE site_id = ?) AS n', { replacements: [site.id], type: QueryTypes.SELECT });
    if (!Number(plotted!.n)) throw new ConflictException(`${site.name} is not randomized yet: randomize it to get its plots, then upload its data.`);
    const measures = (round.measures ?? []).map(presentMeasure).sort((a, b) => a.position - b.position || a.id - b.id);
    return { trial, site, round, measures };
  }

  /** The site's plots, read a page at a time (rows as arrays, straight from the driver) into a compact index. */
  private async plotIndex(trialId: number, siteId: number): Promise<SitePlotIndex> {
    const codes = await this.sequelize.query<{ id: number; code: string }>('SELECT id, code FROM treatments WHERE trial_id = ?', { replacements: [trialId], type: QueryTypes.SELECT });
    const codeOf = new Map(codes.map((row) => [Number(row.id), row.code]));
    const connection = (await this.sequelize.connectionManager.getConnection({ type: 'read' })) as unknown as MariaDbConnection;
    try {
      const index = new SitePlotIndex();
      for (let after = ''; ; ) {
        const rows = (await connection.query(
          { sql: `SELECT id, label, block, treatment_id FROM plots WHERE site_id = ? AND label > ? ORDER BY label LIMIT ${PLOT_PAGE}`, rowsAsArray: true },
          [siteId, after],
        )) as Array<[number, string, number, number | null]>;
        for (const [id, label, block, treatmentId] of rows) index.add({ id, label, block, treatmentCode: (treatmentId === null ? undefined : codeOf.get(treatmentId)) ?? '' });
        if (rows.length < PLOT_PAGE) {
          await index.ready();
          return index;
        }
        after = rows[rows.length - 1]![1];
      }
    } finally {
      this.sequelize.connectionManager.releaseConnection(connection as never);
    }
  }

  /** The other sites of the trial that have these labels, by label key. */
  private async otherSites(trialId: number, labels: readonly string[]): Promise<Map<string, string>> {
    if (labels.length === 0) return new Map();
    const rows = await this.sequelize.query<{ label: string; name: string }>(
      'SELECT p.label, s.name FROM plots p JOIN sites s ON s.id = p.site_id WHERE p.trial_id = ? AND p.label IN (?)',
      { replacements: [trialId, labels], type: QueryTypes.SELECT },
    );
    return new Map(rows.map((row) => [plotLabelKey(row.label), row.name]));
  }

  private async latestUpload(resolved: Resolved, transaction?: Transaction): Promise<IntakeUploadRow | null> {
    return this.uploads.findOne({ where: { siteId: resolved.site.id, roundId: resolved.round.id }, order: [['id', 'DESC']], transaction });
  }

  /**
   * Reads, checks and (unless refused) writes the file in one transaction. Values stream into the
   * database as the rows are checked; anything short of a commit rolls it all back.
   */
  private async run(resolved: Resolved, user: AuthUser, upload: IntakeUpload, options: IntakeOptions, progress: ImportProgress): Promise<Outcome> {
    const { trial, site, round } = resolved;
    const remembered = await this.columns.remembered(trial.id);
    const plots = await this.plotIndex(trial.id, site.id);
    const opened = await openUpload(upload.source, options.sheet ?? null).catch(fileRefusal);
    try {
      return await this.sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, async (transaction) => {
        const previous = await this.latestUpload(resolved, transaction);
        const fresh = (await this.bulk.countStored(transaction, trial.id, site.id, round.id)) === 0;
        const row = options.dryRun ? null : await this.createUploadRow(resolved, user, upload, transaction);
        const context: BulkWriteContext = {
          trialId: trial.id,
          siteId: site.id,
          roundId: round.id,
          userId: user.id,
          uploadId: row?.id ?? null,
          at: new Date(),
          notedMeasureIds: [],
          method: this.config.bulkLoad,
        };
        const stream: BulkStream | null = fresh ? (row ? await this.bulk.openFresh(transaction, context) : null) : await this.bulk.openStaging(transaction, context);
        try {
          const checked = await this.check(resolved, opened, options, plots, remembered, progress, stream, fresh);
          const written = { ...context, notedMeasureIds: notedMeasures(checked.mapping) };
          await progress.stage('comparing', { rowsChecked: checked.rows, message: 'Comparing with the values already stored…', valuesTotal: checked.values });
          const identical = previous?.sha256 === checked.reading.sha256;
          if (!row) throw new RollBack(await this.dryRunOutcome(resolved, checked, fresh, identical, previous, written, transaction, progress));
          if (identical) {
            const result = this.result(false, checked, { created: 0, updated: 0, unchanged: checked.values, listed: [] }, true, this.identicalMessage(resolved, previous!), progress.ticket);
            throw new RollBack({ result, rowsRead: checked.rows, warningsAccepted: 0 });
          }
          return await this.commit(resolved, user, upload, checked, fresh, row, written, transaction, progress, plots);
        } finally {
          if (!fresh) await this.bulk.dropStage(transaction);
          else if (stream) await this.bulk.restoreKeyChecks(transaction);
        }
      });
    } catch (error) {
      if (error instanceof RollBack) return error.outcome;
      throw error;
    }
  }

  private async createUploadRow(resolved: Resolved, user: AuthUser, upload: IntakeUpload, transaction: Transaction): Promise<IntakeUploadRow> {
    return this.uploads.create(
      {
        trialId: resolved.trial.id,
        siteId: resolved.site.id,
        roundId: resolved.round.id,
        userId: user.id,
        sha256: '',
        fileName: upload.fileName.slice(0, 255),
        sizeBytes: Math.min(sourceSize(upload.source), 4_294_967_295),
        rowsRead: 0,
        createdCount: 0,
        updatedCount: 0,
        unchangedCount: 0,
        warningsAccepted: 0,
      },
      { transaction },
    );
  }

  /** Reads and checks the file, streaming its values into `stream`; refuses it (422) with every problem, or warnings not accepted. */
  private async check(
    resolved: Resolved,
    opened: Awaited<ReturnType<typeof openUpload>>,
    options: IntakeOptions,
    plots: SitePlotIndex,
    remembered: Record<string, string | null>,
    progress: ImportProgress,
    stream: BulkStream | null,
    fresh: boolean,
  ): Promise<CheckedUpload> {
    let seq = 0;
    const checking = checkUpload({
      opened,
      plots,
      measures: resolved.measures,
      siteName: resolved.site.name,
      overrides: options.columnOverrides ?? {},
      missingReason: options.missingReason ?? null,
      remembered,
      otherSites: (labels) => this.otherSites(resolved.trial.id, labels),
      // Where nothing is stored, an empty cell without a reason records nothing.
      onValue: stream ? (value) => (fresh && isBareBlank(value) ? undefined : stream.write(valueLine(++seq, value))) : null,
      pause: () => stream?.settle() ?? Promise.resolve(),
      onProgress: (rows, bytes) => progress.checking(rows, bytes),
    });
    let checked: CheckedUpload;
    try {
      checked = await checking;
    } catch (error) {
      await stream?.abort();
      fileRefusal(error);
    }
    if (stream && checked.errors.length > 0) await stream.abort();
    else if (stream) await stream.end();
    if (checked.errors.length > 0) {
      const rows = new Set(checked.errors.map((error) => error.row).filter((row) => row !== null)).size;
      // Only the first problems are listed; their rows would undercount a file with more.
      const listedAll = checked.errors.length >= checked.errorCount;
      const where = !listedAll ? `; the first ${count(rows)} rows with one are listed` : rows > 0 ? ` in ${plural(rows, 'row', 'rows')}` : '';
      throw refusal(`Nothing was written: the file has ${plural(checked.errorCount, 'problem', 'problems')}${where}. Correct them and upload the whole file again.`, checked.errors);
    }
    if (checked.valueWarnings > 0 && !options.dryRun && !options.acceptWarnings) {
      throw refusal(
        `Nothing was written: ${plural(checked.valueWarnings, 'warning needs', 'warnings need')} your decision. Check the values; if they are right, confirm them and send the file again to keep them as typed.`,
        checked.warnings.filter((warning) => warning.row !== null),
      );
    }
    return checked;
  }

  private async dryRunOutcome(
    resolved: Resolved,
    checked: CheckedUpload,
    fresh: boolean,
    identical: boolean,
    previous: IntakeUploadRow | null,
    context: BulkWriteContext,
    transaction: Transaction,
    progress: ImportProgress,
  ): Promise<Outcome> {
    let comparison = freshComparison(checked);
    if (!fresh) {
      await this.bulk.classify(transaction, context);
      comparison = await this.bulk.compareStaged(transaction, INTAKE_CHANGE_LIST_CAP);
    }
    const warned = checked.valueWarnings ? ` ${plural(checked.valueWarnings, 'warning needs', 'warnings need')} your confirmation.` : '';
    const message = identical
      ? this.identicalMessage(resolved, previous!)
      : `Nothing was written (dry run). Committing would add ${plural(comparison.created, 'new value', 'new values')}, change ${count(comparison.updated)} and leave ${count(comparison.unchanged)} unchanged.${warned}`;
    return { result: this.result(true, checked, comparison, identical, message, progress.ticket), rowsRead: checked.rows, warningsAccepted: 0 };
  }

  private async commit(
    resolved: Resolved,
    user: AuthUser,
    upload: IntakeUpload,
    checked: CheckedUpload,
    fresh: boolean,
    row: IntakeUploadRow,
    context: BulkWriteContext,
    transaction: Transaction,
    progress: ImportProgress,
    plots: SitePlotIndex,
  ): Promise<Outcome> {
    const { trial, site, round } = resolved;
    // The trial is locked for the rest of the transaction only now, so a long file does not hold up others while it is read.
    await this.gate.openForWrite(trial.id, transaction);
    let comparison: BulkComparison;
    if (fresh) {
      const measureIds = resolved.measures.map((measure) => measure.id);
      if (!(await this.bulk.referencesHold(transaction, context, plots.idSummary(), measureIds))) {
        throw new ConflictException(
          `Nothing was written: the plot plan or the round of ${site.name}, ${round.label} changed while your file was being read. Look at the plot plan, then send the file again.`,
        );
      }
      comparison = freshComparison(checked);
    } else {
      await this.bulk.lockStored(transaction, trial.id, site.id, round.id);
      await this.bulk.classify(transaction, context);
      comparison = await this.bulk.compareStaged(transaction, INTAKE_CHANGE_LIST_CAP);
    }
    const writing = comparison.created + comparison.updated;
    await progress.stage('writing', { message: `Writing ${plural(writing, 'value', 'values')} and their history…`, valuesTotal: writing, valuesDone: fresh ? comparison.created : 0 });
    if (fresh) await this.bulk.recordNewHistory(transaction, context);
    else await this.bulk.mergeStaged(transaction, context);
    await row.update(
      {
        sha256: checked.reading.sha256,
        rowsRead: checked.rows,
        createdCount: comparison.created,
        updatedCount: comparison.updated,
        unchangedCount: comparison.unchanged,
        warningsAccepted: checked.valueWarnings,
      },
      { transaction },
    );
    await this.columns.remember(transaction, trial.id, user.id, checked.mapping.choices, checked.automatic.choices);
    const counts = `${plural(comparison.created, 'new value', 'new values')}, ${count(comparison.updated)} changed, ${count(comparison.unchanged)} unchanged`;
    await this.activity.record(transaction, {
      trialId: trial.id,
      userId: user.id,
      kind: 'intake.committed',
      siteId: site.id,
      summary: `Imported ${upload.fileName} for ${site.name}, ${round.label}: ${counts}.`,
      details: {
        uploadId: row.id,
        roundId: round.id,
        fileName: upload.fileName,
        sha256: checked.reading.sha256,
        sheet: checked.reading.sheet,
        created: comparison.created,
        updated: comparison.updated,
        unchanged: comparison.unchanged,
        warningsAccepted: checked.valueWarnings,
      },
    });
    const result = this.result(false, checked, comparison, false, `Saved ${upload.fileName} for ${site.name}, ${round.label}: ${counts}.`, progress.ticket);
    return { result, rowsRead: checked.rows, warningsAccepted: checked.valueWarnings };
  }

  private result(dryRun: boolean, checked: CheckedUpload, comparison: BulkComparison, identicalToPrevious: boolean, message: string, ticket: string): IntakeResult {
    const changes: IntakeChange[] = comparison.listed.map(({ kind, plotLabel, measureCode, before, after }) => ({
      plotLabel,
      measureCode,
      kind,
      before: before === null ? null : describeStoredValue(before),
      after: describeStoredValue(after),
    }));
    const total = comparison.created + comparison.updated + comparison.unchanged;
    return {
      dryRun,
      created: comparison.created,
      updated: comparison.updated,
      unchanged: comparison.unchanged,
      warnings: [...checked.warnings],
      changes,
      changesOmitted: Math.max(0, total - changes.length),
      identicalToPrevious,
      message,
      ticket,
    };
  }

  private identicalMessage(resolved: Resolved, previous: IntakeUploadRow): string {
    return `This file is byte for byte the one committed for ${resolved.site.name}, ${resolved.round.label} on ${previous.createdAt.toISOString().slice(0, 10)}; nothing was changed.`;
  }

  /** The receipt goes after the commit, unless the uploader turned receipts off; a mail server that is down does not undo the upload. */
  private async sendReceipt(resolved: Resolved, user: AuthUser, upload: IntakeUpload, outcome: Outcome): Promise<void> {
    const { result } = outcome;
    const [wanted] = await this.sequelize.query<{ receipts: number; locale: string | null }>('SELECT email_receipts AS receipts, locale FROM users WHERE id = ?', {
      replacements: [user.id],
      type: QueryTypes.SELECT,
    });
    if (!wanted || !Number(wanted.receipts)) return;
    try {
      await this.mail.send(
        intakeReceiptEmail({
          to: user.email,
          uploaderName: user.name,
          trialCode: resolved.trial.code,
          siteName: resolved.site.name,
          roundLabel: resolved.round.label,
          fileName: upload.fileName,
          rowsRead: outcome.rowsRead,
          created: result.created,
          updated: result.updated,
          unchanged: result.unchanged,
          warningsAccepted: outcome.warningsAccepted,
          committedAt: new Date(),
          link: `${this.mailSettings.appUrl}/trials/${resolved.trial.id}/ledger?site=${resolved.site.id}&round=${resolved.round.id}`,
          locale: wanted.locale,
        }),
      );
    } catch (error) {
      this.logger.warn(`receipt for upload to ${resolved.site.name} not sent: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
}
