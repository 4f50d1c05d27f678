import type { FindingsSummary, FindingsSummaryRow, TrialDetail } from '@friable/contracts';
import { summarizeValues } from '@friable/stats';
import { Injectable, UnprocessableEntityException } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ObservationQueryService } from '../observations/observation-query.service';
import { TrialsService } from '../trials/trials.service';
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
    private readonly trials: TrialsService,
    private readonly observations: ObservationQueryService,
  ) {}

  async summary(trialId: number, query: { measureId: number; roundId?: number; siteId?: number }): Promise<FindingsSummary> {
    const trial = await this.trials.get({ trialId, roles: [], siteIds: [], adminReadOnly: false });
    const measure = trial.measures.find((m) => m.id === query.measureId) ?? refuse(`measureId ${query.measureId} is not a measure of this trial.`);
    const site = query.siteId === undefined ? null : (trial.sites.find((s) => s.id === query.siteId) ?? refuse(`siteId ${query.siteId} is not a site of this trial.`));
    const stored = await this.observations.list(trial.id, { measureId: measure.id, ...(site ? { siteId: site.id } : {}) });
    const round = this.roundOf(trial, stored, query.roundId) ?? refuse(`There are no values of ${measure.name} ${site ? 'at this site' : 'at any site'} yet.`);
    const inRound = stored.filter((o) => o.roundId === round.id);
    const plots = await this.plotsPerTreatment(trial.id, site?.id ?? null);
    const treatments: FindingsSummaryRow[] = trial.treatments.map((treatment) => {
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
      treatments,
    };
  }

  /** The round asked for, else the latest (by day) holding a value. */
  private roundOf(trial: TrialDetail, stored: Array<{ roundId: number; valueText: string | null }>, roundId?: number) {
    if (roundId !== undefined) return trial.rounds.find((r) => r.id === roundId) ?? refuse(`roundId ${roundId} is not an assessment round of this trial.`);
    const withValues = new Set(stored.filter((o) => o.valueText !== null).map((o) => o.roundId));
    return trial.rounds.filter((r) => withValues.has(r.id)).sort((a, b) => a.dayOffset - b.dayOffset || a.id - b.id).at(-1);
  }

  private async plotsPerTreatment(trialId: number, siteId: number | null): Promise<Map<number, number>> {
    const rows = await this.sequelize.query<{ treatmentId: number; n: number }>(
      `SELECT p.treatment_id AS treatmentId, COUNT(*) AS n FROM plots p JOIN sites s ON s.id = p.site_id WHERE s.trial_id = :trialId${siteId === null ? '' : ' AND p.site_id = :siteId'} GROUP BY p.treatment_id`,
      { replacements: { trialId, siteId }, type: QueryTypes.SELECT },
    );
    return new Map(rows.map((row) => [Number(row.treatmentId), Number(row.n)]));
  }
}
