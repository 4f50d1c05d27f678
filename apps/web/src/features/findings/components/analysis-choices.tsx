import { HTMLSelect } from '@blueprintjs/core';
import { ANALYSIS_TRANSFORMS, SEPARATION_METHODS, type AnalysisTransform, type SeparationMethod } from '@friable/contracts';
import type { ReactNode } from 'react';
import { methodLabels, transformLabels } from './stat-format';

export interface AnalysisOptions {
  method: SeparationMethod;
  transform: AnalysisTransform;
  alpha: number;
  sitesAre: 'random' | 'fixed';
}

export const defaultAnalysisOptions: AnalysisOptions = { method: 'tukey', transform: 'none', alpha: 0.05, sitesAre: 'random' };

const ALPHAS = [0.01, 0.05, 0.1];

/** A labelled select in the choices bar. */
export function Choice({ label, children }: { label: string; children: ReactNode }) {
  return (
    <label className="fr-findings-choice">
      <span>{label}</span>
      {children}
    </label>
  );
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
        <Choice label="Sites are">
          <HTMLSelect aria-label="Sites are" value={options.sitesAre} onChange={(e) => onChange({ ...options, sitesAre: e.target.value as 'random' | 'fixed' })}>
            <option value="random">Random (a sample of gardens)</option>
            <option value="fixed">Fixed (only these gardens)</option>
          </HTMLSelect>
        </Choice>
      )}
      {showTransform && (
        <Choice label="Transform">
          <HTMLSelect aria-label="Transform" value={options.transform} onChange={(e) => onChange({ ...options, transform: e.target.value as AnalysisTransform })}>
            {ANALYSIS_TRANSFORMS.map((t) => (
              <option key={t} value={t}>
                {transformLabels[t]}
              </option>
            ))}
          </HTMLSelect>
        </Choice>
      )}
      {showSeparation && (
        <>
          <Choice label="Mean separation">
            <HTMLSelect aria-label="Mean separation" value={options.method} onChange={(e) => onChange({ ...options, method: e.target.value as SeparationMethod })}>
              {SEPARATION_METHODS.filter((m) => m !== 'dunnett' || dunnettAllowed).map((m) => (
                <option key={m} value={m}>
                  {methodLabels[m]}
                </option>
              ))}
            </HTMLSelect>
          </Choice>
          <Choice label="α">
            <HTMLSelect aria-label="Significance level α" value={options.alpha} onChange={(e) => onChange({ ...options, alpha: Number(e.target.value) })}>
              {ALPHAS.map((a) => (
                <option key={a} value={a}>
                  {a}
                </option>
              ))}
            </HTMLSelect>
          </Choice>
        </>
      )}
      {after}
    </div>
  );
}
