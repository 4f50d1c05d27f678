import type { Observation, ObservationHistoryEntry } from '@friable/contracts';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { FieldProblemsException } from '../common/exceptions/field-problems.exception';
import { refuseIfClosed } from '../common/exceptions/trial-locked.exception';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import { describeStoredValue } from '../intake/parsing';
import { presentMeasure } from '../measures/measure.presenter';
import { MeasureRow } from '../measures/models/measure.model';
import { ObservationQueryService, type ObservationFilter } from '../observations/observation-query.service';
import { ObservationStoreService, type StoredObservation, type ValueToWrite } from '../observations/observation-store.service';
import { assertMayWriteSite } from '../observations/site-write-access';
import { PlotRow } from '../plots/models/plot.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { RoundMeasure } from '../rounds/models/round-measure.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import type { CreateObservationDto } from './dto/create-observation.dto';
import type { EditObservationDto } from './dto/edit-observation.dto';
import type { ObservationValueFields } from './dto/observation-value-fields';
import { ObservationConflictException } from './observation-conflict.exception';
import { readEditedValue } from './read-edited-value';

interface Cell {
  plotId: number;
  plotLabel: string;
  siteId: number;
  siteName: string;
  roundId: number;
  roundLabel: string;
  measureId: number;
  measureCode: string;
}

const sameStored = (a: ValueToWrite, b: StoredObservation) =>
  a.valueText === b.valueText && a.censored === b.censored && a.missingReason === b.missingReason && a.notes === b.notes;

/**
 * Ledger — the observations grid: lists values, saves one edited value with its version, adds a
 * value for a cell that has none, and gives a value's history.
 *
 * Purpose: edits are checked like Intake's cells, refused while the trial is locked, allowed only
 * for the caller's sites, and never overwrite silently: a stale version answers 409 with the
 * stored value. Each save bumps the version, leaves a history row and an activity entry.
 * Throws (as HTTP answers): 403, 404, 409 (locked trial, stale version, cell already filled), 422.
 */
@Injectable()
export class LedgerService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(PlotRow) private readonly plots: typeof PlotRow,
    @InjectModel(AssessmentRoundRow) private readonly rounds: typeof AssessmentRoundRow,
    @InjectModel(MeasureRow) private readonly measures: typeof MeasureRow,
    @InjectModel(RoundMeasure) private readonly roundMeasures: typeof RoundMeasure,
    private readonly query: ObservationQueryService,
    private readonly store: ObservationStoreService,
    private readonly gate: ProtocolGateService,
    private readonly activity: ActivityService,
  ) {}

  list(trialId: number, filter: ObservationFilter): Promise<Observation[]> {
    return this.query.list(trialId, filter);
  }

  async history(trialId: number, observationId: number): Promise<ObservationHistoryEntry[]> {
    if (!(await this.query.one(trialId, observationId))) throw new NotFoundException('No such observation in this trial.');
    return this.query.history(trialId, observationId);
  }

  async edit(access: TrialAccessContext, user: AuthUser, observationId: number, input: EditObservationDto): Promise<Observation> {
    const seen = await this.query.one(access.trialId, observationId);
    if (!seen) throw new NotFoundException('No such observation in this trial.');
    return this.save(access, user, seen, input, input.version);
  }

  async create(access: TrialAccessContext, user: AuthUser, input: CreateObservationDto): Promise<Observation> {
    return this.save(access, user, await this.cellOf(access.trialId, input), input, null);
  }

  /** The plot, round and measure of a new value, each checked to belong to the trial (and the measure to the round). */
  private async cellOf(trialId: number, input: CreateObservationDto): Promise<Cell> {
    const plot = await this.plots.findOne({ where: { id: input.plotId, trialId }, include: [{ model: SiteRow, attributes: ['id', 'name'] }] });
    if (!plot) throw new NotFoundException('No such plot in this trial.');
    const round = await this.rounds.findOne({ where: { id: input.roundId, trialId } });
    if (!round) throw new NotFoundException('No such assessment round in this trial.');
    const measure = await this.measures.findOne({ where: { id: input.measureId, trialId } });
    if (!measure) throw new NotFoundException('No such measure in this trial.');
    if (!(await this.roundMeasures.count({ where: { roundId: round.id, measureId: measure.id } }))) {
      throw new FieldProblemsException([{ field: 'measureId', message: `measureId: ${measure.name} is not assessed in ${round.label}` }]);
    }
    return { plotId: plot.id, plotLabel: plot.label, siteId: plot.siteId, siteName: plot.site?.name ?? '', roundId: round.id, roundLabel: round.label, measureId: measure.id, measureCode: measure.code };
  }

  /** `version` null: a new value (refused when the cell has one already). */
  private async save(access: TrialAccessContext, user: AuthUser, cell: Cell, input: ObservationValueFields, version: number | null): Promise<Observation> {
    assertMayWriteSite(access, cell.siteId, cell.siteName);
    const trial = (await this.trials.findByPk(access.trialId))!;
    refuseIfClosed(trial);
    const measure = presentMeasure((await this.measures.findByPk(cell.measureId))!);
    const reading = readEditedValue(input.value, input.missingReason, measure);
    if (!reading.ok) throw new FieldProblemsException([...reading.problems]);
    if (reading.value.warnings.length > 0 && input.acceptWarnings !== true) {
      throw new FieldProblemsException(
        // The acceptWarnings entry tells a client this value may be kept on purpose (sent again with it true).
        [...reading.value.warnings.map((warning) => ({ field: 'value', message: `value ${warning}` })), { field: 'acceptWarnings', message: 'confirm the value is right to keep it' }],
        `Not saved: ${reading.value.warnings.join(' ')} If the value is right, confirm it to keep it.`,
      );
    }
    const id = await this.sequelize.transaction(async (transaction) => {
      await this.gate.openForWrite(trial.id, transaction);
      const stored = await this.store.storedCell(trial.id, cell.plotId, cell.roundId, cell.measureId, transaction);
      await this.refuseConflict(trial.id, stored, version, transaction);
      const missing = reading.value.valueText === null;
      const next: ValueToWrite = {
        plotId: cell.plotId,
        measureId: cell.measureId,
        valueText: reading.value.valueText,
        censored: reading.value.censored,
        missingReason: missing ? (input.missingReason === undefined ? (stored?.valueText === null ? stored.missingReason : null) : input.missingReason || null) : null,
        notes: input.notes === undefined ? (stored?.notes ?? null) : input.notes || null,
      };
      if (missing && !next.missingReason?.trim()) {
        throw new FieldProblemsException([{ field: 'missingReason', message: 'a missing value (NA) needs a reason: choose one or type why it is missing' }]);
      }
      if (stored && sameStored(next, stored)) return stored.id;
      const [written] = await this.store.write(transaction, { trialId: trial.id, roundId: cell.roundId, userId: user.id, source: 'edit', uploadId: null, at: new Date() }, [{ value: next, before: stored }]);
      await this.recordActivity(transaction, user, trial.id, cell, stored, next, written!);
      return written!;
    });
    return (await this.query.one(trial.id, id))!;
  }

  private async refuseConflict(trialId: number, stored: StoredObservation | null, version: number | null, transaction: Transaction): Promise<void> {
    if (version === null && stored) {
      const current = (await this.query.one(trialId, stored.id, transaction))!;
      throw new ObservationConflictException(
        `${current.plotLabel} already has a ${current.measureCode} value for ${current.roundLabel} (${describeStoredValue(stored)}); edit it with its version instead.`,
        current,
      );
    }
    if (version !== null && stored && stored.version !== version) {
      const current = (await this.query.one(trialId, stored.id, transaction))!;
      const who = current.recordedBy ? ` by ${current.recordedBy}` : '';
      throw new ObservationConflictException(
        `Not saved: this value was changed${who} since you opened it (your version ${version}, now ${stored.version}: ${describeStoredValue(stored)}). Look at the current value and save again if yours is still right.`,
        current,
      );
    }
  }

  private async recordActivity(transaction: Transaction, user: AuthUser, trialId: number, cell: Cell, stored: StoredObservation | null, next: ValueToWrite, observationId: number): Promise<void> {
    const after = describeStoredValue(next);
    const where = `${cell.measureCode} of ${cell.plotLabel}, ${cell.roundLabel}`;
    await this.activity.record(transaction, {
      trialId,
      userId: user.id,
      kind: stored ? 'observation.edited' : 'observation.created',
      siteId: cell.siteId,
      summary: stored ? `Changed ${where} from ${describeStoredValue(stored)} to ${after}.` : `Recorded ${where}: ${after}.`,
      details: { observationId, plotId: cell.plotId, roundId: cell.roundId, measureId: cell.measureId, before: stored ? describeStoredValue(stored) : null, after },
    });
  }
}
