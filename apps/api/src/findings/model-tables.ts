import type { ModelFindings, ReportTable } from '@friable/contracts';

type Cell = string | number | null;
const table = (title: string, columns: string[], rows: Cell[][]): ReportTable => ({ title, columns, rows });

/** An answer of one analysis kind. */
type Of<A extends ModelFindings['analysis']> = Extract<ModelFindings, { analysis: A }>;

function censoredTables(answer: Of<'censored'>): ReportTable[] {
  return [
    table('Log-rank test (stratified by block)', ['χ²', 'df', 'p', 'strata'], [[answer.logRank.chiSquare, answer.logRank.df, answer.logRank.p, answer.logRank.strata]]),
    table(`Time-ratio model (${answer.distribution}): each term dropped`, ['term', 'df', 'χ²', 'p'], answer.tests.map((t) => [t.term, t.df, t.chiSquare, t.p])),
    table(`Time ratios to ${answer.control} (${answer.adjustment})`, ['treatment', 'ratio', 'lower 95 %', 'upper 95 %', 'p'], answer.timeRatios.map((r) => [r.treatment, r.ratio, r.lower, r.upper, r.p])),
    table('Median drain time (null: not reached)', ['treatment', 'median', 'lower 95 %', 'upper 95 %'], answer.medians.map((m) => [m.treatment, m.median, m.lower, m.upper])),
  ];
}

function repeatedTables(answer: Of<'repeated'>): ReportTable[] {
  const tables = [
    table('Within-plot covariance', ['structure', 'log-likelihood (REML)', 'AIC'], [[answer.covariance.structure, answer.covariance.logLik, answer.covariance.aic]]),
    table('Tests (Kenward–Roger)', ['term', 'num df', 'den df', 'F', 'p'], answer.anova.map((r) => [r.term, r.numDf, r.denDf, r.f, r.p])),
    table('Treatment within each round', ['round', 'num df', 'den df', 'F', 'p'], answer.byRound.map((r) => [r.round, r.numDf, r.denDf, r.f, r.p])),
    table('Least-squares means per round', ['treatment', 'round', 'mean', 'SE'], answer.means.map((m) => [m.treatment, m.round, m.mean, m.se])),
  ];
  if (answer.sphericity) {
    const s = answer.sphericity;
    tables.push(table('Sphericity (split plot in time)', ['Mauchly W', 'p', 'Greenhouse–Geisser ε', 'Huynh–Feldt ε'], [[s.mauchlyW, s.p, s.greenhouseGeisser, s.huynhFeldt]]));
  }
  return tables;
}

function ancovaTables(answer: Of<'ancova'>): ReportTable[] {
  const tables = [
    table('Analysis of covariance', ['term', 'df', 'SS', 'MS', 'F', 'p'], answer.anova.map((r) => [r.term, r.df, r.ss, r.ms, r.f, r.p])),
    table('Means adjusted for the baseline', ['treatment', 'n', 'adjusted mean', 'SE'], answer.means.map((m) => [m.treatment, m.n, m.mean, m.se])),
  ];
  const checks: Cell[][] = [];
  if (answer.slopes) checks.push(['equal slopes across treatments', answer.slopes.f, answer.slopes.df1, answer.slopes.df2, answer.slopes.p]);
  if (answer.baseline) checks.push(['baseline between treatments', answer.baseline.f, answer.baseline.df1, answer.baseline.df2, answer.baseline.p]);
  if (checks.length) tables.push(table('Checks of the covariate', ['test', 'F', 'df1', 'df2', 'p'], checks));
  return tables;
}

function ordinalTables(answer: Of<'ordinal'>): ReportTable[] {
  return [
    table('Proportional-odds model: likelihood-ratio tests', ['term', 'df', 'χ²', 'p'], answer.tests.map((t) => [t.term, t.df, t.chiSquare, t.p])),
    table(`Odds of a higher score than ${answer.control} (${answer.adjustment})`, ['treatment', 'odds ratio', 'lower 95 %', 'upper 95 %', 'p'], answer.oddsRatios.map((r) => [r.treatment, r.ratio, r.lower, r.upper, r.p])),
    table('Predicted share of plots in each score', ['treatment', 'score', 'share', 'SE'], answer.probabilities.map((p) => [p.treatment, p.category, p.probability, p.se])),
    table(`Rank test (${answer.rankTest.test})`, ['statistic', 'df', 'p'], [[answer.rankTest.statistic, answer.rankTest.df, answer.rankTest.p]]),
  ];
}

function countsTables(answer: Of<'counts'>): ReportTable[] {
  const o = answer.overdispersion;
  return [
    table('Overdispersion (Pearson)', ['χ²', 'df', 'p', 'family used', 'dispersion'], [[o.pearsonChiSquare, o.df, o.p, answer.family, answer.dispersion]]),
    table('Each term dropped', ['term', 'df', 'deviance', 'χ²', 'F', 'den df', 'p'], answer.tests.map((t) => [t.term, t.df, t.deviance, t.chiSquare, t.f, t.denDf, t.p])),
    table(`Rate ratios to ${answer.control} (${answer.adjustment})`, ['treatment', 'ratio', 'lower 95 %', 'upper 95 %', 'p'], answer.rateRatios.map((r) => [r.treatment, r.ratio, r.lower, r.upper, r.p])),
    table('Counts per plot', ['treatment', 'rate', 'lower 95 %', 'upper 95 %'], answer.rates.map((r) => [r.treatment, r.rate, r.lower, r.upper])),
  ];
}

/**
 * Model tables — the numbers of a model's answer as titled tables (the printable report and the workbook), in the
 * answer's own values, unrounded, so what is printed is what Findings showed.
 * Throws: nothing.
 * Example: modelTables(countsFindings)[2] → { title: 'Rate ratios to C (…)', columns: ['treatment', 'ratio', …], rows: [['G', 1.4, …], …] }
 */
export function modelTables(answer: ModelFindings): ReportTable[] {
  switch (answer.analysis) {
    case 'censored':
      return censoredTables(answer);
    case 'repeated':
      return repeatedTables(answer);
    case 'ancova':
      return ancovaTables(answer);
    case 'ordinal':
      return ordinalTables(answer);
    case 'counts':
      return countsTables(answer);
  }
}
