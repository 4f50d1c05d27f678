import { Button, InputGroup } from '@blueprintjs/core';
import { type Factor, type FactorLevel, type FactorLevelInput, type FactorsInput, type RateUnitId, type TrialDetail } from '@friable/contracts';
import { appliedUnit, DESIGN_RULES } from '@friable/field';
import { useState } from 'react';
import { NumberText } from '../../../components/number-text';
import { Field } from '../../../components/field-errors';
import { FormDialog } from '../../../components/form-dialog';
import { RateUnitSelect } from '../../../components/rate-unit-select';
import { numberInputText, parseNumberInput } from '../../../lib/format';
import { usePutFactors } from '../api/put-factors';
import { conflictCurrent, type EditConflict } from '../../../lib/edit-conflict';
import { VersionConflict } from './version-conflict';
import { appliedToWords, factorRole, orderedFactors } from './factor-roles';

/** A level as the form holds it: the rate as typed, and what else the level carried (product, purity…) kept as it was. */
type LevelDraft = { code: string; name: string; rateText: string; rateUnit: RateUnitId | ''; kept: Partial<FactorLevel> };
type FactorDraft = { name: string; levels: LevelDraft[] };

const emptyLevel = (): LevelDraft => ({ code: '', name: '', rateText: '', rateUnit: '', kept: {} });
const emptyFactor = (): FactorDraft => ({ name: '', levels: [emptyLevel(), emptyLevel()] });

function draftOf(level: FactorLevel): LevelDraft {
  const { id: _id, code, name, rateValue, rateUnit, ...kept } = level;
  return { code, name, rateText: numberInputText(rateValue), rateUnit: rateUnit ?? '', kept };
}

function levelInput(level: LevelDraft): FactorLevelInput {
  const rateValue = level.rateText.trim() === '' ? null : parseNumberInput(level.rateText);
  return { ...level.kept, code: level.code.trim(), name: level.name.trim(), rateValue, rateUnit: level.rateUnit === '' ? null : level.rateUnit };
}

const levelFields = ['code', 'name', 'rateValue', 'rateUnit'];

/**
 * The factors of a factorial (2 to 4) or a split plot (2, whole-plot factor first; 3 for a split-split
 * plot), each level with its code, name and the rate of what it applies. Saving makes the treatments
 * every combination of the levels; names and rates change in place when the codes stay.
 */
export function FactorsDialog({ trial, onClose }: { trial: TrialDetail; onClose: () => void }) {
  const put = usePutFactors(trial.id);
  const rule = DESIGN_RULES[trial.design];
  const initial = orderedFactors(trial.factors).map((f) => ({ name: f.name, levels: f.levels.map(draftOf) }));
  const [factors, setFactors] = useState<FactorDraft[]>(() => {
    const drafts = initial.slice(0, rule.maxFactors);
    while (drafts.length < rule.minFactors) drafts.push(emptyFactor());
    return drafts;
  });
  const shownFields = factors.flatMap((f, i) => [`factors.${i}.name`, ...f.levels.flatMap((_, j) => levelFields.map((key) => `factors.${i}.levels.${j}.${key}`))]);

  function change(index: number, next: FactorDraft) {
    setFactors((all) => all.map((f, i) => (i === index ? next : f)));
  }
  function changeLevel(index: number, levelIndex: number, next: Partial<LevelDraft>) {
    const factor = factors[index]!;
    change(index, { ...factor, levels: factor.levels.map((l, i) => (i === levelIndex ? { ...l, ...next } : l)) });
  }
  function submit() {
    const input: FactorsInput = {
      factors: factors.map((f) => ({ name: f.name.trim(), levels: f.levels.filter((l) => l.code.trim() || l.name.trim()).map(levelInput) })),
    };
    send(input, orderedFactors(trial.factors));
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

  return (
    <>
      <FormDialog title="Factors" icon="grid" wide onClose={onClose} onSubmit={submit} submitText="Save factors" pending={put.isPending} error={put.error} shownFields={shownFields}>
        <p className="fr-muted">
          {rule.split
            ? 'Give the factors from the largest unit down: the whole-plot factor goes on whole beds, the sub-plot factor on parts of each bed. '
            : ''}
          Saving makes the treatments every combination of the levels. A rate is the level’s own (leave it empty for nothing applied); the amounts are worked out per unit the factor goes on.
        </p>
        {factors.map((factor, index) => (
          <fieldset key={index} className="fr-fieldset">
            <legend>
              {factorRole(trial.design, index)} <span className="fr-muted fr-small">— applied {appliedToWords(appliedUnit(trial.design, index))}</span>
            </legend>
            <Field label="Factor name" field={`factors.${index}.name`} error={put.error}>
              <InputGroup id={`fr-field-factors.${index}.name`} value={factor.name} onChange={(e) => change(index, { ...factor, name: e.target.value })} />
            </Field>
            {factor.levels.map((level, levelIndex) => {
              const at = `factors.${index}.levels.${levelIndex}`;
              return (
                <div className="fr-form-row fr-level-row" key={levelIndex}>
                  <Field label={`Level ${levelIndex + 1} code`} field={`${at}.code`} error={put.error}>
                    <InputGroup id={`fr-field-${at}.code`} value={level.code} onChange={(e) => changeLevel(index, levelIndex, { code: e.target.value })} />
                  </Field>
                  <Field label={`Level ${levelIndex + 1} name`} field={`${at}.name`} error={put.error}>
                    <InputGroup id={`fr-field-${at}.name`} value={level.name} onChange={(e) => changeLevel(index, levelIndex, { name: e.target.value })} />
                  </Field>
                  <Field label={`Level ${levelIndex + 1} rate`} field={`${at}.rateValue`} error={put.error}>
                    <NumberText id={`fr-field-${at}.rateValue`} value={level.rateText} onChange={(text) => changeLevel(index, levelIndex, { rateText: text })} placeholder="none" />
                  </Field>
                  <Field label={`Level ${levelIndex + 1} rate unit`} field={`${at}.rateUnit`} error={put.error}>
                    <RateUnitSelect<RateUnitId | ''> id={`fr-field-${at}.rateUnit`} value={level.rateUnit} onChange={(unit) => changeLevel(index, levelIndex, { rateUnit: unit })} noneText="no rate" />
                  </Field>
                </div>
              );
            })}
            <div className="fr-inline-actions">
              <Button variant="minimal" icon="add" text="Add a level" onClick={() => change(index, { ...factor, levels: [...factor.levels, emptyLevel()] })} />
              {factor.levels.length > 2 && (
                <Button variant="minimal" icon="remove" text="Remove the last level" onClick={() => change(index, { ...factor, levels: factor.levels.slice(0, -1) })} />
              )}
            </div>
          </fieldset>
        ))}
        {rule.minFactors !== rule.maxFactors && (
          <div className="fr-inline-actions">
            {factors.length < rule.maxFactors && <Button icon="add" text="Add a factor" onClick={() => setFactors((all) => [...all, emptyFactor()])} />}
            {factors.length > rule.minFactors && <Button icon="remove" text="Remove the last factor" onClick={() => setFactors((all) => all.slice(0, -1))} />}
          </div>
        )}
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
