import { Button, InputGroup, Section, SectionCard } from '@blueprintjs/core';
import type { Factor, FactorsInput, TrialDetail } from '@friable/contracts';
import { useState } from 'react';
import { Field } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { usePutFactors } from '../api/put-factors';
import { conflictCurrent, type EditConflict } from '../../../lib/edit-conflict';
import { VersionConflict } from './version-conflict';

type FactorDraft = { name: string; levels: Array<{ code: string; name: string }> };

/** A factorial trial's two factors and their levels; the treatments are every combination. */
export function FactorsSection({ trial, canEdit }: { trial: TrialDetail; canEdit: boolean }) {
  const [editing, setEditing] = useState(false);
  const factors = [...trial.factors].sort((a, b) => a.position - b.position);
  return (
    <Section
      title="Factors"
      icon="grid"
      className="fr-section"
      rightElement={canEdit ? <Button icon="edit" size="small" text="Edit factors" onClick={() => setEditing(true)} /> : undefined}
    >
      <SectionCard>
        {factors.length === 0 ? (
          <p className="fr-muted">No factors yet. A factorial trial crosses two factors, e.g. amendment (none, gypsum) × mulch (bare, straw).</p>
        ) : (
          <dl className="fr-facts-list">
            {factors.map((factor) => (
              <FactorFacts key={factor.id} name={`${factor.position === 1 ? 'A' : 'B'}: ${factor.name}`} levels={factor.levels} />
            ))}
          </dl>
        )}
      </SectionCard>
      {editing && <FactorsDialog trial={trial} onClose={() => setEditing(false)} />}
    </Section>
  );
}

function FactorFacts({ name, levels }: { name: string; levels: Array<{ code: string; name: string }> }) {
  return (
    <>
      <dt>{name}</dt>
      <dd>{levels.map((level) => `${level.code} (${level.name})`).join(', ')}</dd>
    </>
  );
}

const emptyFactor = (): FactorDraft => ({ name: '', levels: [{ code: '', name: '' }, { code: '', name: '' }] });

function FactorsDialog({ trial, onClose }: { trial: TrialDetail; onClose: () => void }) {
  const put = usePutFactors(trial.id);
  const initial = [...trial.factors].sort((a, b) => a.position - b.position).map((f) => ({ name: f.name, levels: f.levels.map((l) => ({ code: l.code, name: l.name })) }));
  const [factors, setFactors] = useState<FactorDraft[]>([initial[0] ?? emptyFactor(), initial[1] ?? emptyFactor()]);

  function change(index: number, next: FactorDraft) {
    setFactors((all) => all.map((f, i) => (i === index ? next : f)));
  }
  const [conflict, setConflict] = useState<EditConflict<FactorsInput, FactorsInput> | null>(null);
  /** Each factor goes with the version of the factor stored at its place (`stored`: as read, or as a conflict answered). */
  function send(input: FactorsInput, stored: Array<{ version: number }>) {
    const versioned = { factors: input.factors.map((f, index) => (stored[index] ? { ...f, version: stored[index].version } : f)) };
    put.mutate(versioned, {
      onSuccess: onClose,
      onError: (error) => {
        const current = conflictCurrent<Factor[]>(error);
        if (!current) return;
        put.reset();
        setConflict({ mine: input, current: { factors: current } });
      },
    });
  }
  function submit() {
    const input: FactorsInput = {
      factors: factors.map((f) => ({ name: f.name.trim(), levels: f.levels.filter((l) => l.code.trim() || l.name.trim()).map((l) => ({ code: l.code.trim(), name: l.name.trim() })) })),
    };
    send(input, [...trial.factors].sort((a, b) => a.position - b.position));
  }

  return (
    <>
      <FormDialog title="Factors" icon="grid" wide onClose={onClose} onSubmit={submit} submitText="Save factors" pending={put.isPending} error={put.error} shownFields={['factors']}>
            <p className="fr-muted">Saving replaces the treatments with every combination of the levels; rates are then set per treatment.</p>
            {factors.map((factor, index) => (
              <fieldset key={index} className="fr-fieldset">
                <legend>Factor {index === 0 ? 'A' : 'B'}</legend>
                <Field label="Factor name" field={`factors.${index}.name`} error={put.error}>
                  <InputGroup id={`fr-field-factors.${index}.name`} value={factor.name} onChange={(e) => change(index, { ...factor, name: e.target.value })} />
                </Field>
                {factor.levels.map((level, levelIndex) => (
                  <div className="fr-form-row" key={levelIndex}>
                    <Field label={`Level ${levelIndex + 1} code`} field={`factors.${index}.levels.${levelIndex}.code`} error={put.error}>
                      <InputGroup
                        id={`fr-field-factors.${index}.levels.${levelIndex}.code`}
                        value={level.code}
                        onChange={(e) => change(index, { ...factor, levels: factor.levels.map((l, i) => (i === levelIndex ? { ...l, code: e.target.value } : l)) })}
                      />
                    </Field>
                    <Field label={`Level ${levelIndex + 1} name`} field={`factors.${index}.levels.${levelIndex}.name`} error={put.error}>
                      <InputGroup
                        id={`fr-field-factors.${index}.levels.${levelIndex}.name`}
                        value={level.name}
                        onChange={(e) => change(index, { ...factor, levels: factor.levels.map((l, i) => (i === levelIndex ? { ...l, name: e.target.value } : l)) })}
                      />
                    </Field>
                  </div>
                ))}
                <Button variant="minimal" icon="add" text="Add a level" onClick={() => change(index, { ...factor, levels: [...factor.levels, { code: '', name: '' }] })} />
              </fieldset>
            ))}
      </FormDialog>
      <VersionConflict
        what="the factors"
        conflict={conflict}
        onKeepMine={() => {
          if (!conflict) return;
          setConflict(null);
          send(conflict.mine, conflict.current.factors as Factor[]);
        }}
        onTakeStored={() => {
          setConflict(null);
          onClose();
        }}
      />
    </>
  );
}
