import type {
  AftDistribution,
  AnalysisDesign,
  CountFamilyChoice,
  FindingsChoices,
  FindingsObservationRow,
  ModelDesign,
  ModelFindings,
  ModelFindingsContext,
  RepeatedCovariance,
} from '@friable/contracts';

/** What a model analysis in Findings is given: the rows of each round used, read from the store. */
export interface ModelScene {
  analysis: ModelFindings['analysis'];
  /** The ANOVA's design for these data (a factorial or split design is named so). */
  design: AnalysisDesign;
  blocked: boolean;
  /** Several sites combined. */
  combined: boolean;
  /** The control's treatment code, when it has values. */
  control: string | null;
  choices: FindingsChoices & { distribution?: AftDistribution; covariance?: RepeatedCovariance; family?: CountFamilyChoice };
  /** One round, or (repeated) every round used in time order. */
  rounds: ReadonlyArray<{ label: string; dayOffset: number; rows: readonly FindingsObservationRow[] }>;
  /** ancova: each plot's covariate by plot label, and what it is ("Drain time at Day 0"). */
  covariate: { label: string; values: ReadonlyMap<string, { value: string; censored: boolean }> } | null;
}

export interface ModelRequest {
  /** The stateless endpoint's body without observations. */
  request: Record<string, unknown>;
  observations: Array<Record<string, unknown>>;
  /** The rows behind the observations, in the same order. */
  rows: ModelFindingsContext['observations'];
  notices: string[];
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The layout the model endpoints take: a plot is site + block + treatment. */
export function modelDesign(blocked: boolean, combined: boolean): ModelDesign {
  return blocked ? (combined ? 'multisite-rcbd' : 'rcbd') : 'crd';
}

/**
 * Model request — the body of POST /api/stats/censored, /repeated, /ordinal, /counts or /anova (with a covariate)
 * for the rows Findings read, with the rows in the same order and the plain sentences the engine cannot know
 * (values at the cut-off, plots without a baseline, treatments taken as combinations).
 * Throws: nothing (the engine judges the data).
 * Example: modelRequest({ analysis: 'censored', blocked: true, combined: false, … }).request → { design: 'rcbd', distribution: 'weibull', control: 'CTL' }
 */
export function modelRequest(scene: ModelScene): ModelRequest {
  const design = modelDesign(scene.blocked, scene.combined);
  const { choices } = scene;
  const label = (row: FindingsObservationRow, plotAsBlock = false) => ({
    treatment: row.treatment,
    ...(scene.blocked ? { block: String(row.block) } : plotAsBlock ? { block: row.plotLabel } : {}),
    ...(scene.combined ? { site: row.siteName } : {}),
  });
  const control = scene.control === null ? {} : { control: scene.control };
  const notices: string[] = [];
  if (design !== scene.design) notices.push(`The model compares the treatments (each combination of factor levels) as one factor, with blocks${scene.design.includes('split') ? '; the whole-plot error of the split plot is not separated' : ''}.`);
  const single = scene.rounds[scene.rounds.length - 1]!.rows;
  const censoredIn = (rows: readonly { censored: boolean }[]) => rows.filter((r) => r.censored).length;
  const atCutoff = (n: number, what: string) =>
    n > 0 ? [`${plural(n, 'value', 'values')} not drained by the cut-off ${n === 1 ? 'enters' : 'enter'} ${what} at the cut-off value, which understates ${n === 1 ? 'it' : 'them'}.`] : [];

  switch (scene.analysis) {
    case 'censored':
      return {
        request: { design, distribution: choices.distribution ?? 'weibull', ...control },
        observations: single.map((row) => ({ ...label(row), value: row.value, censored: row.censored })),
        rows: [...single],
        notices,
      };
    case 'ordinal':
    case 'counts':
      return {
        request: { design, ...control, ...(scene.analysis === 'counts' ? { family: choices.family ?? 'auto' } : {}) },
        observations: single.map((row) => ({ ...label(row), value: row.value })),
        rows: [...single],
        notices,
      };
    case 'repeated': {
      const rows = scene.rounds.flatMap((round) => round.rows.map((row) => ({ row, round })));
      notices.push(...atCutoff(censoredIn(rows.map((r) => r.row)), 'the model'));
      return {
        request: { design, covariance: choices.covariance ?? 'auto', ...control },
        observations: rows.map(({ row, round }) => ({ ...label(row, true), round: round.label, time: round.dayOffset, value: row.value })),
        rows: rows.map(({ row, round }) => ({ ...row, roundLabel: round.label })),
        notices,
      };
    }
    case 'ancova': {
      const covariate = scene.covariate!;
      const used = single.filter((row) => covariate.values.has(row.plotLabel));
      const left = single.length - used.length;
      notices.push(`The covariate is ${covariate.label}: each plot's value is adjusted for its own baseline.`);
      if (left > 0) notices.push(`${plural(left, 'plot has', 'plots have')} no value of ${covariate.label} and ${left === 1 ? 'is' : 'are'} left out.`);
      notices.push(...atCutoff(censoredIn(used), 'the analysis'));
      const censoredBaselines = used.filter((row) => covariate.values.get(row.plotLabel)!.censored).length;
      if (censoredBaselines > 0) notices.push(`${plural(censoredBaselines, 'baseline', 'baselines')} not drained by the cut-off ${censoredBaselines === 1 ? 'enters' : 'enter'} at the cut-off value.`);
      return {
        request: {
          design,
          alpha: choices.alpha,
          ...(scene.combined ? { sitesAre: choices.sitesAre } : {}),
          ...control,
          transform: 'none',
          meanSeparation: [choices.method],
          forceLsd: choices.forceLsd,
        },
        observations: used.map((row) => ({ ...label(row), value: row.value, covariate: covariate.values.get(row.plotLabel)!.value })),
        rows: used.map((row) => ({ ...row, covariate: covariate.values.get(row.plotLabel)!.value })),
        notices,
      };
    }
  }
}
