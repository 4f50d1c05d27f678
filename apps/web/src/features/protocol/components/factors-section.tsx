import { Button, Section, SectionCard } from '@blueprintjs/core';
import type { FactorLevel, TrialDetail } from '@friable/contracts';
import { DESIGN_RULES } from '@friable/field';
import { Fragment, useState } from 'react';
import { formatRate } from '../../../lib/format';
import { FactorsDialog } from './factors-dialog';
import { appliedToWords, factorRole, orderedFactors } from './factor-roles';

/** "C (Compost 2.5 cm dug in, 2.5 cm deep (layer))": a level with its rate when something is applied. */
function levelText(level: FactorLevel): string {
  const rate = level.rateValue !== null && level.rateUnit !== null ? `, ${formatRate(level.rateValue, level.rateUnit)}` : '';
  return `${level.code} (${level.name}${rate})`;
}

/** A factorial's or split plot's factors, where each is applied, and their levels; the treatments are every combination. */
export function FactorsSection({ trial, canEdit }: { trial: TrialDetail; canEdit: boolean }) {
  const [editing, setEditing] = useState(false);
  const factors = orderedFactors(trial.factors);
  const rule = DESIGN_RULES[trial.design];
  const example = rule.split
    ? 'A split plot puts the whole-plot factor on whole beds (e.g. compost: none, dug in) and the sub-plot factor on parts of each bed (e.g. mulch: bare, straw, woodchip).'
    : 'A factorial crosses two to four factors, e.g. amendment (none, gypsum) × mulch (bare, straw).';
  return (
    <Section
      title="Factors"
      icon="grid"
      className="fr-section"
      rightElement={canEdit ? <Button icon="edit" size="small" text="Edit factors" onClick={() => setEditing(true)} /> : undefined}
    >
      <SectionCard>
        {factors.length === 0 ? (
          <p className="fr-muted">No factors yet. {example}</p>
        ) : (
          <dl className="fr-facts-list" aria-label="Factors">
            {factors.map((factor, index) => (
              <Fragment key={factor.id}>
                <dt>
                  {factorRole(trial.design, index)}: {factor.name}
                </dt>
                <dd>
                  <span className="fr-muted">Applied {appliedToWords(factor.appliedTo)}.</span> {factor.levels.map(levelText).join(', ')}
                </dd>
              </Fragment>
            ))}
          </dl>
        )}
      </SectionCard>
      {editing && <FactorsDialog trial={trial} onClose={() => setEditing(false)} />}
    </Section>
  );
}
