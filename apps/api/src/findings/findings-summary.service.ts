import type { AssessmentRound, FindingsSummary, FindingsSummaryRow } from '@friable/contracts';
import { summarizeValues } from '@friable/stats';
import { Injectable, UnprocessableEntityException } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { MeasuresService } from '../measures/measures.service';
import { ObservationQueryService } from '../observations/observation-query.service';
import { RoundsService } from '../rounds/rounds.service';
import { TreatmentsService } from '../treatments/treatments.service';
import { measureRef } from './findings.service';

function refuse(message: string): never {
  throw new UnprocessableEntityException({ statusCode: 422, error: 'Unprocessable Entity', message });
}

/**
 * The recorded values of one measure, round and scope per treatment — counts, mean, SD, median, range —
 * read without the engine, so Findings can show a first table while the analysis is computed.
 * The round left out is the one GET /findings would analyse: the latest holding values of the measure in the scope.
 * Throws: 422 for an unknown measure, round or site, or no values yet.
 */
@Injectable()
export class FindingsSummaryService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly treatmentsList: TreatmentsService,
    private readonly measuresList: MeasuresService,
    private readonly roundsList: RoundsService,
    private readonly observations: ObservationQueryService,
  ) {}

  async summary(trialId: number, query: { measureId: number; roundId?: number; siteId?: number }): Promise<FindingsSummary> {
    // Only the parts of the protocol the table needs, read at once (not the whole protocol, one part after another).
    const [treatments, measures, rounds, site, stored, plots] = await Promise.all([
      this.treatmentsList.list(trialId),
      this.measuresList.list(trialId),
      this.roundsList.list(trialId),
      query.siteId === undefined ? Promise.resolve(null) : this.siteOf(trialId, query.siteId),
      this.observations.list(trialId, { measureId: query.measureId, ...(query.siteId !== undefined ? { siteId: query.siteId } : {}) }),
      this.plotsPerTreatment(trialId, query.siteId ?? null),
    ]);
    const measure = measures.find((m) => m.id === query.measureId) ?? refuse(`measureId ${query.measureId} is not a measure of this trial.`);
    const round = this.roundOf(rounds, stored, query.roundId) ?? refuse(`There are no values of ${measure.name} ${site ? 'at this site' : 'at any site'} yet.`);
    const inRound = stored.filter((o) => o.roundId === round.id);
    const rows: FindingsSummaryRow[] = treatments.map((treatment) => {
      const own = inRound.filter((o) => o.treatmentCode === treatment.code && o.valueText !== null);
      const plotCount = plots.get(treatment.id) ?? 0;
      const described = own.length ? summarizeValues(own.map((o) => Number(o.valueText))) : null;
      return {
        treatment: treatment.code,
        plots: plotCount,
        values: own.length,
        censored: own.filter((o) => o.censored).length,
        missing: Math.max(0, plotCount - own.length),
        mean: described?.mean ?? null,
        sd: described?.sd ?? null,
        median: described?.median ?? null,
        min: described?.min ?? null,
        max: described?.max ?? null,
      };
    });
    return {
      measure: measureRef(measure),
      round: { id: round.id, label: round.label, dayOffset: round.dayOffset },
      scope: { siteId: site?.id ?? null, siteName: site?.name ?? null, label: site ? site.name : 'all sites combined', siteNames: [...new Set(inRound.filter((o) => o.valueText !== null).map((o) => o.siteName))] },
      treatments: rows,
    };
  }

  /** The round asked for, else the latest (by day) holding a value. */
  private roundOf(rounds: AssessmentRound[], stored: Array<{ roundId: number; valueText: string | null }>, roundId?: number) {
    if (roundId !== undefined) return rounds.find((r) => r.id === roundId) ?? refuse(`roundId ${roundId} is not an assessment round of this trial.`);
    const withValues = new Set(stored.filter((o) => o.valueText !== null).map((o) => o.roundId));
    return rounds.filter((r) => withValues.has(r.id)).sort((a, b) => a.dayOffset - b.dayOffset || a.id - b.id).at(-1);
  }

  /** The site asked for, if it is one of the trial's. */
  private async siteOf(trialId: number, siteId: number): Promise<{ id: number; name: string }> {
    const [row] = await this.sequelize.query<{ id: number; name: string }>('SELECT id, name FROM sites WHERE id = :siteId AND trial_id = :trialId AND deleted_at IS NULL', {
      replacements: { trialId, siteId },
      type: QueryTypes.SELECT,
    });
    return row ?? refuse(`siteId ${siteId} is not a site of this trial.`);
  }

  private async plotsPerTreatment(trialId: number, siteId: number | null): Promise<Map<number, number>> {
    const rows = await this.sequelize.query<{ treatmentId: number; n: number }>(
      `SELECT p.treatment_id AS treatmentId, COUNT(*) AS n FROM plots p JOIN sites s ON s.id = p.site_id WHERE s.trial_id = :trialId${siteId === null ? '' : ' AND p.site_id = :siteId'} GROUP BY p.treatment_id`,
      { replacements: { trialId, siteId }, type: QueryTypes.SELECT },
    );
    return new Map(rows.map((row) => [Number(row.treatmentId), Number(row.n)]));
  }
}
