import { Callout } from '@blueprintjs/core';
import type { AnovaAnswer } from '@friable/contracts';
import { formatStatistic, pClause } from './stat-format';

/** The answer's warnings in words, then the checks of the model's assumptions. */
export function AnalysisCautions({ answer }: { answer: AnovaAnswer }) {
  const { shapiroWilk, brownForsythe, bartlett, residuals } = answer.diagnostics;
  const flagged = residuals.filter((r) => r.flagged).length;
  return (
    <section className="fr-findings-block" aria-labelledby="fr-cautions-title">
      <h3 id="fr-cautions-title" className="fr-findings-heading">
        Cautions and checks
      </h3>
      {answer.warnings.length > 0 ? (
        <Callout intent="warning" icon="warning-sign" className="fr-findings-warnings">
          <ul>
            {answer.warnings.map((warning) => (
              <li key={warning}>{warning}</li>
            ))}
          </ul>
        </Callout>
      ) : (
        <p className="fr-muted">The analysis raised no cautions.</p>
      )}
      <ul className="fr-findings-checks">
        <li>
          Normality of the residuals (Shapiro–Wilk):{' '}
          {shapiroWilk ? `W = ${formatStatistic(shapiroWilk.w)}, ${pClause(shapiroWilk.p)}${shapiroWilk.p < 0.05 ? ' — the residuals look far from normal.' : '.'}` : 'not computed.'}
        </li>
        <li>
          Equal spread across treatments (Brown–Forsythe):{' '}
          {brownForsythe ? `F = ${formatStatistic(brownForsythe.f)}, ${pClause(brownForsythe.p)}${brownForsythe.p < 0.05 ? ' — the spread differs between treatments.' : '.'}` : 'not computed (a treatment has a single plot).'}
        </li>
        {bartlett && (
          <li>
            Equal error variance across sites (Bartlett): K² = {formatStatistic(bartlett.statistic)}, {pClause(bartlett.p)}.
          </li>
        )}
        <li>{flagged === 0 ? 'No residual lies more than 3 standard errors from its fitted value.' : `${flagged} residual${flagged === 1 ? ' lies' : 's lie'} more than 3 standard errors from the fitted value: check those plots.`}</li>
      </ul>
    </section>
  );
}
