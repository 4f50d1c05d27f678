import { Callout } from '@blueprintjs/core';
import type { AnovaAnswer, PercentOfControl, SeparationMethod } from '@friable/contracts';
import { AnalysisCautions } from './analysis-cautions';
import { AnovaTable } from './anova-table';
import { ComparisonsTable } from './comparisons-table';
import { DesignAnalysisPanel } from './design-analysis-panel';
import { FindingsPlots } from './findings-plots';
import { MeansTable } from './means-table';
import type { FindingsPlotInputs } from './plot-inputs';
import { RankTestPanel, type RankTestResult } from './rank-test-panel';

export interface FindingsViewProps {
  answer: AnovaAnswer;
  method: SeparationMethod;
  alpha: number;
  control?: string;
  decimals: number;
  unit?: string;
  /** The measure's direction, for the comparisons' verdicts. */
  higherIsBetter?: boolean;
  treatmentNames?: Record<string, string>;
  percentOfControl?: PercentOfControl[];
  rankTest: { kind: 'friedman' | 'kruskal-wallis'; answer?: RankTestResult; error?: Error | string | null; pending?: boolean };
  /** Sentences the engine cannot know (censoring, missing values), shown before its own warnings. */
  notices?: string[];
  plots: FindingsPlotInputs;
}

/** The whole answer of one analysis: tables, the rank test, cautions and the plots (each drawn as it comes into view). */
export function FindingsView(props: FindingsViewProps) {
  const { answer, method, alpha, control, decimals, unit } = props;
  return (
    <div className="fr-findings-view">
      {props.notices && props.notices.length > 0 && (
        <Callout intent="primary" icon="info-sign" className="fr-findings-notices">
          <ul>
            {props.notices.map((notice) => (
              <li key={notice}>{notice}</li>
            ))}
          </ul>
        </Callout>
      )}
      <div className="fr-findings-columns">
        <AnovaTable answer={answer} decimals={decimals} unit={unit} />
        <RankTestPanel {...props.rankTest} />
      </div>
      <DesignAnalysisPanel answer={answer} method={method} decimals={decimals} />
      <MeansTable answer={answer} method={method} control={control} decimals={decimals} unit={unit} treatmentNames={props.treatmentNames} percentOfControl={props.percentOfControl} />
      <ComparisonsTable answer={answer} method={method} alpha={alpha} decimals={decimals} higherIsBetter={props.higherIsBetter} />
      <AnalysisCautions answer={answer} />
      <section className="fr-findings-block" aria-labelledby="fr-plots-title">
        <h3 id="fr-plots-title" className="fr-findings-heading">
          Plots
        </h3>
        <FindingsPlots answer={answer} method={method} {...props.plots} treatmentOrder={props.treatmentNames ? Object.keys(props.treatmentNames) : undefined} control={control} />
      </section>
    </div>
  );
}
