import { Button, Section, SectionCard } from '@blueprintjs/core';
import type { FactorLevel, LevelAmount, TrialDetail } from '@friable/contracts';
import { DESIGN_RULES } from '@friable/field';
import { Fragment, useState } from 'react';
import { formatDoseShort, formatRate } from '../../../lib/format';
import { useLevelAmounts } from '../../../lib/api/get-level-amounts';
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
  const amounts = useLevelAmounts(trial.id, factors.length > 0 && trial.sites.length > 0);
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
                  {trial.sites.length > 0 && <LevelSiteAmounts trial={trial} levels={factor.levels} amounts={amounts.data} />}
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

/** Each applied level's amount per unit at every site: "C at Cinder Path Beds: 90 L (23.8 gal) per whole plot". */
function LevelSiteAmounts({ trial, levels, amounts }: { trial: TrialDetail; levels: FactorLevel[]; amounts: LevelAmount[] | undefined }) {
  const applied = levels.filter((level) => level.rateValue !== null && level.rateUnit !== null);
  if (applied.length === 0 || !amounts) return null;
  return (
    <ul className="fr-site-amounts">
      {applied.flatMap((level) =>
        trial.sites.map((site) => {
          const amount = amounts.find((a) => a.siteId === site.id && a.levelId === level.id);
          return (
            <li key={`${level.id}-${site.id}`}>
              <span className="fr-code">{level.code}</span> <span className="fr-muted">at {site.name}:</span>{' '}
              {amount?.problem ?? (amount ? `${formatDoseShort(amount.perUnit)} per ${amount.appliedTo}` : '—')}
            </li>
          );
        }),
      )}
    </ul>
  );
}
