import type { IntakeProblem, IntakeResult, Measure } from '@friable/contracts';
import { ConflictException, Inject, Injectable, Logger, NotFoundException, PayloadTooLargeException, UnprocessableEntityException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { createHash } from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser, TrialAccessContext } from '../auth/auth-user';
import { refuseIfClosed } from '../common/exceptions/trial-locked.exception';
import { ProtocolGateService } from '../common/protocol/protocol-gate.service';
import { mailConfig } from '../config/mail.config';
import { MailService } from '../mail/mail.service';
import { MeasureRow } from '../measures/models/measure.model';
import { presentMeasure } from '../measures/measure.presenter';
import { ObservationStoreService, type StoredObservation, type ValueToWrite } from '../observations/observation-store.service';
import { assertMayWriteSite } from '../observations/site-write-access';
import { storableValue } from '../observations/storable-value';
import { PlotRow } from '../plots/models/plot.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { Trial } from '../trials/models/trial.model';
import { intakeConfig } from './intake.config';
import { IntakeUploadRow } from './models/intake-upload.model';
import {
  IntakeFileError,
  mapColumns,
  planChanges,
  readCsvFile,
  validateIntake,
  type ChangePlan,
  type ColumnMapping,
  type ExistingValue,
  type IntakeValue,
  type SitePlot,
} from './parsing';
import { intakeReceiptEmail } from './receipt-email';

export interface IntakeUpload {
  bytes: Buffer;
  fileName: string;
}

export interface IntakeOptions {
  dryRun: boolean;
  acceptWarnings: boolean;
  /** From the mapping step: column header → role, measure code, or null to ignore the column. */
  columnOverrides?: Readonly<Record<string, string | null>>;
  /** False to send no receipt e-mail (the demo loader); true by default. */
  receipt?: boolean;
}

/** Everything read and checked before a transaction starts. */
interface PreparedIntake {
  trial: Trial;
  site: SiteRow;
  round: AssessmentRoundRow;
  mapping: ColumnMapping;
  rowsRead: number;
  values: readonly IntakeValue[];
  warnings: readonly IntakeProblem[];
  sha256: string;
}

const count = (value: number) => new Intl.NumberFormat('en').format(value);
const plural = (value: number, one: string, many: string) => `${count(value)} ${value === 1 ? one : many}`;
const keyOf = (value: { plotId: number; measureId: number }) => `${value.plotId}:${value.measureId}`;

function refusal(message: string, errors: readonly IntakeProblem[]): UnprocessableEntityException {
  return new UnprocessableEntityException({ statusCode: 422, error: 'Unprocessable Entity', message, errors: [...errors] });
}

/** Warnings about values (they have a row) need the uploader's word; notes about columns (no row) are only told. */
const valueWarningsOf = (prepared: PreparedIntake) => prepared.warnings.filter((warning) => warning.row !== null);

/** A blank cell where nothing is stored records nothing: an empty cell of the template is not an observation. */
function worthWriting(value: IntakeValue, stored: ReadonlyMap<string, StoredObservation>): boolean {
  return !(value.blank && value.missingReason === null && !stored.has(keyOf(value)));
}

/**
 * Intake — reads an uploaded CSV file for one site and round, checks every row, and either
 * answers what it would do (dry run) or writes the whole file in one transaction.
 *
 * Purpose: the all-or-nothing rule. Any error: nothing is written, 422 lists every problem by
 * row and column. Warnings (values outside the usual range): written only with acceptWarnings.
 * A file byte-identical to the last committed one for the site and round changes nothing. Each
 * commit is an intake_uploads row, a history row per value written, an activity entry and a
 * receipt e-mail to the uploader.
 * Throws (as HTTP answers): 403 for a site the caller may not write for, 404 for an unknown site
 * or round, 409 when the trial is locked or the site not randomized, 413 over INTAKE_MAX_BYTES,
 * 422 with `errors` for a file that is refused.
 */
@Injectable()
export class IntakeService {
  private readonly logger = new Logger('Intake');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(SiteRow) private readonly sites: typeof SiteRow,
    @InjectModel(PlotRow) private readonly plots: typeof PlotRow,
    @InjectModel(AssessmentRoundRow) private readonly rounds: typeof AssessmentRoundRow,
    @InjectModel(IntakeUploadRow) private readonly uploads: typeof IntakeUploadRow,
    @Inject(intakeConfig.KEY) private readonly config: ConfigType<typeof intakeConfig>,
    @Inject(mailConfig.KEY) private readonly mailSettings: ConfigType<typeof mailConfig>,
    private readonly gate: ProtocolGateService,
    private readonly store: ObservationStoreService,
    private readonly activity: ActivityService,
    private readonly mail: MailService,
  ) {}

  async intake(access: TrialAccessContext, user: AuthUser, siteId: number, roundId: number, upload: IntakeUpload, options: IntakeOptions): Promise<IntakeResult> {
    const prepared = await this.prepare(access, siteId, roundId, upload, options.columnOverrides ?? {});
    if (options.dryRun) return this.dryRun(prepared);
    const valueWarnings = valueWarningsOf(prepared);
    if (valueWarnings.length > 0 && !options.acceptWarnings) {
      throw refusal(
        `Nothing was written: ${plural(valueWarnings.length, 'warning needs', 'warnings need')} your decision. Check the values, then send the file again with acceptWarnings=true to keep them as typed.`,
        valueWarnings,
      );
    }
    const result = await this.sequelize.transaction((transaction) => this.commit(prepared, user, upload, transaction));
    if (!result.identicalToPrevious && options.receipt !== false) await this.sendReceipt(prepared, user, upload, result);
    return result;
  }

  private async prepare(
    access: TrialAccessContext,
    siteId: number,
    roundId: number,
    upload: IntakeUpload,
    columnOverrides: Readonly<Record<string, string | null>>,
  ): Promise<PreparedIntake> {
    const site = await this.sites.findOne({ where: { id: siteId, trialId: access.trialId } });
    if (!site) throw new NotFoundException('No such site in this trial.');
    assertMayWriteSite(access, site.id, site.name);
    const trial = (await this.trials.findByPk(access.trialId))!;
    refuseIfClosed(trial);
    const round = await this.rounds.findOne({ where: { id: roundId, trialId: trial.id }, include: [MeasureRow] });
    if (!round) throw new NotFoundException('No such assessment round in this trial.');
    const measures = (round.measures ?? []).map(presentMeasure).sort((a, b) => a.position - b.position || a.id - b.id);
    const file = this.readFile(upload.bytes);
    const { sitePlots, trialPlotLabels } = await this.plotPlan(trial.id, site);
    const mapping = mapColumns(file.headers, measures, columnOverrides);
    const validation = validateIntake({ file, mapping, sitePlots, trialPlotLabels, roundMeasures: measures, siteName: site.name });
    const errors = [...validation.errors, ...this.storageProblems(validation.values, mapping, measures)];
    if (errors.length > 0) {
      const rows = new Set(errors.map((error) => error.row).filter((row) => row !== null)).size;
      const where = rows > 0 ? ` in ${plural(rows, 'row', 'rows')}` : '';
      throw refusal(`Nothing was written: the file has ${plural(errors.length, 'problem', 'problems')}${where}. Correct them and upload the whole file again.`, errors);
    }
    const sha256 = createHash('sha256').update(upload.bytes).digest('hex');
    return { trial, site, round, mapping, rowsRead: file.rows.length, values: validation.values, warnings: validation.warnings, sha256 };
  }

  private readFile(bytes: Buffer) {
    try {
      return readCsvFile(bytes, { maxBytes: this.config.maxBytes });
    } catch (error) {
      if (!(error instanceof IntakeFileError)) throw error;
      if (error.status === 413) throw new PayloadTooLargeException(error.message);
      throw refusal(error.message, error.problems.length ? error.problems : [{ row: null, column: null, message: error.message }]);
    }
  }

  private async plotPlan(trialId: number, site: SiteRow): Promise<{ sitePlots: SitePlot[]; trialPlotLabels: Map<string, { siteId: number; siteName: string }> }> {
    const rows = await this.plots.findAll({
      where: { trialId },
      attributes: ['id', 'label', 'block', 'siteId'],
      include: [{ model: TreatmentRow, attributes: ['code'] }, { model: SiteRow, attributes: ['name'] }],
    });
    const sitePlots = rows
      .filter((row) => row.siteId === site.id)
      .map((row) => ({ id: row.id, label: row.label, block: row.block, treatmentCode: row.treatment?.code ?? '' }));
    if (sitePlots.length === 0) throw new ConflictException(`${site.name} is not randomized yet: randomize it to get its plots, then upload its data.`);
    const trialPlotLabels = new Map(rows.map((row) => [row.label, { siteId: row.siteId, siteName: row.site?.name ?? '' }]));
    return { sitePlots, trialPlotLabels };
  }

  /** Values the table cannot keep (longer than 40 characters, more than 20 whole digits), by row and column. */
  private storageProblems(values: readonly IntakeValue[], mapping: ColumnMapping, measures: readonly Measure[]): IntakeProblem[] {
    const headers = new Map(mapping.measures.map((column) => [column.measureId, column.header]));
    return values.flatMap((value) => {
      if (value.valueText === null) return [];
      const storable = storableValue(value.valueText);
      if (storable.ok) return [];
      const column = headers.get(value.measureId) ?? measures.find((m) => m.id === value.measureId)?.name ?? null;
      return [{ row: value.row, column, message: `Row ${value.row}, ${column}: ${storable.message}` }];
    });
  }

  private async latestUpload(prepared: PreparedIntake, transaction?: Transaction): Promise<IntakeUploadRow | null> {
    return this.uploads.findOne({ where: { siteId: prepared.site.id, roundId: prepared.round.id }, order: [['id', 'DESC']], transaction });
  }

  /** The incoming values worth writing and the plan against what is stored. */
  private plan(prepared: PreparedIntake, stored: readonly StoredObservation[]): { values: IntakeValue[]; plan: ChangePlan; storedByKey: Map<string, StoredObservation> } {
    const storedByKey = new Map(stored.map((value) => [keyOf(value), value]));
    const values = prepared.values.filter((value) => worthWriting(value, storedByKey));
    const withNotes = prepared.mapping.notes !== null;
    const existing: ExistingValue[] = stored.map(({ plotId, measureId, valueText, censored, missingReason, notes }) =>
      withNotes ? { plotId, measureId, valueText, censored, missingReason, notes } : { plotId, measureId, valueText, censored, missingReason },
    );
    return { values, plan: planChanges(values, existing), storedByKey };
  }

  private result(dryRun: boolean, prepared: PreparedIntake, plan: ChangePlan, identicalToPrevious: boolean, message: string): IntakeResult {
    return {
      dryRun,
      created: plan.created,
      updated: plan.updated,
      unchanged: plan.unchanged,
      warnings: [...prepared.warnings],
      changes: plan.changes.map(({ plotLabel, measureCode, kind, before, after }) => ({ plotLabel, measureCode, kind, before, after })),
      identicalToPrevious,
      message,
    };
  }

  private identicalMessage(prepared: PreparedIntake, previous: IntakeUploadRow): string {
    return `This file is byte for byte the one committed for ${prepared.site.name}, ${prepared.round.label} on ${previous.createdAt.toISOString().slice(0, 10)}; nothing was changed.`;
  }

  private async dryRun(prepared: PreparedIntake): Promise<IntakeResult> {
    const previous = await this.latestUpload(prepared);
    const { plan } = this.plan(prepared, await this.store.storedForSite(prepared.trial.id, prepared.site.id, prepared.round.id));
    const identical = previous?.sha256 === prepared.sha256;
    const valueWarnings = valueWarningsOf(prepared).length;
    const warned = valueWarnings ? ` ${plural(valueWarnings, 'warning needs', 'warnings need')} acceptWarnings=true.` : '';
    const message = identical
      ? this.identicalMessage(prepared, previous)
      : `Nothing was written (dry run). Committing would add ${plural(plan.created, 'new value', 'new values')}, change ${count(plan.updated)} and leave ${count(plan.unchanged)} unchanged.${warned}`;
    return this.result(true, prepared, plan, identical, message);
  }

  private async commit(prepared: PreparedIntake, user: AuthUser, upload: IntakeUpload, transaction: Transaction): Promise<IntakeResult> {
    const { trial, site, round } = prepared;
    await this.gate.openForWrite(trial.id, transaction);
    const previous = await this.latestUpload(prepared, transaction);
    if (previous?.sha256 === prepared.sha256) {
      const empty: ChangePlan = { created: 0, updated: 0, unchanged: prepared.values.length, changes: [] };
      return this.result(false, prepared, empty, true, this.identicalMessage(prepared, previous));
    }
    const { values, plan, storedByKey } = this.plan(prepared, await this.store.storedForSite(trial.id, site.id, round.id, transaction));
    const at = new Date();
    const row = await this.uploads.create(
      {
        trialId: trial.id,
        siteId: site.id,
        roundId: round.id,
        userId: user.id,
        sha256: prepared.sha256,
        fileName: upload.fileName.slice(0, 255),
        sizeBytes: upload.bytes.length,
        rowsRead: prepared.rowsRead,
        createdCount: plan.created,
        updatedCount: plan.updated,
        unchangedCount: plan.unchanged,
        warningsAccepted: valueWarningsOf(prepared).length,
      },
      { transaction },
    );
    const keepNotes = prepared.mapping.notes === null;
    const writes = values.flatMap((value, index) => {
      if (plan.changes[index]!.kind === 'unchanged') return [];
      const before = storedByKey.get(keyOf(value)) ?? null;
      const next: ValueToWrite = {
        plotId: value.plotId,
        measureId: value.measureId,
        valueText: value.valueText,
        censored: value.censored,
        missingReason: value.missingReason,
        notes: keepNotes ? (before?.notes ?? null) : value.notes,
      };
      return [{ value: next, before }];
    });
    await this.store.write(transaction, { trialId: trial.id, roundId: round.id, userId: user.id, source: 'upload', uploadId: row.id, at }, writes);
    const counts = `${plural(plan.created, 'new value', 'new values')}, ${count(plan.updated)} changed, ${count(plan.unchanged)} unchanged`;
    await this.activity.record(transaction, {
      trialId: trial.id,
      userId: user.id,
      kind: 'intake.committed',
      siteId: site.id,
      summary: `Imported ${upload.fileName} for ${site.name}, ${round.label}: ${counts}.`,
      details: { uploadId: row.id, roundId: round.id, fileName: upload.fileName, sha256: prepared.sha256, created: plan.created, updated: plan.updated, unchanged: plan.unchanged, warningsAccepted: valueWarningsOf(prepared).length },
    });
    return this.result(false, prepared, plan, false, `Saved ${upload.fileName} for ${site.name}, ${round.label}: ${counts}.`);
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
          warningsAccepted: valueWarningsOf(prepared).length,
          committedAt: new Date(),
          link: `${this.mailSettings.appUrl}/trials/${prepared.trial.id}/ledger?site=${prepared.site.id}&round=${prepared.round.id}`,
        }),
      );
    } catch (error) {
      this.logger.warn(`receipt for upload to ${prepared.site.name} not sent: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
}
