import { isModelFindings, type Findings, type FindingsAnswer, type ReportMeasure, type ReportModel, type ReportReview, type TrialDetail, type TrialReport } from '@friable/contracts';
import { Injectable, UnprocessableEntityException } from '@nestjs/common';
import { AnalysesService } from '../analyses/analyses.service';
import { CommentsService } from '../analyses/comments.service';
import { analysisLabel, savedChoicesFor } from '../analyses/saved-choices';
import type { FindingsQueryDto } from '../findings/dto/findings-query.dto';
import { FindingsCache } from '../findings/findings-cache';
import { modelTables } from '../findings/model-tables';
import { engineVersion } from '../findings/engine-version';
import { FindingsService } from '../findings/findings.service';
import { ObservationQueryService } from '../observations/observation-query.service';
import { reportExplanation } from './report-explanation';

const METHOD = 'tukey';
const ALPHA = 0.05;

/**
 * Trial report — the protocol, the sites and, per measure, at the latest round with data at all sites combined: the
 * model made for the measure (Findings' default — censored, rounds over time, baseline-adjusted, ordinal or counts —
 * with its choices and tables), the classical ANOVA and the means with letters (default choices, through Findings and
 * its cache), the cautions and a plain paragraph.
 * Throws: 404 for an unknown trial (through the protocol read); an analysis the engine refuses is reported as unavailable.
 */
@Injectable()
export class ReportsService {
  constructor(
    private readonly findings: FindingsService,
    private readonly cache: FindingsCache,
    private readonly observations: ObservationQueryService,
    private readonly analyses: AnalysesService,
    private readonly comments: CommentsService,
  ) {}

  async report(trialId: number): Promise<TrialReport> {
    const protocol = await this.findings.protocol(trialId);
    const observations = await this.observations.list(trialId);
    const rounds = [...protocol.rounds].sort((a, b) => b.dayOffset - a.dayOffset || b.id - a.id);
    const measures: ReportMeasure[] = [];
    for (const measure of protocol.measures) {
      const round = rounds.find((r) => observations.some((o) => o.roundId === r.id && o.measureId === measure.id && o.valueText !== null)) ?? null;
      const base = { measure, round: round && { id: round.id, label: round.label, dayOffset: round.dayOffset }, scopeLabel: 'all sites combined', method: METHOD, alpha: ALPHA } as const;
      const empty = { anova: null, summary: null, means: [], rankTest: null, warnings: [], model: null };
      if (!round) {
        measures.push({ ...base, ...empty, unavailable: `No values of ${measure.name} have been recorded yet.` });
        continue;
      }
      const query: FindingsQueryDto = { measureId: measure.id, roundId: round.id, method: METHOD, alpha: ALPHA };
      const model = await this.modelOf(trialId, query, protocol);
      let result: Findings;
      try {
        result = (await this.answer(trialId, { ...query, analysis: 'anova' }, protocol)) as Findings;
      } catch (error) {
        if (!(error instanceof UnprocessableEntityException)) throw error;
        measures.push({ ...base, ...empty, model: 'model' in model ? model.model : null, unavailable: (error.getResponse() as { message: string }).message });
        continue;
      }
      const letters = result.letters[METHOD] ?? {};
      const percent = new Map(result.context.percentOfControl.map((p) => [p.treatment, p.percent]));
      measures.push({
        ...base,
        anova: result.anova,
        summary: result.summary,
        means: result.means.map((m) => ({ ...m, letters: letters[m.treatment] ?? null, percentOfControl: percent.get(m.treatment) ?? null })),
        rankTest: result.context.rankTest,
        warnings: [...result.warnings, ...result.context.notices, ...('refusal' in model ? [`The model made for ${measure.name} could not be made: ${model.refusal}`] : [])],
        unavailable: null,
        model: 'model' in model ? model.model : null,
      });
    }
    const { myRoles: _roles, mySiteIds: _sites, activation: _activation, ...rest } = protocol;
    return {
      generatedAt: new Date().toISOString(),
      engineVersion: engineVersion(),
      protocol: rest,
      sites: protocol.sites,
      measures,
      cautions: measures.flatMap((m) => [
        ...(m.unavailable ? [`${m.measure.name}: ${m.unavailable}`] : m.warnings.map((w) => `${m.measure.name}, ${m.round!.label}: ${w}`)),
        ...(m.model?.notices ?? []).map((w) => `${m.measure.name}, ${m.round!.label} (${m.model!.label.toLowerCase()}): ${w}`),
      ]),
      explanation: reportExplanation(ALPHA, 'Tukey'),
      reviews: await this.reviews(trialId),
    };
  }

  /** Findings' answer, through its cache (the report asks for what the pages most likely asked for already). */
  private answer(trialId: number, query: FindingsQueryDto, protocol: TrialDetail): Promise<FindingsAnswer> {
    return this.cache.answer(trialId, query, () => this.findings.findings(trialId, query, protocol));
  }

  /** The model made for the measure (Findings' default), its choices and tables; none when that is the ANOVA, or why it could not be made. */
  private async modelOf(trialId: number, query: FindingsQueryDto, protocol: TrialDetail): Promise<{ model: ReportModel | null } | { refusal: string }> {
    let answer: FindingsAnswer;
    try {
      answer = await this.answer(trialId, query, protocol);
    } catch (error) {
      if (!(error instanceof UnprocessableEntityException)) throw error;
      return { refusal: (error.getResponse() as { message: string }).message };
    }
    if (!isModelFindings(answer)) return { model: null };
    const { context } = answer;
    return {
      model: {
        analysis: answer.analysis,
        label: analysisLabel(answer.analysis),
        why: context.modelChoice.why,
        choices: savedChoicesFor(query, answer),
        tables: modelTables(answer),
        notices: [...answer.warnings, ...context.notices],
      },
    };
  }

  /** Saved analyses with sign-offs or open comments: each sign-off with its statement and state, each open thread. */
  private async reviews(trialId: number): Promise<ReportReview[]> {
    const saved = (await this.analyses.list(trialId)).reverse();
    const comments = await this.comments.forSnapshots(saved.map((s) => s.id));
    return saved.flatMap((analysis): ReportReview[] => {
      const mine = comments.filter((c) => c.analysisId === analysis.id);
      const openComments = mine
        .filter((c) => c.parentId === null && !c.deletedAt && !c.resolvedAt)
        .map((c) => ({ id: c.id, authorName: c.authorName, body: c.body, createdAt: c.createdAt, replyCount: mine.filter((r) => r.parentId === c.id && !r.deletedAt).length }));
      if (analysis.signOffs.length === 0 && openComments.length === 0) return [];
      const { id, title, measureName, roundLabel, scopeLabel, review, signOffs } = analysis;
      return [{ analysisId: id, title, measureName, roundLabel, scopeLabel, review, signOffs, openComments }];
    });
  }
}
