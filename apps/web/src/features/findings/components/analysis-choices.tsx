import { ANALYSIS_TRANSFORMS, SEPARATION_METHODS, type AnalysisTransform, type SeparationMethod } from '@friable/contracts';
import type { ReactNode } from 'react';
import { LabelledSelect, type SelectOption } from '../../../components/labelled-select';
import { methodLabels, transformLabels } from './stat-format';

export interface AnalysisOptions {
  method: SeparationMethod;
  transform: AnalysisTransform;
  alpha: number;
  sitesAre: 'random' | 'fixed';
}

export const defaultAnalysisOptions: AnalysisOptions = { method: 'tukey', transform: 'none', alpha: 0.05, sitesAre: 'random' };

const ALPHAS = [0.01, 0.05, 0.1];

/** A labelled list of choices in the Findings bar. */
export function OptionChoice(props: { label: string; ariaLabel?: string; value: string | number; options: SelectOption[]; onChange: (value: string) => void }) {
  return <LabelledSelect className="fr-findings-choice" {...props} />;
}

/** The analysis choices every Findings view shares; `before` holds the page's own (measure, round, scope). */
export function AnalysisChoices({
  options,
  onChange,
  showSites,
  dunnettAllowed,
  before,
  after,
  showTransform = true,
  showSeparation = true,
}: {
  options: AnalysisOptions;
  onChange: (next: AnalysisOptions) => void;
  showSites: boolean;
  /** Dunnett needs a control treatment. */
  dunnettAllowed: boolean;
  before?: ReactNode;
  /** Choices of the model on screen, after the shared ones. */
  after?: ReactNode;
  /** The models other than the ANOVA take no transform, and some no mean separation. */
  showTransform?: boolean;
  showSeparation?: boolean;
}) {
  return (
    <div className="fr-findings-choices" role="group" aria-label="Analysis choices">
      {before}
      {showSites && (
        <OptionChoice
          label="Sites are"
          value={options.sitesAre}
          options={[
            { value: 'random', label: 'Random (a sample of gardens)' },
            { value: 'fixed', label: 'Fixed (only these gardens)' },
          ]}
          onChange={(value) => onChange({ ...options, sitesAre: value as 'random' | 'fixed' })}
        />
      )}
      {showTransform && (
        <OptionChoice
          label="Transform"
          value={options.transform}
          options={ANALYSIS_TRANSFORMS.map((t) => ({ value: t, label: transformLabels[t] }))}
          onChange={(value) => onChange({ ...options, transform: value as AnalysisTransform })}
        />
      )}
      {showSeparation && (
        <>
          <OptionChoice
            label="Mean separation"
            value={options.method}
            options={SEPARATION_METHODS.filter((m) => m !== 'dunnett' || dunnettAllowed).map((m) => ({ value: m, label: methodLabels[m] }))}
            onChange={(value) => onChange({ ...options, method: value as SeparationMethod })}
          />
          <OptionChoice label="α" ariaLabel="Significance level α" value={options.alpha} options={ALPHAS.map((a) => ({ value: a, label: String(a) }))} onChange={(value) => onChange({ ...options, alpha: Number(value) })} />
        </>
      )}
      {after}
    </div>
  );
}
