import { Button, Callout, FormGroup, ProgressBar, Section, SectionCard } from '@blueprintjs/core';
import type { IntakeResult, Measure, TrialDetail } from '@friable/contracts';
import { useMemo, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { IdPicker } from '../../../components/id-picker';
import { MissingReasonInput } from '../../../components/missing-reason-input';
import { SafetyCautions } from '../../../components/safety-cautions';
import { paths } from '../../../config/paths';
import { formatDate, formatNumber } from '../../../lib/format';
import { useRememberedColumns } from '../api/get-intake-columns';
import { IntakeRefusedError, newTicket, useSubmitIntake, type ColumnChoice } from '../api/submit-intake';
import { ColumnMapping } from './column-mapping';
import { CheckResult } from './check-result';
import { guessColumns, mappingOverrides } from './guess-columns';
import { intakeAccess } from './intake-access';
import { ImportProgress } from './import-progress';
import { IntakeChanges } from './intake-changes';
import { isWorkbook, UploadSection, type ChosenWorkbook } from './upload-section';
import { useFollowedImports } from '../hooks/use-followed-imports';
import { IntakeProblems } from './intake-problems';
import { readFileText, readPreview, type CsvPreview } from './read-preview';
import { openWorkbook, workbookSheets, WORKBOOK_PREVIEW_MAX_BYTES, type OpenedWorkbook } from './read-workbook';

/** The head of a file the browser reads for the preview; the whole file goes to the server, which reads it as a stream. */
const PREVIEW_BYTES = 512 * 1024;

interface ChosenFile {
  file: File;
  preview: CsvPreview;
  guessed: ColumnChoice[];
  /** Only the file's head was read for the preview (its rows are not all counted). */
  partial: boolean;
  /** A workbook: its sheets and the one chosen; opened whole (with the sheet's preview) when it is small enough. */
  workbook: ChosenWorkbook | null;
}

/**
 * Intake: pick site and round, drop a CSV file or workbook, check the preview and columns, try it (dry
 * run), then save it. While the server works on it, its stages are shown with their counts; uploads
 * already running for the site and round (sent before a reload, or by someone else) are followed too.
 */
export function IntakePage({ trial }: { trial: TrialDetail }) {
  const access = intakeAccess(trial);
  const [params, setParams] = useSearchParams();
  const rounds = useMemo(() => [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset), [trial.rounds]);
  const site = access.sites.find((s) => s.id === Number(params.get('site'))) ?? access.sites[0];
  const round = rounds.find((r) => r.id === Number(params.get('round'))) ?? rounds[0];

  const [chosen, setChosen] = useState<ChosenFile | null>(null);
  const [choices, setChoices] = useState<ColumnChoice[]>([]);
  const [acceptWarnings, setAcceptWarnings] = useState(false);
  // The reason for NA values of rows that give none: one choice for the whole file.
  const [fileReason, setFileReason] = useState('');
  const [progress, setProgress] = useState<number | null>(null);
  const [checked, setChecked] = useState<IntakeResult | null>(null);
  const [saved, setSaved] = useState<IntakeResult | null>(null);
  const [ticket, setTicket] = useState<string | null>(null);
  const submit = useSubmitIntake(trial.id);
  const measures = measuresOf(round?.id);
  const remembered = useRememberedColumns(trial.id);
  // This page's last upload, kept for the browser tab so that after a reload it is followed (or its end shown).
  const sentKey = `friable.intake.${trial.id}.${site?.id}.${round?.id}`;
  const { mine, followed } = useFollowedImports(trial.id, site?.id, round?.id, ticket, submit.isPending, sentKey);

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
      const guessed = guessColumns(chosen.preview.headers, measuresOf(next.round ?? round?.id), remembered);
      setChosen({ ...chosen, guessed });
      setChoices(guessed);
    }
  }

  /** A row is the header row when the guess finds the plot label in it (the server's rule, with its spellings). */
  const isHeaderRow = (cells: readonly string[]) => guessColumns(cells, measures, remembered).includes('plotLabel');

  function showSheet(file: File, opened: OpenedWorkbook, sheet: string) {
    const preview = opened.preview(sheet, isHeaderRow);
    const guessed = guessColumns(preview.headers, measures, remembered);
    setChosen({ file, preview, guessed, partial: preview.rows.length < preview.dataRows, workbook: { sheets: opened.sheets, sheet, opened, preview } });
    setChoices(guessed);
    startOver();
  }

  /** A workbook without a preview (too large to open whole, or not readable here): the server reads it and says what it found. */
  function showUnopened(file: File, workbook: ChosenWorkbook | null, problem: string | null = null) {
    setChosen({ file, preview: { headers: [], rows: [], problem }, guessed: [], partial: true, workbook });
    setChoices([]);
    startOver();
  }

  async function chooseWorkbook(file: File) {
    try {
      if (file.size > WORKBOOK_PREVIEW_MAX_BYTES) {
        const sheets = await workbookSheets(file);
        const first = sheets.find((sheet) => !sheet.hidden) ?? sheets[0];
        showUnopened(file, first ? { sheets, sheet: first.name, opened: null, preview: null } : null);
        return;
      }
      const opened = await openWorkbook(file);
      showSheet(file, opened, opened.defaultSheet(isHeaderRow));
    } catch {
      showUnopened(file, null, 'The browser could not open this workbook for a preview; check it, and the server will say what it finds.');
    }
  }

  async function chooseFile(file: File) {
    if (isWorkbook(file)) return chooseWorkbook(file);
    const partial = file.size > PREVIEW_BYTES;
    const text = await readFileText(partial ? file.slice(0, PREVIEW_BYTES) : file);
    // A head cut mid-line would end in half a row: the preview stops at the last whole line.
    const preview = readPreview(partial ? text.slice(0, Math.max(0, text.lastIndexOf('\n'))) : text);
    const guessed = guessColumns(preview.headers, measures, remembered);
    setChosen({ file, preview, guessed, partial, workbook: null });
    setChoices(guessed);
    startOver();
  }

  function send(dryRun: boolean) {
    if (!chosen || !site || !round) return;
    const next = newTicket();
    setTicket(next);
    window.sessionStorage.setItem(sentKey, next);
    setProgress(0);
    submit.mutate(
      {
        trialId: trial.id,
        siteId: site.id,
        roundId: round.id,
        file: chosen.file,
        mapping: mappingOverrides(chosen.preview.headers, chosen.guessed, choices),
        acceptWarnings,
        missingReason: fileReason.trim() || undefined,
        dryRun,
        onProgress: setProgress,
        ticket: next,
        sheet: chosen.workbook?.sheet,
      },
      {
        onSuccess: (result) => (result.dryRun ? setChecked(result) : setSaved(result)),
        onSettled: () => {
          setProgress(null);
          window.sessionStorage.removeItem(sentKey);
        },
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
          <UploadSection
            trial={trial}
            site={site}
            round={round}
            chosen={chosen}
            disabled={submit.isPending}
            onFile={chooseFile}
            onPickSheet={(sheet) => {
              const { opened } = chosen!.workbook!;
              if (opened) showSheet(chosen!.file, opened, sheet);
              else showUnopened(chosen!.file, { ...chosen!.workbook!, sheet });
            }}
          />
        )}

        {followed.length > 0 && (
          <Section title="Uploads on the server" icon="cloud-upload" className="fr-section" subtitle="Sent earlier or by someone else for this site and round; followed here as they run">
            <SectionCard>
              {followed.map((record) => (
                <ImportProgress
                  key={record.ticket}
                  record={record}
                  title={`${record.fileName}${record.userName ? ` from ${record.userName}` : ''}${record.dryRun ? ' (a check only)' : ''}`}
                />
              ))}
            </SectionCard>
          </Section>
        )}

        {chosen && site?.randomizedAt && (
          <Section title="Preview and columns" icon="th" className="fr-section" subtitle="Check what each column holds; change it where the guess is wrong">
            <SectionCard>
              {chosen.preview.headers.length > 0 && (
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
              )}
              <FormGroup
                label="Why values written NA are missing, where a row gives no reason"
                labelFor="fr-intake-file-reason"
                helperText="For the whole file; a row’s own missing reason cell comes first. Leave empty when every NA has its reason in the file."
                className="fr-gap"
              >
                <MissingReasonInput
                  id="fr-intake-file-reason"
                  label="Missing reason for the whole file"
                  value={fileReason}
                  disabled={submit.isPending}
                  onChange={(reason) => {
                    setFileReason(reason);
                    startOver();
                  }}
                />
              </FormGroup>
              <div className="fr-intake__actions">
                <Button icon="search-template" text={checked ? 'Check again' : 'Check the file'} onClick={() => send(true)} loading={submit.isPending && !checked} disabled={submit.isPending} />
                {progress !== null && (
                  <div className="fr-intake__progress" role="progressbar" aria-label="Upload progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(progress * 100)}>
                    <ProgressBar value={progress} intent="primary" stripes={progress < 1} />
                    <span className="fr-small fr-muted">{progress < 1 ? `Sending… ${formatNumber(progress * 100, 0)}%` : 'Sent; the server is reading it…'}</span>
                  </div>
                )}
                {submit.isPending && progress === 1 && mine && <ImportProgress record={mine} />}
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

        {checked && !saved && <CheckResult checked={checked} acceptWarnings={acceptWarnings} onAcceptWarnings={setAcceptWarnings} saving={submit.isPending} onSave={() => send(false)} />}

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
