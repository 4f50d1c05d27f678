import { DEFAULT_ANALYSIS, FINDINGS_ANALYSES, type AnalysisOption, type FindingsAnalysis, type MeasureKind, type ModelChoice } from '@friable/contracts';

/** What the data of one measure, round and scope allow. */
export interface ModelFacts {
  measureName: string;
  kind: MeasureKind;
  unit: string;
  cutoff: number | null;
  /** Rounds holding values of the measure in the scope, up to the analysed one, in time order. */
  rounds: ReadonlyArray<{ label: string; dayOffset: number }>;
  /** Plots not drained by the cut-off at the analysed round. */
  censoredCount: number;
}

/** Friable's name of each analysis, as the model picker and saved analyses show it. */
export const ANALYSIS_LABELS: Record<FindingsAnalysis, string> = {
  censored: 'Not-drained curves and time ratios',
  repeated: 'Rounds over time',
  ancova: 'Adjusted for the baseline',
  ordinal: 'Score shares and odds',
  counts: 'Count rates',
  anova: 'Classical ANOVA',
};

/** The baseline the analysis of covariance takes by default: the day-0 round, else the earliest round before the analysed one. */
export function baselineRound<R extends { dayOffset: number }>(rounds: readonly R[]): R | null {
  const earlier = rounds.slice(0, -1);
  return earlier.find((r) => r.dayOffset === 0) ?? earlier[0] ?? null;
}

/** The model made for a measure: its kind first; a plain number by its rounds (a day-0 baseline and one later round, or several rounds). */
export function defaultAnalysis(facts: ModelFacts): FindingsAnalysis {
  const byKind = DEFAULT_ANALYSIS[facts.kind];
  if (byKind !== 'anova') return byKind;
  if (facts.rounds.length === 2 && facts.rounds[0]!.dayOffset === 0) return 'ancova';
  return facts.rounds.length >= 2 ? 'repeated' : 'anova';
}

function whyOf(analysis: FindingsAnalysis, facts: ModelFacts): string {
  const name = facts.measureName;
  const rounds = facts.rounds.map((r) => r.label).join(', ');
  switch (analysis) {
    case 'censored':
      return `${name} has a cut-off${facts.cutoff !== null ? ` of ${facts.cutoff} ${facts.unit}` : ''}: a plot not drained by then drains later, at a time nobody saw, so it is analysed as censored — curves of the share not yet drained, a log-rank test stratified by block and a time-ratio (accelerated-failure-time) model — rather than at the cut-off value, which would understate its time.`;
    case 'ordinal':
      return `${name} is a score on an ordered scale: the steps between scores need not be equal, so a proportional-odds model with blocks compares the shares of each score between treatments; the rank test stays beside it.`;
    case 'counts':
      return `${name} is a count per plot: counts spread more where they are larger, so a Poisson log-linear model with blocks compares rates between treatments, and a quasi-Poisson fit takes over when the counts spread more than Poisson allows.`;
    case 'repeated':
      return `${name} was measured on the same plots at ${facts.rounds.length} rounds (${rounds}): readings of one plot are not new replicates, so a mixed model with a within-plot covariance, chosen by AIC, tests treatment, round and their interaction, and treatment within each round.`;
    case 'ancova':
      return `${name} has a baseline round before the analysed one: adjusting each plot's later value for its own baseline (analysis of covariance) takes out differences between plots that were there before the treatments acted.`;
    case 'anova':
      return facts.kind === 'time-with-cutoff'
        ? `The classical ANOVA of the design, on the values as stored: a plot not drained by the cut-off enters at the cut-off value, which understates its time, so this is the biased fallback.`
        : `${name} is a measured number at ${facts.rounds.length === 1 ? 'one round' : 'this round'}: the classical ANOVA of the design.`;
  }
}

function optionOf(analysis: FindingsAnalysis, facts: ModelFacts, isDefault: boolean): AnalysisOption {
  const unavailable = (note: string): AnalysisOption => ({ analysis, label: ANALYSIS_LABELS[analysis], available: false, isDefault, note });
  const available = (note: string | null = null, label = ANALYSIS_LABELS[analysis]): AnalysisOption => ({ analysis, label, available: true, isDefault, note });
  switch (analysis) {
    case 'censored':
      return facts.kind === 'time-with-cutoff' ? available() : unavailable('Only for a time with a cut-off.');
    case 'ordinal':
      return facts.kind === 'score' ? available() : unavailable('Only for a score measure.');
    case 'counts':
      return facts.kind === 'count' ? available() : unavailable('Only for a count measure.');
    case 'repeated':
      return facts.rounds.length >= 2
        ? available(facts.kind === 'time-with-cutoff' ? 'Plots not drained by the cut-off enter at the cut-off value.' : facts.kind === 'score' ? 'Treats scores as measured numbers.' : null)
        : unavailable('Needs values of the measure at two or more rounds up to this one.');
    case 'ancova':
      return facts.rounds.length >= 2
        ? available(facts.kind === 'time-with-cutoff' ? 'Plots not drained by the cut-off enter at the cut-off value.' : null)
        : unavailable('Needs values of the measure at an earlier round, as the baseline.');
    case 'anova':
      return facts.kind === 'time-with-cutoff'
        ? available(
            facts.censoredCount > 0
              ? `Biased: ${facts.censoredCount} ${facts.censoredCount === 1 ? 'plot' : 'plots'} not drained by the cut-off enter at the cut-off value, which understates the time.`
              : 'Biased whenever a plot has not drained by the cut-off.',
            'ANOVA on cut-off values (biased fallback)',
          )
        : available();
  }
}

/**
 * Model choice — which analysis Findings shows for a measure, the one made for it, why (in plain words), and
 * every analysis on offer with whether these data allow it. Throws nothing: a requested analysis the data do not
 * allow comes back with `available: false` on its option, for the caller to refuse with its note.
 * Example: a drain time at two rounds, nothing asked → { analysis: 'censored', defaultAnalysis: 'censored', why: 'Drain time has a cut-off…' }
 */
export function chooseModel(facts: ModelFacts, requested?: FindingsAnalysis): ModelChoice {
  const defaultChoice = defaultAnalysis(facts);
  const analysis = requested ?? defaultChoice;
  const options = FINDINGS_ANALYSES.map((a) => optionOf(a, facts, a === defaultChoice));
  const sentence = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
  const why =
    analysis === defaultChoice
      ? sentence(whyOf(analysis, facts))
      : `${sentence(whyOf(analysis, facts))} The analysis made for this measure is ${ANALYSIS_LABELS[defaultChoice].toLowerCase()}: ${whyOf(defaultChoice, facts)}`;
  return { analysis, defaultAnalysis: defaultChoice, why, options };
}
