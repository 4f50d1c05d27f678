import { INTAKE_CHANGE_LIST_CAP, type IntakeChange, type IntakeProblem, type IntakeRefusal, type IntakeResult, type Measure } from '@friable/contracts';
import { ConflictException, HttpException, Inject, Injectable, Logger, NotFoundException, PayloadTooLargeException, UnprocessableEntityException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { QueryTypes, Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { dataColumnOfHeader } from '@friable/field';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser, TrialAccessContext } from '../auth/auth-user';
import { refuseIfClosed } from '../common/exceptions/trial-locked.exception';
import { ProtocolGateService } from '../common/protocol/protocol-gate.service';
import { mailConfig } from '../config/mail.config';
import { MailService } from '../mail/mail.service';
import { MeasureRow } from '../measures/models/measure.model';
import { presentMeasure } from '../measures/measure.presenter';
import { ObservationBulkStore, type BulkComparison, type BulkWriteContext } from '../observations/observation-bulk-store.service';
import { assertMayWriteSite } from '../observations/site-write-access';
import { storableValue } from '../observations/storable-value';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import { IntakeColumnsService } from './intake-columns.service';
import { IntakeImportsService, type ImportProgress } from './intake-imports.service';
import { intakeConfig } from './intake.config';
import { IntakeUploadRow } from './models/intake-upload.model';
import {
  IntakeChecker,
  IntakeFileError,
  SitePlotIndex,
  TableRows,
  describeStoredValue,
  mapColumns,
  plotLabelKey,
  type ColumnMapping,
  type IntakeValue,
  type StorageChecks,
  type TableHeader,
} from './parsing';
import { openUpload, sniffFormat, sourceSize, type UploadReading, type UploadSource } from './read-upload';
import { intakeReceiptEmail } from './receipt-email';
import { ValueSpool } from './value-spool';

export interface IntakeUpload {
  fileName: string;
  source: UploadSource;
}

export interface IntakeOptions {
  dryRun: boolean;
  acceptWarnings: boolean;
  /** From the mapping step: column header → role, measure code, or null to ignore the column. */
  columnOverrides?: Readonly<Record<string, string | null>>;
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

/** Everything read and checked before a transaction starts; the values wait on disk in `spool`. */
interface PreparedIntake extends Resolved {
  mapping: ColumnMapping;
  automatic: ColumnMapping;
  rowsRead: number;
  valueWarnings: number;
  warnings: readonly IntakeProblem[];
  reading: UploadReading;
  spool: ValueSpool;
  /** The first values worth writing, in file order: the change list when nothing is stored yet. */
  firstValues: IntakeValue[];
}

const count = (value: number) => new Intl.NumberFormat('en').format(value);
const plural = (value: number, one: string, many: string) => `${count(value)} ${value === 1 ? one : many}`;
const PLOT_PAGE = 20_000;

function refusalBody(message: string, errors: readonly IntakeProblem[]): IntakeRefusal {
  return { statusCode: 422, error: 'Unprocessable Entity', message, errors: [...errors] };
}

function refusal(message: string, errors: readonly IntakeProblem[]): UnprocessableEntityException {
  return new UnprocessableEntityException(refusalBody(message, errors));
}

/** The table's limits, checked with every other rule so a file that cannot be stored is refused by row and column. */
const storageChecks: StorageChecks = {
  value(valueText) {
    if (valueText.length <= 20 && !valueText.includes('e')) return null;
    const storable = storableValue(valueText);
    return storable.ok ? null : storable.message;
  },
  reason(reason) {
    return reason.length <= 200 ? null : `the reason has ${count(reason.length)} characters; reasons of up to 200 are kept.`;
  },
};

/** A refused file as a merged range in the table: by its first row and column. */
function mergedProblems(reading: UploadReading, header: TableHeader | null): IntakeProblem[] {
  const from = header?.rowNumber ?? 1;
  return reading.merged
    .filter((range) => range.lastRow >= from)
    .slice(0, 100)
    .map((range) => {
      const column = header?.headers[range.firstColumn] || null;
      const message = `Row ${range.firstRow}${column ? `, ${column}` : ''}: cells ${range.ref} are merged. Unmerge them so every row has its own value in its own cell (in your spreadsheet program: select them, then unmerge), then upload the file again.`;
      return { row: range.firstRow, column, message };
    });
}

/** Whether a row is the header row: it has a cell naming the plot label (by the person's mapping, the trial's memory or its spelling). */
function namesPlotLabel(cells: readonly string[], overrides: Readonly<Record<string, string | null>>, remembered: Readonly<Record<string, string | null>>): boolean {
  return cells.some((cell) => {
    const header = cell.trim();
    if (header === '') return false;
    if (Object.hasOwn(overrides, header)) return overrides[header] === 'plotLabel';
    if (remembered[header] === 'plotLabel') return true;
    return dataColumnOfHeader(header)?.role === 'plotLabel';
  });
}


/**
 * Intake — reads an uploaded CSV file or workbook sheet for one site and round, checks every row,
 * and either answers what it would do (dry run) or writes the whole file in one transaction.
 *
 * Purpose: the all-or-nothing rule, for files of a million rows. The file is read as a stream
 * (never whole in memory); each checked value goes to a spool on disk; any error: nothing is
 * written, 422 lists every problem by row and column. Warnings (values outside the usual range):
 * written only with acceptWarnings. The spool is then compared with the stored values and written
 * by `ObservationBulkStore` in a few set-based statements. A file byte-identical to the last
 * committed one for the site and round changes nothing. Each commit is an intake_uploads row, a
 * history row per value written, an activity entry and a receipt e-mail to the uploader; every
 * upload is also an intake_imports record whose stage and counts the browser follows.
 * Throws (as HTTP answers): 403 for a site the caller may not write for, 404 for an unknown site
 * or round, 409 when the trial is locked, the site not randomized, or values changed while the
 * file was written, 413 over INTAKE_MAX_BYTES, 422 with `errors` for a file that is refused.
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
    let prepared: PreparedIntake | null = null;
    try {
      prepared = await this.prepare(resolved, upload, options, progress);
      if (prepared.valueWarnings > 0 && !options.dryRun && !options.acceptWarnings) {
        const warnings = prepared.warnings.filter((warning) => warning.row !== null);
        throw refusal(
          `Nothing was written: ${plural(prepared.valueWarnings, 'warning needs', 'warnings need')} your decision. Check the values, then send the file again with acceptWarnings=true to keep them as typed.`,
          warnings,
        );
      }
      const result = options.dryRun ? await this.dryRun(prepared, progress) : await this.commit(prepared, user, upload, progress);
      await progress.done(result);
      if (!result.dryRun && !result.identicalToPrevious && options.receipt !== false) await this.sendReceipt(prepared, user, upload, result);
      return result;
    } catch (error) {
      await this.recordFailure(progress, error);
      throw error;
    } finally {
      prepared?.spool.remove();
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
    const [plotted] = await this.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM plots WHERE site_id = ? LIMIT 1', { replacements: [site.id], type: QueryTypes.SELECT });
    if (!Number(plotted!.n)) throw new ConflictException(`${site.name} is not randomized yet: randomize it to get its plots, then upload its data.`);
    const measures = (round.measures ?? []).map(presentMeasure).sort((a, b) => a.position - b.position || a.id - b.id);
    return { trial, site, round, measures };
  }

  /** The site's plots, read a page at a time into a compact index. */
  private async plotIndex(siteId: number): Promise<SitePlotIndex> {
    const index = new SitePlotIndex();
    let after = 0;
    for (;;) {
      const rows = await this.sequelize.query<{ id: number; label: string; block: number; treatmentCode: string | null }>(
        `SELECT p.id, p.label, p.block, t.code AS treatmentCode FROM plots p LEFT JOIN treatments t ON t.id = p.treatment_id
          WHERE p.site_id = ? AND p.id > ? ORDER BY p.id LIMIT ${PLOT_PAGE}`,
        { replacements: [siteId, after], type: QueryTypes.SELECT },
      );
      for (const row of rows) index.add({ id: Number(row.id), label: row.label, block: Number(row.block), treatmentCode: row.treatmentCode ?? '' });
      if (rows.length < PLOT_PAGE) return index;
      after = Number(rows[rows.length - 1]!.id);
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

  private async prepare(resolved: Resolved, upload: IntakeUpload, options: IntakeOptions, progress: ImportProgress): Promise<PreparedIntake> {
    const { trial, site, measures } = resolved;
    const overrides = options.columnOverrides ?? {};
    const remembered = await this.columns.remembered(trial.id);
    const plots = await this.plotIndex(site.id);
    const spool = new ValueSpool(this.config.workDir);
    try {
      const opened = await openUpload(upload.source, options.sheet ?? null).catch((error: unknown) => this.fileRefusal(error));
      const firstValues: IntakeValue[] = [];
      let header: TableHeader | null = null;
      let mapping: ColumnMapping | null = null;
      let checker: IntakeChecker | null = null;
      const table = new TableRows({
        isHeader: (cells) => namesPlotLabel(cells, overrides, remembered),
        onHeader: (found) => {
          header = found;
          mapping = mapColumns(found.headers, measures, overrides, remembered);
          checker = new IntakeChecker({
            mapping,
            headers: found.headers,
            plots,
            roundMeasures: measures,
            siteName: site.name,
            decimalComma: opened.decimalComma,
            storage: storageChecks,
            onValue: (value) => {
              // Once the file has an error nothing will be written: keep checking, stop spooling.
              if (checker!.errorCount > 0) return;
              spool.add(value);
              if (firstValues.length < INTAKE_CHANGE_LIST_CAP && !(value.blank && value.missingReason === null)) firstValues.push(value);
            },
          });
        },
        onRow: (row) => checker!.check(row),
        onRowProblem: (problem) => checker!.addRowProblem(problem),
      });
      const reading = await opened
        .read(
          (row) => table.push(row),
          (bytesRead) => progress.checking(table.rowsRead, bytesRead),
        )
        .catch((error: unknown) => this.fileRefusal(error));
      try {
        table.finish(`The file has a header row but no data rows (read as ${reading.readAs}).`);
      } catch (error) {
        this.fileRefusal(error);
      }
      const found = header as TableHeader | null;
      const done = checker as IntakeChecker | null;
      if (!done || !mapping || !found) throw refusal('The file holds only blank lines.', [{ row: null, column: null, message: 'The file holds only blank lines.' }]);
      for (const problem of mergedProblems(reading, found)) done.addRowProblem(problem);
      const { errors, warnings } = done.finish(await this.otherSites(trial.id, done.labelsToLookUp()));
      if (errors.length > 0) {
        const rows = new Set(errors.map((error) => error.row).filter((row) => row !== null)).size;
        const where = rows > 0 ? ` in ${plural(rows, 'row', 'rows')}` : '';
        throw refusal(`Nothing was written: the file has ${plural(done.errorCount, 'problem', 'problems')}${where}. Correct them and upload the whole file again.`, errors);
      }
      spool.close();
      await progress.stage('checking', { rowsChecked: done.rows, valuesTotal: done.values });
      const automatic = mapColumns(found.headers, measures);
      return { ...resolved, mapping, automatic, rowsRead: done.rows, valueWarnings: done.valueWarningCount, warnings, reading, spool, firstValues };
    } catch (error) {
      spool.remove();
      throw error;
    }
  }

  /** Turns a reader's IntakeFileError into the HTTP answer (413 or 422 with its rows); anything else goes on as it is. */
  private fileRefusal(error: unknown): never {
    if (!(error instanceof IntakeFileError)) throw error;
    if (error.status === 413) throw new PayloadTooLargeException(error.message);
    throw refusal(error.message, error.problems.length ? error.problems : [{ row: null, column: null, message: error.message }]);
  }

  private async latestUpload(prepared: PreparedIntake, transaction?: Transaction): Promise<IntakeUploadRow | null> {
    return this.uploads.findOne({ where: { siteId: prepared.site.id, roundId: prepared.round.id }, order: [['id', 'DESC']], transaction });
  }

  private context(prepared: PreparedIntake, user: AuthUser | null, uploadId: number | null): BulkWriteContext {
    return {
      trialId: prepared.trial.id,
      siteId: prepared.site.id,
      roundId: prepared.round.id,
      userId: user?.id ?? null,
      uploadId,
      at: new Date(),
      withNotes: prepared.mapping.notes !== null,
      method: this.config.bulkLoad,
    };
  }

  /** Nothing stored yet: every value in the spool is new, listed from the first ones kept in memory. */
  private freshComparison(prepared: PreparedIntake): BulkComparison {
    const listed = prepared.firstValues.map((value) => ({
      kind: 'new' as const,
      plotLabel: value.plotLabel,
      measureCode: value.measureCode,
      before: null,
      after: { valueText: value.valueText, censored: value.censored, missingReason: value.missingReason },
    }));
    return { created: prepared.spool.values.lines, updated: 0, unchanged: 0, listed };
  }

  private result(dryRun: boolean, prepared: PreparedIntake, comparison: BulkComparison, identicalToPrevious: boolean, message: string, ticket: string): IntakeResult {
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
      warnings: [...prepared.warnings],
      changes,
      changesOmitted: Math.max(0, total - changes.length),
      identicalToPrevious,
      message,
      ticket,
    };
  }

  private identicalMessage(prepared: PreparedIntake, previous: IntakeUploadRow): string {
    return `This file is byte for byte the one committed for ${prepared.site.name}, ${prepared.round.label} on ${previous.createdAt.toISOString().slice(0, 10)}; nothing was changed.`;
  }

  /** Compares with the stored values (in the database, on a staging table) and writes nothing. */
  private async dryRun(prepared: PreparedIntake, progress: ImportProgress): Promise<IntakeResult> {
    await progress.stage('comparing', { message: 'Comparing with the values already stored…', valuesTotal: prepared.spool.values.lines + prepared.spool.blanks.lines });
    const previous = await this.latestUpload(prepared);
    const identical = previous?.sha256 === prepared.reading.sha256;
    const comparison = await this.sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, async (transaction) => {
      const stored = await this.bulk.countStored(transaction, prepared.trial.id, prepared.site.id, prepared.round.id);
      if (stored === 0) return this.freshComparison(prepared);
      try {
        await this.bulk.stage(transaction, this.context(prepared, null, null), prepared.spool);
        return await this.bulk.compareStaged(transaction, INTAKE_CHANGE_LIST_CAP);
      } finally {
        await this.bulk.dropStage(transaction);
      }
    });
    const warned = prepared.valueWarnings ? ` ${plural(prepared.valueWarnings, 'warning needs', 'warnings need')} acceptWarnings=true.` : '';
    const message = identical
      ? this.identicalMessage(prepared, previous!)
      : `Nothing was written (dry run). Committing would add ${plural(comparison.created, 'new value', 'new values')}, change ${count(comparison.updated)} and leave ${count(comparison.unchanged)} unchanged.${warned}`;
    return this.result(true, prepared, comparison, identical, message, progress.ticket);
  }

  private async commit(prepared: PreparedIntake, user: AuthUser, upload: IntakeUpload, progress: ImportProgress): Promise<IntakeResult> {
    const { trial, site, round } = prepared;
    return this.sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, async (transaction) => {
      await this.gate.openForWrite(trial.id, transaction);
      const previous = await this.latestUpload(prepared, transaction);
      if (previous?.sha256 === prepared.reading.sha256) {
        const total = prepared.spool.values.lines;
        return this.result(false, prepared, { created: 0, updated: 0, unchanged: total, listed: [] }, true, this.identicalMessage(prepared, previous), progress.ticket);
      }
      await progress.stage('comparing', { message: 'Comparing with the values already stored…', valuesTotal: prepared.spool.values.lines + prepared.spool.blanks.lines });
      const stored = await this.bulk.lockStored(transaction, trial.id, site.id, round.id);
      const probe = this.context(prepared, user, null);
      let comparison: BulkComparison;
      if (stored === 0) comparison = this.freshComparison(prepared);
      else {
        await this.bulk.stage(transaction, probe, prepared.spool);
        comparison = await this.bulk.compareStaged(transaction, INTAKE_CHANGE_LIST_CAP);
      }
      try {
        const row = await this.uploads.create(
          {
            trialId: trial.id,
            siteId: site.id,
            roundId: round.id,
            userId: user.id,
            sha256: prepared.reading.sha256,
            fileName: upload.fileName.slice(0, 255),
            sizeBytes: Math.min(sourceSize(upload.source), 4_294_967_295),
            rowsRead: prepared.rowsRead,
            createdCount: comparison.created,
            updatedCount: comparison.updated,
            unchangedCount: comparison.unchanged,
            warningsAccepted: prepared.valueWarnings,
          },
          { transaction },
        );
        const writing = comparison.created + comparison.updated;
        await progress.stage('writing', { message: `Writing ${plural(writing, 'value', 'values')} and their history…`, valuesTotal: writing, valuesDone: 0 });
        const context = { ...probe, uploadId: row.id };
        if (stored === 0) await this.bulk.insertFresh(transaction, context, prepared.spool.values);
        else await this.bulk.mergeStaged(transaction, context);
        await this.columns.remember(transaction, trial.id, user.id, prepared.mapping.choices, prepared.automatic.choices);
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
            sha256: prepared.reading.sha256,
            sheet: prepared.reading.sheet,
            created: comparison.created,
            updated: comparison.updated,
            unchanged: comparison.unchanged,
            warningsAccepted: prepared.valueWarnings,
          },
        });
        return this.result(false, prepared, comparison, false, `Saved ${upload.fileName} for ${site.name}, ${round.label}: ${counts}.`, progress.ticket);
      } finally {
        if (stored > 0) await this.bulk.dropStage(transaction);
      }
    });
  }

  /** The receipt goes after the commit; a mail server that is down does not undo the upload. */
  private async sendReceipt(prepared: PreparedIntake, user: AuthUser, upload: IntakeUpload, result: IntakeResult): Promise<void> {
    try {
      await this.mail.send(
        intakeReceiptEmail({
          to: user.email,
          uploaderName: user.name,
          trialCode: prepared.trial.code,
          siteName: prepared.site.name,
          roundLabel: prepared.round.label,
          fileName: upload.fileName,
          rowsRead: prepared.rowsRead,
          created: result.created,
          updated: result.updated,
          unchanged: result.unchanged,
          warningsAccepted: prepared.valueWarnings,
          committedAt: new Date(),
          link: `${this.mailSettings.appUrl}/trials/${prepared.trial.id}/ledger?site=${prepared.site.id}&round=${prepared.round.id}`,
        }),
      );
    } catch (error) {
      this.logger.warn(`receipt for upload to ${prepared.site.name} not sent: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
}
