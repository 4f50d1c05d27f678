import { Button, Callout, Checkbox, ProgressBar, Section, SectionCard } from '@blueprintjs/core';
import type { IntakeResult, Measure, TrialDetail } from '@friable/contracts';
import { useMemo, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { IdPicker } from '../../../components/id-picker';
import { SafetyCautions } from '../../../components/safety-cautions';
import { paths } from '../../../config/paths';
import { formatDate, formatNumber } from '../../../lib/format';
import { IntakeRefusedError, useSubmitIntake, type ColumnChoice } from '../api/submit-intake';
import { ColumnMapping } from './column-mapping';
import { CsvDropZone } from './csv-drop-zone';
import { guessColumns, mappingOverrides } from './guess-columns';
import { intakeAccess } from './intake-access';
import { IntakeChanges } from './intake-changes';
import { IntakeProblems } from './intake-problems';
import { readFileText, readPreview, type CsvPreview } from './read-preview';

interface ChosenFile {
  file: File;
  preview: CsvPreview;
  guessed: ColumnChoice[];
}

/** Intake: pick site and round, drop a CSV, check the preview and columns, try it (dry run), then save it. */
export function IntakePage({ trial }: { trial: TrialDetail }) {
  const access = intakeAccess(trial);
  const [params, setParams] = useSearchParams();
  const rounds = useMemo(() => [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset), [trial.rounds]);
  const site = access.sites.find((s) => s.id === Number(params.get('site'))) ?? access.sites[0];
  const round = rounds.find((r) => r.id === Number(params.get('round'))) ?? rounds[0];

  const [chosen, setChosen] = useState<ChosenFile | null>(null);
  const [choices, setChoices] = useState<ColumnChoice[]>([]);
  const [acceptWarnings, setAcceptWarnings] = useState(false);
  const [progress, setProgress] = useState<number | null>(null);
  const [checked, setChecked] = useState<IntakeResult | null>(null);
  const [saved, setSaved] = useState<IntakeResult | null>(null);
  const submit = useSubmitIntake(trial.id);
  const measures = measuresOf(round?.id);

  function startOver() {
    setChecked(null);
    setSaved(null);
    setAcceptWarnings(false);
    setProgress(null);
    submit.reset();
  }

  function measuresOf(roundId: number | undefined): Measure[] {
    const ids = rounds.find((r) => r.id === roundId)?.measureIds ?? [];
    return trial.measures.filter((m) => ids.includes(m.id));
  }

  function pick(next: { site?: number; round?: number }) {
    setParams({ site: String(next.site ?? site?.id ?? ''), round: String(next.round ?? round?.id ?? '') }, { replace: true });
    startOver();
    if (chosen) {
      const guessed = guessColumns(chosen.preview.headers, measuresOf(next.round ?? round?.id));
      setChosen({ ...chosen, guessed });
      setChoices(guessed);
    }
  }

  async function chooseFile(file: File) {
    const preview = readPreview(await readFileText(file));
    const guessed = guessColumns(preview.headers, measures);
    setChosen({ file, preview, guessed });
    setChoices(guessed);
    startOver();
  }

  function send(dryRun: boolean) {
    if (!chosen || !site || !round) return;
    setProgress(0);
    submit.mutate(
      {
        trialId: trial.id,
        siteId: site.id,
        roundId: round.id,
        file: chosen.file,
        mapping: mappingOverrides(chosen.preview.headers, chosen.guessed, choices),
        acceptWarnings,
        dryRun,
        onProgress: setProgress,
      },
      {
        onSuccess: (result) => (result.dryRun ? setChecked(result) : setSaved(result)),
        onSettled: () => setProgress(null),
      },
    );
  }

  if (access.reason) {
    return (
      <div className="fr-intake">
        <Callout icon={trial.status === 'locked' ? 'lock' : 'eye-open'} intent={trial.status === 'locked' ? 'warning' : 'none'} className="fr-readonly-notice">
          {access.reason}
        </Callout>
      </div>
    );
  }
  if (!round) return <Callout icon="calendar">The protocol has no assessment rounds yet, so there is nothing to upload.</Callout>;

  const problems = submit.error instanceof IntakeRefusedError ? submit.error.problems : [];
  const problemRows = new Set(problems.flatMap((problem) => (problem.row === null ? [] : [problem.row])));
  const warnings = checked?.warnings ?? [];
  const otherError = submit.error && !(submit.error instanceof IntakeRefusedError) ? submit.error : null;

  return (
    <div className={chosen && site?.randomizedAt ? 'fr-intake fr-intake--previewing' : 'fr-intake'}>
      <div className="fr-intake__main">
        <div className="fr-intake__bar">
          <IdPicker label="Site" value={site?.id} options={access.sites.map((s) => ({ id: s.id, text: s.name }))} onPick={(id) => pick({ site: id })} />
          <IdPicker
            label="Round"
            value={round.id}
            options={rounds.map((r) => ({ id: r.id, text: `${r.label}${r.dueDate ? ` (due ${formatDate(r.dueDate)})` : ''}` }))}
            onPick={(id) => pick({ round: id })}
          />
        </div>

        {site && !site.randomizedAt ? (
          <Callout icon="random" intent="primary">
            {site.name} is not randomized yet; once its plot plan exists, its data can be uploaded here.
          </Callout>
        ) : (
          <Section title="Upload a CSV file" icon="cloud-upload" className="fr-section" subtitle={`${site?.name} · ${round.label}`}>
            <SectionCard>
              <p className="fr-muted">
                The CSV template on the <Link to={paths.trialPlotPlan.href(trial.id, site?.id)}>Plot plan</Link> has every plot of the site and a column per measure;
                your own file works too when its headings name the plot label and the measures. Write “NA” for a missing value (and why, in the missing reason
                column) and “&gt;600” for a drain that had not finished by the cut-off.
              </p>
              <CsvDropZone onFile={chooseFile} disabled={submit.isPending} />
              {chosen && (
                <p className="fr-intake__file">
                  <strong>{chosen.file.name}</strong> · {formatNumber(chosen.preview.rows.length, 0)} rows · {formatNumber(chosen.preview.headers.length, 0)} columns
                </p>
              )}
              {chosen?.preview.problem && (
                <Callout intent="warning" compact icon="warning-sign">
                  {chosen.preview.problem}
                </Callout>
              )}
            </SectionCard>
          </Section>
        )}

        {chosen && site?.randomizedAt && (
          <Section title="Preview and columns" icon="th" className="fr-section" subtitle="Check what each column holds; change it where the guess is wrong">
            <SectionCard>
              <ColumnMapping
                preview={chosen.preview}
                measures={measures}
                choices={choices}
                problemRows={problemRows}
                disabled={submit.isPending}
                onChoose={(index, choice) => {
                  setChoices((before) => before.map((c, i) => (i === index ? choice : c)));
                  startOver();
                }}
              />
              <div className="fr-intake__actions">
                <Button icon="search-template" text={checked ? 'Check again' : 'Check the file'} onClick={() => send(true)} loading={submit.isPending && !checked} disabled={submit.isPending} />
                {progress !== null && (
                  <div className="fr-intake__progress" role="progressbar" aria-label="Upload progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(progress * 100)}>
                    <ProgressBar value={progress} intent="primary" stripes={progress < 1} />
                    <span className="fr-small fr-muted">{progress < 1 ? `Sending… ${formatNumber(progress * 100, 0)}%` : 'Sent; the server is checking every row…'}</span>
                  </div>
                )}
              </div>
            </SectionCard>
          </Section>
        )}

        {problems.length > 0 && (
          <Callout intent="danger" icon="error" title="Nothing was saved: the file has problems" className="fr-intake__problems" role="alert">
            <p>{submit.error?.message} Fix these in the file and choose it again; the rows are marked in the preview.</p>
            <IntakeProblems problems={problems} caption="Problems in the file" />
          </Callout>
        )}
        {otherError && (
          <Callout intent="danger" icon="error" role="alert">
            {otherError.message}
          </Callout>
        )}

        {checked && !saved && (
          <Section title="What this upload would do" icon="changes" className="fr-section">
            <SectionCard>
              {checked.identicalToPrevious ? (
                <Callout icon="tick" intent="success">
                  This file is byte for byte the one uploaded last time for this site and round: nothing would change.
                </Callout>
              ) : (
                <IntakeChanges result={checked} />
              )}
              {warnings.length > 0 && (
                <Callout intent="warning" icon="warning-sign" title={`${formatNumber(warnings.length, 0)} values look unusual`} className="fr-gap">
                  <IntakeProblems problems={warnings} caption="Warnings about the file" />
                  <Checkbox checked={acceptWarnings} onChange={(event) => setAcceptWarnings(event.currentTarget.checked)} label="I have checked these values against the field sheets and they are right." />
                </Callout>
              )}
              <div className="fr-intake__actions">
                <Button
                  intent="primary"
                  icon="floppy-disk"
                  text="Save these values"
                  disabled={submit.isPending || (warnings.length > 0 && !acceptWarnings) || checked.identicalToPrevious}
                  loading={submit.isPending}
                  onClick={() => send(false)}
                />
              </div>
            </SectionCard>
          </Section>
        )}

        {saved && (
          <Callout intent="success" icon="tick-circle" title="Saved" role="status" className="fr-gap">
            <p>{saved.message}</p>
            <IntakeChanges result={saved} />
            <Link to={paths.trialLedger.href(trial.id, site?.id, round.id)}>Open these values in the Ledger</Link>
          </Callout>
        )}
      </div>
      <aside className="fr-intake__side">
        <SafetyCautions title="While you measure" />
      </aside>
    </div>
  );
}
