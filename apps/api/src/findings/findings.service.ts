import type {
  AnalysisDesign,
  AnovaAnswer,
  Findings,
  FindingsAnswer,
  FindingsChoices,
  FindingsAnalysis,
  FindingsContext,
  FindingsModelQuery,
  FindingsObservationRow,
  FindingsRankTest,
  MeansOverTimePoint,
  ModelChoice,
  ModelFindings,
  ModelFindingsContext,
  NotDrainedCurve,
  Observation,
  TrialDetail,
} from '@friable/contracts';
import { DESIGN_RULES } from '@friable/field';
import { notDrainedCurves } from '@friable/stats';
import { Injectable, UnprocessableEntityException } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ObservationQueryService } from '../observations/observation-query.service';
import type { AnovaRequestDto, ObservationDto } from '../stats/dto/anova-request.dto';
import { StatsService } from '../stats/stats.service';
import { TrialsService } from '../trials/trials.service';
import { analysisDesign } from './analysis-design';
import { canonicalHash } from './canonical-hash';
import type { FindingsQueryDto } from './dto/findings-query.dto';
import { engineVersion } from './engine-version';
import { baselineRound, chooseModel } from './model-choice';
import { modelRequest, type ModelScene } from './model-requests';


/** The observations of one measure, round and scope, shaped for the engine, with what the context needs. */
interface PreparedData {
  design: AnalysisDesign;
  /** Factorial and split designs analysed on their factors: the factor names in order; empty otherwise. */
  factorNames: string[];
  engineObservations: ObservationDto[];
  rows: FindingsObservationRow[];
  missing: Observation[];
  notRecorded: number;
  controlLabel: string | null;
  treatmentOrder: string[];
  siteNames: string[];
}

/** Everything one analysis is about, read once: the protocol, the choices, the analysed round's data, the model chosen. */
interface AnalysisScene {
  trial: TrialDetail;
  measure: TrialDetail['measures'][number];
  round: TrialDetail['rounds'][number];
  site: TrialDetail['sites'][number] | null;
  scopeLabel: string;
  choices: FindingsChoices;
  data: PreparedData;
  /** Rounds holding values of the measure in the scope, up to the analysed one, in time order. */
  roundsUpTo: TrialDetail['rounds'];
  modelChoice: ModelChoice;
}

export const measureRef = (measure: TrialDetail['measures'][number]): FindingsContext['measure'] => ({
  id: measure.id,
  code: measure.code,
  name: measure.name,
  unit: measure.unit,
  kind: measure.kind,
  higherIsBetter: measure.higherIsBetter,
  cutoff: measure.cutoff,
  decimals: measure.decimals,
});

function refuse(message: string): never {
  throw new UnprocessableEntityException({ statusCode: 422, error: 'Unprocessable Entity', message });
}

/** The choices the server resolves from a query (defaults filled in), for the analysed round. */
export function resolveChoices(query: FindingsQueryDto, roundId: number): FindingsChoices {
  return {
    measureId: query.measureId,
    roundId,
    siteId: query.siteId ?? null,
    sitesAre: query.sitesAre ?? 'random',
    transform: query.transform ?? 'none',
    method: query.method ?? 'tukey',
    alpha: query.alpha ?? 0.05,
    forceLsd: query.forceLsd ?? false,
  };
}

/** The Findings query that asks again for a saved analysis (its resolved choices, model options included). */
export function savedQuery(choices: FindingsChoices & { analysis?: FindingsAnalysis } & FindingsModelQuery): FindingsQueryDto {
  const { measureId, roundId, siteId, sitesAre, transform, method, alpha, forceLsd, analysis, distribution, covariance, family, covariateMeasureId, covariateRoundId } = choices;
  const defined = Object.entries({ siteId, distribution, covariance, family, covariateMeasureId, covariateRoundId }).filter(([, v]) => v !== undefined && v !== null);
  return { measureId, roundId, sitesAre, transform, method, alpha, forceLsd, analysis: analysis ?? 'anova', ...Object.fromEntries(defined) } as FindingsQueryDto;
}

const plainCopy = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

/**
 * Findings — the analysis of one measure at one round for one site or all sites combined, computed by
 * libs/stats through StatsService exactly as POST /api/stats/anova would compute it from the stored decimal
 * text, plus the context the pages need (observations in engine order, censoring, missing values, % of
 * control, the rank test, the not-drained curve, the means over time).
 * Throws: 422 (UnprocessableEntityException) for an unknown measure, round or site, no data, or a request the
 * engine refuses (its sentence).
 */
@Injectable()
export class FindingsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly trials: TrialsService,
    private readonly observations: ObservationQueryService,
    private readonly stats: StatsService,
  ) {}

  /** The protocol of a trial, read without a caller's roles. */
  protocol(trialId: number): Promise<TrialDetail> {
    return this.trials.get({ trialId, roles: [], siteIds: [], adminReadOnly: false });
  }

  /**
   * The one computation behind GET /findings (a cache may wrap it): the analysis asked for, or the model made for
   * the measure, of one measure and round at one site or all sites combined.
   */
  async findings(trialId: number, query: FindingsQueryDto, protocol?: TrialDetail): Promise<FindingsAnswer> {
    const scene = await this.sceneOf(trialId, query, protocol);
    return scene.modelChoice.analysis === 'anova' ? this.anovaFindingsOf(scene) : this.modelFindings(scene, query);
  }

  /** The protocol, the resolved choices, the analysed round's data and the model chosen; refuses what cannot be analysed. */
  private async sceneOf(trialId: number, query: FindingsQueryDto, protocol?: TrialDetail): Promise<AnalysisScene> {
    const trial = protocol ?? (await this.protocol(trialId));
    const measure = trial.measures.find((m) => m.id === query.measureId) ?? refuse(`measureId ${query.measureId} is not a measure of this trial.`);
    const siteId = query.siteId ?? null;
    const withValues = await this.roundsWithValues(trial, measure.id, siteId);
    const roundId = query.roundId ?? withValues.at(-1)?.id ?? refuse(`There are no values of ${measure.name} ${siteId ? 'at this site' : 'at any site'} yet.`);
    const choices = resolveChoices(query, roundId);
    const round = trial.rounds.find((r) => r.id === choices.roundId) ?? refuse(`roundId ${choices.roundId} is not an assessment round of this trial.`);
    const site = choices.siteId === null ? null : (trial.sites.find((s) => s.id === choices.siteId) ?? refuse(`siteId ${choices.siteId} is not a site of this trial.`));
    const data = await this.prepare(trial, choices, choices.roundId);
    // A trial with one site is never "combined": its one site is the scope.
    const scopeLabel = site?.name ?? (trial.sites.length === 1 ? trial.sites[0]!.name : 'all sites combined');
    if (data.engineObservations.length === 0) refuse(`There are no values of ${measure.name} in ${round.label} at ${scopeLabel} yet.`);
    const roundsUpTo = withValues.filter((r) => r.dayOffset < round.dayOffset || r.id === round.id);
    const modelChoice = chooseModel(
      { measureName: measure.name, kind: measure.kind, unit: measure.unit, cutoff: measure.cutoff, rounds: roundsUpTo, censoredCount: data.rows.filter((r) => r.censored).length },
      query.analysis,
    );
    const option = modelChoice.options.find((o) => o.analysis === modelChoice.analysis)!;
    const covariateChosen = modelChoice.analysis === 'ancova' && (query.covariateMeasureId !== undefined || query.covariateRoundId !== undefined);
    if (!option.available && !covariateChosen) refuse(`${option.label} is not available for ${measure.name} here: ${option.note ?? ''}`);
    return { trial, measure, round, site, scopeLabel, choices, data, roundsUpTo, modelChoice };
  }

  /** The classical ANOVA of the measure and round (saved analyses and the report), through the same computation. */
  async anovaFindings(trialId: number, query: FindingsQueryDto, protocol?: TrialDetail): Promise<Findings> {
    return (await this.findings(trialId, { ...query, analysis: 'anova' }, protocol)) as Findings;
  }

  private async anovaFindingsOf(scene: AnalysisScene): Promise<Findings> {
    const { trial, measure, round, site, scopeLabel, choices, data } = scene;
    const request = this.engineRequest(data, choices);
    const analysis = plainCopy(this.stats.anova({ ...request, observations: data.engineObservations } as AnovaRequestDto)) as AnovaAnswer;

    const controlMean = data.controlLabel === null ? undefined : analysis.means.find((m) => m.treatment === data.controlLabel);
    const shown = (m: { mean: number; backTransformedMean?: number }) => m.backTransformedMean ?? m.mean;
    const percentOfControl = analysis.means.map((m) => ({
      treatment: m.treatment,
      percent: controlMean && shown(controlMean) !== 0 ? (shown(m) / shown(controlMean)) * 100 : null,
    }));
    const censoredCount = data.rows.filter((r) => r.censored).length;
    const notices: string[] = [];
    if (censoredCount > 0) {
      notices.push(
        `${censoredCount} ${censoredCount === 1 ? 'plot was' : 'plots were'} not drained by the cut-off (${measure.cutoff ?? ''} ${measure.unit}): the ANOVA analyses ${censoredCount === 1 ? 'it' : 'them'} at the cut-off value, which understates the real time, while the rank test beside it assumes no value, only that they rank last.`,
      );
    }
    const missingCount = data.missing.length + data.notRecorded;
    if (missingCount > 0) notices.push(`${missingCount} ${missingCount === 1 ? 'value is' : 'values are'} missing and left out of the analysis.`);
    const reasons = new Map<string, number>();
    for (const o of data.missing) reasons.set(o.missingReason ?? 'no reason given', (reasons.get(o.missingReason ?? 'no reason given') ?? 0) + 1);
    if (data.notRecorded > 0) reasons.set('not recorded', data.notRecorded);

    const context: FindingsContext = {
      trialId: trial.id,
      trialCode: trial.code,
      choices,
      engineRequest: request,
      measure: measureRef(measure),
      round: { id: round.id, label: round.label, dayOffset: round.dayOffset },
      scope: { siteId: site?.id ?? null, siteName: site?.name ?? null, label: scopeLabel, siteNames: data.siteNames },
      observations: data.rows,
      censored: { count: censoredCount, cutoff: measure.cutoff },
      missing: { count: missingCount, reasons: [...reasons].map(([reason, count]) => ({ reason, count })) },
      controlCode: data.controlLabel,
      percentOfControl,
      rankTest: this.rankTest(data),
      ...(measure.kind === 'time-with-cutoff'
        ? { notDrained: plainCopy(notDrainedCurves(data.rows.map((r, i) => ({ treatment: data.engineObservations[i]!.treatment ?? r.treatment, time: Number(r.value), censored: r.censored })), data.treatmentOrder)) as NotDrainedCurve[] }
        : {}),
      meansOverTime: await this.meansOverTime(trial, choices, analysis),
      notices,
      modelChoice: scene.modelChoice,
      dataHash: canonicalHash(data.engineObservations),
      engineVersion: engineVersion(),
    };
    return { ...analysis, context };
  }

  /** The rounds (in time order) that hold a value of the measure in the scope. */
  private async roundsWithValues(trial: TrialDetail, measureId: number, siteId: number | null): Promise<TrialDetail['rounds']> {
    const stored = await this.observations.list(trial.id, { measureId, ...(siteId !== null ? { siteId } : {}) });
    const withValues = new Set(stored.filter((o) => o.valueText !== null).map((o) => o.roundId));
    return trial.rounds.filter((r) => withValues.has(r.id)).sort((a, b) => a.dayOffset - b.dayOffset || a.id - b.id);
  }

  /**
   * A model made for the measure (censored, repeated, ancova, ordinal, counts): the stateless endpoint's answer on
   * the observations it was given, which the context lists with the request, so anyone can post them again.
   */
  private async modelFindings(scene: AnalysisScene, query: FindingsQueryDto): Promise<ModelFindings> {
    const { trial, measure, round, site, scopeLabel, choices, data, modelChoice } = scene;
    const { analysis, prepared, covariate, modelScene, built } = await this.modelInput(scene, query);
    const { request, observations, rows, notices } = built;
    const body = { ...request, observations } as never;
    const answer =
      analysis === 'censored'
        ? this.stats.censored(body)
        : analysis === 'repeated'
          ? this.stats.repeated(body)
          : analysis === 'ordinal'
            ? this.stats.ordinal(body)
            : analysis === 'counts'
              ? this.stats.counts(body)
              : (plainCopy(this.stats.anova(body)) as AnovaAnswer);
    const missing = prepared.reduce((sum, p) => sum + p.data.missing.length + p.data.notRecorded, 0);
    const reasons = new Map<string, number>();
    for (const p of prepared) {
      for (const o of p.data.missing) reasons.set(o.missingReason ?? 'no reason given', (reasons.get(o.missingReason ?? 'no reason given') ?? 0) + 1);
      if (p.data.notRecorded > 0) reasons.set('not recorded', (reasons.get('not recorded') ?? 0) + p.data.notRecorded);
    }
    if (missing > 0) notices.push(`${missing} ${missing === 1 ? 'value is' : 'values are'} missing and left out of the analysis.`);
    const context: ModelFindingsContext = {
      trialId: trial.id,
      trialCode: trial.code,
      choices: {
        measureId: choices.measureId,
        roundId: choices.roundId,
        siteId: choices.siteId,
        alpha: choices.alpha,
        method: choices.method,
        analysis,
        ...(analysis === 'censored' ? { distribution: query.distribution ?? 'weibull' } : {}),
        ...(analysis === 'repeated' ? { covariance: query.covariance ?? 'auto' } : {}),
        ...(analysis === 'counts' ? { family: query.family ?? 'auto' } : {}),
        ...(covariate ? { covariateMeasureId: covariate.measureId, covariateRoundId: covariate.roundId } : {}),
      },
      modelChoice,
      engineRequest: request,
      engineObservations: observations,
      measure: measureRef(measure),
      round: { id: round.id, label: round.label, dayOffset: round.dayOffset },
      ...(analysis === 'repeated' ? { rounds: prepared.map((p) => ({ id: p.round.id, label: p.round.label, dayOffset: p.round.dayOffset })) } : {}),
      scope: { siteId: site?.id ?? null, siteName: site?.name ?? null, label: scopeLabel, siteNames: data.siteNames },
      observations: rows,
      censored: { count: rows.filter((r) => r.censored).length, cutoff: measure.cutoff },
      missing: { count: missing, reasons: [...reasons].map(([reason, count]) => ({ reason, count })) },
      controlCode: modelScene.control,
      notices,
      dataHash: canonicalHash(observations),
      engineVersion: engineVersion(),
    };
    return { ...(answer as object), analysis, context } as ModelFindings;
  }

  /** What a model analysis sends to its stateless endpoint: the rounds and covariate read, and the request built from them. */
  private async modelInput(scene: AnalysisScene, query: FindingsQueryDto) {
    const { trial, round, choices, data, modelChoice } = scene;
    const analysis = modelChoice.analysis as ModelFindings['analysis'];
    const prepared = analysis === 'repeated' ? await this.roundsData(scene) : [{ round, data }];
    const covariate = analysis === 'ancova' ? await this.covariateData(scene, query) : null;
    const modelScene: ModelScene = {
      analysis,
      design: data.design,
      blocked: DESIGN_RULES[trial.design].blocked,
      combined: data.siteNames.length > 1,
      control: data.controlLabel === null ? null : (trial.treatments.find((t) => t.isControl)?.code ?? null),
      choices: { ...choices, distribution: query.distribution, covariance: query.covariance, family: query.family },
      rounds: prepared.map(({ round: r, data: d }) => ({ label: r.label, dayOffset: r.dayOffset, rows: d.rows })),
      covariate: covariate && { label: covariate.label, values: covariate.values },
    };
    return { analysis, prepared, covariate, modelScene, built: modelRequest(modelScene) };
  }

  /** Each round of the measure with values in the scope, up to the analysed one (rounds over time). */
  private async roundsData(scene: AnalysisScene): Promise<Array<{ round: TrialDetail['rounds'][number]; data: PreparedData }>> {
    const out = [];
    for (const round of scene.roundsUpTo) {
      out.push({ round, data: round.id === scene.round.id ? scene.data : await this.prepare(scene.trial, scene.choices, round.id) });
    }
    return out;
  }

  /** The covariate of the analysis of covariance: each plot's value of the chosen measure at the chosen (default: baseline) round. */
  private async covariateData(scene: AnalysisScene, query: FindingsQueryDto) {
    const { trial, measure } = scene;
    const covariateMeasure =
      query.covariateMeasureId === undefined
        ? measure
        : (trial.measures.find((m) => m.id === query.covariateMeasureId) ?? refuse(`covariateMeasureId ${query.covariateMeasureId} is not a measure of this trial.`));
    let covariateRound: TrialDetail['rounds'][number];
    if (query.covariateRoundId !== undefined) {
      covariateRound = trial.rounds.find((r) => r.id === query.covariateRoundId) ?? refuse(`covariateRoundId ${query.covariateRoundId} is not an assessment round of this trial.`);
    } else {
      const rounds =
        covariateMeasure.id === measure.id
          ? scene.roundsUpTo
          : [...(await this.roundsWithValues(trial, covariateMeasure.id, scene.choices.siteId)).filter((r) => r.dayOffset < scene.round.dayOffset), scene.round];
      covariateRound = baselineRound(rounds) ?? refuse(`There is no earlier round with values of ${covariateMeasure.name} to take as the baseline.`);
    }
    if (covariateRound.id === scene.round.id && covariateMeasure.id === measure.id) refuse('The covariate must be another round or another measure than the one analysed.');
    const data = await this.prepare(trial, { ...scene.choices, measureId: covariateMeasure.id }, covariateRound.id);
    if (data.rows.length === 0) refuse(`There are no values of ${covariateMeasure.name} in ${covariateRound.label} at ${scene.scopeLabel} to take as the covariate.`);
    const values = new Map(data.rows.map((r) => [r.plotLabel, { value: r.value, censored: r.censored }]));
    return { measureId: covariateMeasure.id, roundId: covariateRound.id, label: `${covariateMeasure.name} at ${covariateRound.label}`, values };
  }

  /**
   * The hash of the data the saved choices would analyse now (null when there are none): the ANOVA's rows of the round,
   * or the observations a model would send (every round used, the plots with a covariate).
   */
  async currentDataHash(trialId: number, choices: FindingsChoices & { analysis?: FindingsAnalysis } & FindingsModelQuery): Promise<string | null> {
    const trial = await this.protocol(trialId);
    if (choices.analysis === undefined || choices.analysis === 'anova') {
      const data = await this.prepare(trial, choices, choices.roundId);
      return data.engineObservations.length === 0 ? null : canonicalHash(data.engineObservations);
    }
    const query = savedQuery(choices);
    const { built } = await this.modelInput(await this.sceneOf(trialId, query, trial), query);
    return canonicalHash(built.observations);
  }

  private engineRequest(data: PreparedData, choices: FindingsChoices): FindingsContext['engineRequest'] {
    return {
      design: data.design,
      ...(data.factorNames.length ? { factorNames: data.factorNames } : {}),
      alpha: choices.alpha,
      ...(data.design.startsWith('multisite-') ? { sitesAre: choices.sitesAre } : {}),
      ...(data.controlLabel !== null ? { control: data.controlLabel } : {}),
      transform: choices.transform,
      meanSeparation: [choices.method],
      forceLsd: choices.forceLsd,
    };
  }

  private async prepare(trial: TrialDetail, choices: FindingsChoices, roundId: number): Promise<PreparedData> {
    const all = await this.observations.list(trial.id, { roundId, measureId: choices.measureId, ...(choices.siteId !== null ? { siteId: choices.siteId } : {}) });
    const valued = all.filter((o) => o.valueText !== null);
    const missing = all.filter((o) => o.valueText === null);
    const siteNames = [...new Set(valued.map((o) => o.siteName))];
    const choice = analysisDesign(trial.design, siteNames.length, trial.factors.length);
    if ('refusal' in choice) refuse(choice.refusal);
    const { design, withFactors } = choice;
    const factorNames = withFactors ? trial.factors.map((f) => f.name) : [];
    const factorsOf = new Map<string, Record<string, string>>();
    if (withFactors) {
      const levelCode = new Map(trial.factors.flatMap((f) => f.levels.map((l) => [l.id, { factor: f.name, code: l.code }] as const)));
      for (const t of trial.treatments) {
        const levels = t.factorLevelIds.map((id) => levelCode.get(id)).filter((l) => l !== undefined);
        factorsOf.set(t.code, Object.fromEntries(levels.map((l) => [l.factor, l.code])));
      }
    }
    const engineLabel = (code: string) => {
      const factors = factorsOf.get(code);
      return factors ? trial.factors.map((f) => factors[f.name] ?? '?').join(' × ') : code;
    };
    const blocked = DESIGN_RULES[trial.design].blocked;
    const engineObservations: ObservationDto[] = valued.map((o) => ({
      ...(withFactors ? { factors: factorsOf.get(o.treatmentCode) ?? {} } : { treatment: o.treatmentCode }),
      ...(blocked ? { block: String(o.block) } : {}),
      ...(siteNames.length > 1 ? { site: o.siteName } : {}),
      value: o.valueText!,
    }));
    const rows = valued.map((o) => ({
      observationId: o.id,
      plotLabel: o.plotLabel,
      siteName: o.siteName,
      block: o.block,
      treatment: o.treatmentCode,
      value: o.valueText!,
      censored: o.censored,
      ...(withFactors ? { factors: factorsOf.get(o.treatmentCode) ?? {} } : {}),
    }));
    const control = trial.treatments.find((t) => t.isControl);
    const controlLabel = control && valued.some((o) => o.treatmentCode === control.code) ? engineLabel(control.code) : null;
    const plotCount = await this.plotCount(trial.id, choices.siteId);
    return {
      design,
      factorNames,
      engineObservations,
      rows,
      missing,
      notRecorded: Math.max(0, plotCount - all.length),
      controlLabel,
      treatmentOrder: trial.treatments.map((t) => engineLabel(t.code)),
      siteNames,
    };
  }

  private async plotCount(trialId: number, siteId: number | null): Promise<number> {
    const [row] = await this.sequelize.query<{ n: number }>(
      `SELECT COUNT(*) AS n FROM plots p JOIN sites s ON s.id = p.site_id WHERE s.trial_id = :trialId${siteId === null ? '' : ' AND p.site_id = :siteId'}`,
      { replacements: { trialId, siteId }, type: QueryTypes.SELECT },
    );
    return Number(row?.n ?? 0);
  }

  private rankTest(data: PreparedData): FindingsRankTest {
    const blocked = data.engineObservations.some((o) => o.block !== undefined);
    const test = blocked ? 'friedman' : 'kruskal-wallis';
    const observations = data.engineObservations.map((o, i) => ({
      treatment: o.treatment ?? data.rows[i]!.treatment,
      ...(blocked ? { block: o.block } : {}),
      ...(o.site !== undefined ? { site: o.site } : {}),
      value: o.value,
    }));
    try {
      const result = blocked ? this.stats.friedman({ observations }) : this.stats.kruskal({ observations });
      return { test, ...plainCopy(result) };
    } catch (error) {
      if (error instanceof UnprocessableEntityException) {
        return { test, statistic: null, df: null, p: null, unavailable: (error.getResponse() as { message: string }).message };
      }
      throw error;
    }
  }

  private async meansOverTime(trial: TrialDetail, choices: FindingsChoices, current: AnovaAnswer): Promise<MeansOverTimePoint[]> {
    const points: MeansOverTimePoint[] = [];
    const rounds = [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset || a.id - b.id);
    for (const round of rounds) {
      const point = { roundId: round.id, roundLabel: round.label, dayOffset: round.dayOffset };
      if (round.id === choices.roundId) {
        points.push({ ...point, means: current.means });
        continue;
      }
      const data = await this.prepare(trial, choices, round.id);
      if (data.engineObservations.length === 0) continue;
      try {
        const analysis = this.stats.anova({ ...this.engineRequest(data, choices), observations: data.engineObservations } as AnovaRequestDto);
        points.push({ ...point, means: plainCopy(analysis.means) as AnovaAnswer['means'] });
      } catch (error) {
        if (!(error instanceof UnprocessableEntityException)) throw error;
        points.push({ ...point, means: [], unavailable: (error.getResponse() as { message: string }).message });
      }
    }
    return points;
  }
}
