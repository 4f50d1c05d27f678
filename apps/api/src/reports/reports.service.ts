import type { Findings, ReportMeasure, ReportReview, TrialReport } from '@friable/contracts';
import { Injectable, UnprocessableEntityException } from '@nestjs/common';
import { AnalysesService } from '../analyses/analyses.service';
import { CommentsService } from '../analyses/comments.service';
import { engineVersion } from '../findings/engine-version';
import { FindingsService } from '../findings/findings.service';
import { ObservationQueryService } from '../observations/observation-query.service';
import { reportExplanation } from './report-explanation';

const METHOD = 'tukey';
const ALPHA = 0.05;

/**
 * Trial report — the protocol, the sites and, per measure, the ANOVA and the means with letters of the latest
 * round with data at all sites combined (default choices, through FindingsService), the cautions and a plain paragraph.
 * Throws: 404 for an unknown trial (through the protocol read); an analysis the engine refuses is reported as unavailable.
 */
@Injectable()
export class ReportsService {
  constructor(
    private readonly findings: FindingsService,
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
      const empty = { anova: null, summary: null, means: [], rankTest: null, warnings: [] };
      if (!round) {
        measures.push({ ...base, ...empty, unavailable: `No values of ${measure.name} have been recorded yet.` });
        continue;
      }
      let result: Findings;
      try {
        result = await this.findings.anovaFindings(trialId, { measureId: measure.id, roundId: round.id, method: METHOD, alpha: ALPHA }, protocol);
      } catch (error) {
        if (!(error instanceof UnprocessableEntityException)) throw error;
        measures.push({ ...base, ...empty, unavailable: (error.getResponse() as { message: string }).message });
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
        warnings: [...result.warnings, ...result.context.notices],
        unavailable: null,
      });
    }
    const { myRoles: _roles, mySiteIds: _sites, activation: _activation, ...rest } = protocol;
    return {
      generatedAt: new Date().toISOString(),
      engineVersion: engineVersion(),
      protocol: rest,
      sites: protocol.sites,
      measures,
      cautions: measures.flatMap((m) => (m.unavailable ? [`${m.measure.name}: ${m.unavailable}`] : m.warnings.map((w) => `${m.measure.name}, ${m.round!.label}: ${w}`))),
      explanation: reportExplanation(ALPHA, 'Tukey'),
      reviews: await this.reviews(trialId),
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
