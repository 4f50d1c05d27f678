import { HTMLTable } from '@blueprintjs/core';
import type { AnovaAnswer, LetterMethod, SeparationMethod, SliceTest } from '@friable/contracts';
import { formatMeasureValue, formatP, formatStatistic, significanceMark, termLabel } from './stat-format';
import { FindingsTable, numeric } from './findings-table';
import { TestCells, TestHeadings } from './test-cells';

type DesignAnswer = Pick<AnovaAnswer, 'anova' | 'model' | 'strata' | 'differences' | 'slices' | 'varianceComponents'>;

const STRATUM_ERRORS: Record<string, string> = { plot: 'Error', 'whole plot': 'Whole-plot error', 'sub plot': 'Sub-plot error', 'sub-sub plot': 'Sub-sub-plot error' };

/** The error a term is tested against as people read it: "Whole-plot error", "Site × Mulch", "Mixed model (Kenward–Roger)". */
function errorLabel(errorTerm: string | null | undefined, strata: DesignAnswer['strata']): string {
  if (!errorTerm) return '—';
  if (errorTerm === 'kenward-roger') return 'Mixed model (Kenward–Roger)';
  const stratum = strata?.find((s) => s.errorTerm === errorTerm);
  return stratum ? (STRATUM_ERRORS[stratum.stratum] ?? termLabel(errorTerm)) : termLabel(errorTerm);
}

function ModelLine({ answer }: { answer: DesignAnswer }) {
  if (!answer.model) return null;
  const name = answer.model.kind === 'reml' ? 'Mixed model by REML, Kenward–Roger degrees of freedom' : 'Classical analysis of variance';
  return (
    <p className="fr-findings-model">
      <strong>{name}.</strong> {answer.model.reason}
    </p>
  );
}

function TestedAgainst({ answer }: { answer: DesignAnswer }) {
  const tested = answer.anova.filter((row) => row.errorTerm && row.f !== null);
  return (
    <FindingsTable label="Each term and the error it is tested against" columns={['Source', 'Tested against', numeric('df')]} extraHeads={<TestHeadings />}>
      {tested.map((row) => (
        <tr key={row.term}>
          <th scope="row">{termLabel(row.term)}</th>
          <td>{errorLabel(row.errorTerm, answer.strata)}</td>
          <td className="fr-num">{row.denDf !== undefined ? `${row.numDf ?? row.df}, ${formatStatistic(row.denDf)}` : row.df}</td>
          <TestCells f={row.f} p={row.p} />
        </tr>
      ))}
    </FindingsTable>
  );
}

function StrataTable({ strata }: { strata: NonNullable<DesignAnswer['strata']> }) {
  return (
    <FindingsTable label="Error strata" columns={['Stratum', 'Error', numeric('df'), numeric('MS'), 'Terms tested in it']}>
      {strata.map((stratum) => (
        <tr key={stratum.errorTerm}>
          <th scope="row">{stratum.stratum}</th>
          <td>{STRATUM_ERRORS[stratum.stratum] ?? termLabel(stratum.errorTerm)}</td>
          <td className="fr-num">{stratum.df}</td>
          <td className="fr-num">{formatStatistic(stratum.ms)}</td>
          <td>{stratum.terms.map(termLabel).join(', ')}</td>
        </tr>
      ))}
    </FindingsTable>
  );
}

/** The standard errors of a difference per stratum; the LSD column only when the LSD is the chosen method. */
function DifferencesTable({ differences, decimals, showLsd }: { differences: NonNullable<DesignAnswer['differences']>; decimals: number; showLsd: boolean }) {
  return (
    <FindingsTable label="Standard errors of a difference" columns={['Difference between', numeric('SE of difference'), numeric('df'), numeric('t'), ...(showLsd ? [numeric('LSD')] : []), 'Error']}>
      {differences.map((d) => (
        <tr key={d.kind}>
          <th scope="row">{d.description}</th>
          <td className="fr-num">{formatMeasureValue(d.se, decimals)}</td>
          <td className="fr-num">{formatStatistic(d.df)}</td>
          <td className="fr-num">{formatStatistic(d.critical)}</td>
          {showLsd && <td className="fr-num">{formatMeasureValue(d.lsd, decimals)}</td>}
          <td>{d.errorTerm.includes('(Satterthwaite)') ? 'mixed strata: weighted t, Satterthwaite df' : errorLabel(d.errorTerm, undefined)}</td>
        </tr>
      ))}
    </FindingsTable>
  );
}

function SliceBlock({ slice, method, decimals }: { slice: SliceTest; method: SeparationMethod; decimals: number }) {
  const letters = method === 'dunnett' ? undefined : slice.letters[method as LetterMethod];
  const caption = `${termLabel(slice.factor)} within ${termLabel(slice.within)} ${slice.level}`;
  return (
    <div className="fr-findings-slice">
      <p>
        <strong>{caption}</strong>: F = {formatStatistic(slice.f)} on {slice.numDf} and {formatStatistic(slice.denDf)} df, p {formatP(slice.p)} {significanceMark(slice.p)}
      </p>
      <HTMLTable compact className="fr-findings-table" aria-label={caption}>
        <thead>
          <tr>
            <th scope="col">{termLabel(slice.factor)}</th>
            <th scope="col" className="fr-num">Mean</th>
            <th scope="col" className="fr-num">SE</th>
            <th scope="col">Group</th>
          </tr>
        </thead>
        <tbody>
          {slice.means.map((mean) => (
            <tr key={mean.treatment}>
              <th scope="row">{mean.treatment}</th>
              <td className="fr-num">{formatMeasureValue(mean.mean, decimals)}</td>
              <td className="fr-num">{formatMeasureValue(mean.se, decimals)}</td>
              <td>{letters?.[mean.treatment] ?? '—'}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}

/**
 * Factorials and split plots on Findings: which model answered and why, the error each term is tested against,
 * the error strata, the standard errors of a difference by kind and, for significant two-factor interactions,
 * each factor within each level of the other with its groups. Shows nothing for one-factor designs.
 */
export function DesignAnalysisPanel({ answer, method, decimals }: { answer: DesignAnswer; method: SeparationMethod; decimals: number }) {
  if (!answer.model) return null;
  return (
    <section className="fr-findings-block" aria-labelledby="fr-design-title">
      <h3 id="fr-design-title" className="fr-findings-heading">
        Factors and error strata
      </h3>
      <ModelLine answer={answer} />
      <TestedAgainst answer={answer} />
      {answer.strata && answer.strata.length > 0 && (
        <>
          <h4 className="fr-findings-subheading">Error strata</h4>
          <StrataTable strata={answer.strata} />
        </>
      )}
      {answer.differences && answer.differences.length > 0 && (
        <>
          <h4 className="fr-findings-subheading">Standard errors of a difference</h4>
          <DifferencesTable differences={answer.differences} decimals={decimals} showLsd={method === 'lsd'} />
        </>
      )}
      {answer.slices && answer.slices.length > 0 && (
        <>
          <h4 className="fr-findings-subheading">One factor within each level of another</h4>
          <p className="fr-small">Shown because their interaction is significant; groups compare the means inside each line only.</p>
          {answer.slices.map((slice) => (
            <SliceBlock key={`${slice.factor}|${slice.within}|${slice.level}`} slice={slice} method={method} decimals={decimals} />
          ))}
        </>
      )}
      {answer.varianceComponents && (
        <p className="fr-small">
          Variance components: {answer.varianceComponents.map((c) => `${termLabel(c.name)} ${formatStatistic(c.variance)}`).join('; ')}.
        </p>
      )}
    </section>
  );
}
