import type { ModelFindings, RepeatedAnswer } from '@friable/contracts';
import type { TreatmentStyle } from '../../../../lib/treatment-style';
import { SignificanceLegend } from '../anova-table';
import { formatMeasureValue, formatP, formatStatistic, inProtocolOrder, pClause } from '../stat-format';
import { LazyModelChart } from './lazy-model-chart';
import type { ModelChartSpec } from './model-chart-spec';
import { ModelSection, ModelTable, ModelWarnings, PCells, TreatmentCell, modelTermLabel } from './model-parts';

type RepeatedFindings = Extract<ModelFindings, { analysis: 'repeated' }>;

const STRUCTURE_WORDS: Record<RepeatedAnswer['covariance']['structure'], string> = {
  cs: 'compound symmetry (every pair of rounds equally alike)',
  ar1: 'first-order autoregressive in days (rounds further apart less alike)',
  unstructured: 'unstructured (each pair of rounds its own covariance)',
};

/** One site's (or the combined) rounds-over-time answer, for the means chart. */
export interface SiteRounds {
  site: string;
  answer: Pick<RepeatedAnswer, 'means' | 'rounds'>;
}

/** Treatment means per round with error bars (± 1 SE), one line per treatment. */
export function overTimeSpec(title: string, axis: string, answer: Pick<RepeatedAnswer, 'means' | 'rounds'>, names: Record<string, string>, order: string[]): ModelChartSpec {
  const day = new Map(answer.rounds.map((r) => [r.round, r.time]));
  const treatments = inProtocolOrder(
    [...new Set(answer.means.map((m) => m.treatment))].map((treatment) => ({ treatment })),
    order,
  ).map((t) => t.treatment);
  return {
    chart: 'over-time',
    title,
    axis,
    days: answer.rounds.map((r) => r.time),
    dayLabels: answer.rounds.map((r) => r.round),
    series: treatments.map((treatment) => ({
      treatment,
      name: names[treatment] ?? treatment,
      points: answer.means.filter((m) => m.treatment === treatment).map((m) => ({ round: m.round, day: day.get(m.round) ?? 0, mean: m.mean, se: m.se })),
    })),
  };
}

/** Rounds over time: the covariance chosen by AIC, Kenward–Roger tests, treatment within each round, means over time, the split plot in time. */
export function RepeatedView({ findings, names, styles, sites }: { findings: RepeatedFindings; names: Record<string, string>; styles: ReadonlyMap<string, TreatmentStyle>; sites: SiteRounds[] }) {
  const { context } = findings;
  const order = Object.keys(names);
  const { unit, decimals, name } = context.measure;
  const axis = unit ? `${name} (${unit})` : name;
  const roundsInOrder = findings.rounds.map((r) => r.round);
  const treatments = inProtocolOrder([...new Set(findings.means.map((m) => m.treatment))].map((treatment) => ({ treatment })), order).map((t) => t.treatment);
  const mean = (treatment: string, round: string) => findings.means.find((m) => m.treatment === treatment && m.round === round);
  return (
    <div className="fr-findings-view">
      <ModelSection id="fr-overtime-title" title="Means over time">
        <p className="fr-muted fr-small">Least-squares means of each treatment at each round; bars are ± 1 standard error.</p>
        <div className="fr-findings-plots">
          <LazyModelChart spec={overTimeSpec(context.scope.siteNames.length > 1 ? 'All sites combined' : context.scope.label, axis, findings, names, order)} styles={styles} />
          {sites.map((site) => (
            <LazyModelChart key={site.site} spec={overTimeSpec(site.site, axis, site.answer, names, order)} styles={styles} />
          ))}
        </div>
      </ModelSection>
      <div className="fr-findings-columns">
        <ModelSection id="fr-repeated-tests-title" title="Tests (Kenward–Roger)">
          <ModelTable label="Tests of treatment, round and their interaction" head={['Source', 'num df', 'den df', 'F', 'p', '']}>
            {findings.anova.map((row) => (
              <FTestRow key={row.term} name={modelTermLabel(row.term)} test={row} />
            ))}
          </ModelTable>
          <h4 className="fr-small">Treatment within each round</h4>
          <ModelTable label="Tests of treatment within each round" head={['Round', 'num df', 'den df', 'F', 'p', '']}>
            {findings.byRound.map((row) => (
              <FTestRow key={row.round} name={row.round} test={row} />
            ))}
          </ModelTable>
          <SignificanceLegend />
        </ModelSection>
        <ModelSection id="fr-covariance-title" title="Within-plot covariance">
          <p>
            Used: <strong>{STRUCTURE_WORDS[findings.covariance.structure]}</strong>.
          </p>
          <ModelTable label="Covariance structures compared" head={['Structure', 'log-likelihood (REML)', 'AIC']}>
            {findings.candidates.map((candidate) => (
              <tr key={candidate.structure} className={candidate.structure === findings.covariance.structure ? 'fr-findings-total' : undefined}>
                <th scope="row">{candidate.structure === 'cs' ? 'Compound symmetry' : candidate.structure === 'ar1' ? 'AR(1) in days' : 'Unstructured'}</th>
                {'unavailable' in candidate ? (
                  <td colSpan={2} className="fr-muted">
                    {candidate.unavailable}
                  </td>
                ) : (
                  <>
                    <td className="fr-num">{formatStatistic(candidate.logLik)}</td>
                    <td className="fr-num">{formatStatistic(candidate.aic)}</td>
                  </>
                )}
              </tr>
            ))}
          </ModelTable>
          <p className="fr-muted fr-small">The lower the AIC, the better the structure fits for its number of parameters.</p>
        </ModelSection>
      </div>
      <ModelSection id="fr-repeated-means-title" title="Means per round">
        <ModelTable label="Least-squares means per treatment and round" head={['Treatment', ...roundsInOrder]}>
          {treatments.map((treatment) => (
            <tr key={treatment}>
              <TreatmentCell code={treatment} names={names} />
              {roundsInOrder.map((round) => {
                const entry = mean(treatment, round);
                return (
                  <td key={round} className="fr-num">
                    {entry ? `${formatMeasureValue(entry.mean, decimals)} ± ${formatMeasureValue(entry.se, decimals)}` : '—'}
                  </td>
                );
              })}
            </tr>
          ))}
        </ModelTable>
      </ModelSection>
      {findings.splitPlot && (
        <ModelSection id="fr-splitplot-title" title="Split plot in time (classical)">
          <p className="fr-muted fr-small">
            On the {findings.splitPlot.plotsUsed} plots seen at every round{findings.splitPlot.plotsLeftOut > 0 ? ` (${findings.splitPlot.plotsLeftOut} left out)` : ''}.
            {findings.sphericity &&
              (findings.sphericity.mauchlyW === null
                ? ' With two rounds sphericity holds by itself.'
                : ` Mauchly's W = ${formatStatistic(findings.sphericity.mauchlyW)}, ${pClause(findings.sphericity.p)}; Greenhouse–Geisser ε = ${formatStatistic(findings.sphericity.greenhouseGeisser)}, Huynh–Feldt ε = ${formatStatistic(findings.sphericity.huynhFeldt)}.`)}
          </p>
          <ModelTable label="Split plot in time" head={['Source', 'df', 'SS', 'MS', 'F', 'p', 'p (G–G)', 'p (H–F)']}>
            {findings.splitPlot.table.map((row) => (
              <tr key={`${row.stratum}-${row.term}`}>
                <th scope="row">
                  {modelTermLabel(row.term)} <span className="fr-muted fr-small">({row.stratum})</span>
                </th>
                <td className="fr-num">{row.df}</td>
                <td className="fr-num">{formatStatistic(row.ss)}</td>
                <td className="fr-num">{formatStatistic(row.ms)}</td>
                <td className="fr-num">{formatStatistic(row.f)}</td>
                <td className="fr-num">{formatP(row.p)}</td>
                <td className="fr-num">{formatP(row.pGreenhouseGeisser)}</td>
                <td className="fr-num">{formatP(row.pHuynhFeldt)}</td>
              </tr>
            ))}
          </ModelTable>
        </ModelSection>
      )}
      <ModelWarnings warnings={findings.warnings} />
    </div>
  );
}

/** One F test as a row: what is tested, its numerator and denominator df, F and p with its mark. */
function FTestRow({ name, test }: { name: string; test: { numDf: number; denDf: number | null; f: number | null; p: number | null } }) {
  return (
    <tr>
      <th scope="row">{name}</th>
      <td className="fr-num">{test.numDf}</td>
      <td className="fr-num">{formatStatistic(test.denDf)}</td>
      <td className="fr-num">{formatStatistic(test.f)}</td>
      <PCells p={test.p} />
    </tr>
  );
}
