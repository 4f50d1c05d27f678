import { Button, Callout } from '@blueprintjs/core';
import type { FindingsAnalysis, ModelChoice } from '@friable/contracts';

/**
 * Which analysis is on screen and why, in plain words, with every other analysis these data allow one click away
 * (the one made for the measure marked). The ANOVA of a time with a cut-off carries its caution.
 */
export function ModelPicker({ choice, onChoose, pending }: { choice: ModelChoice; onChoose: (analysis: FindingsAnalysis) => void; pending?: boolean }) {
  const shown = choice.options.find((o) => o.analysis === choice.analysis);
  return (
    <section className="fr-model-picker" aria-label="Which analysis">
      <div className="fr-model-picker__options" role="group" aria-label="Analysis">
        {choice.options
          .filter((option) => option.available)
          .map((option) => (
            <Button
              key={option.analysis}
              active={option.analysis === choice.analysis}
              aria-pressed={option.analysis === choice.analysis}
              intent={option.analysis === choice.analysis ? 'primary' : 'none'}
              disabled={pending}
              title={option.note ?? undefined}
              onClick={() => onChoose(option.analysis)}
              text={option.isDefault ? `${option.label} · made for this measure` : option.label}
            />
          ))}
      </div>
      <Callout intent="primary" icon="lightbulb" className="fr-model-picker__why" title="Why this analysis">
        {choice.why}
      </Callout>
      {shown?.note && (
        <Callout intent="warning" icon="warning-sign" className="fr-model-picker__note" role="note">
          {shown.note}
        </Callout>
      )}
    </section>
  );
}
