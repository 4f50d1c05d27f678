import { Callout, HTMLSelect, Section, SectionCard } from '@blueprintjs/core';
import type { AssessmentRound, Site, TrialDetail } from '@friable/contracts';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { formatNumber } from '../../../lib/format';
import { CsvDropZone } from './csv-drop-zone';
import type { CsvPreview } from './read-preview';
import type { OpenedWorkbook, SheetPreview, WorkbookSheetSummary } from './read-workbook';

export const isWorkbook = (file: File) => /\.xlsx$/i.test(file.name);
const rowCount = (rows: number) => `${formatNumber(rows, 0)} ${rows === 1 ? 'row' : 'rows'}`;
const fileSize = (bytes: number) => (bytes < 1_048_576 ? `${formatNumber(bytes / 1024, 0)} kB` : `${formatNumber(bytes / 1_048_576, 1)} MB`);

/** A workbook chosen for upload: its sheets, the one to read, and (when small enough to open here) its preview. */
export interface ChosenWorkbook {
  sheets: readonly WorkbookSheetSummary[];
  sheet: string;
  opened: OpenedWorkbook | null;
  preview: SheetPreview | null;
}

/** Where the file is dropped, with what the templates hold and what was read of the chosen file. */
export function UploadSection({
  trial,
  site,
  round,
  chosen,
  disabled,
  onFile,
  onPickSheet,
}: {
  trial: TrialDetail;
  site: Site | undefined;
  round: AssessmentRound;
  chosen: { file: File; preview: CsvPreview; partial: boolean; workbook: ChosenWorkbook | null } | null;
  disabled: boolean;
  onFile: (file: File) => void;
  onPickSheet: (sheet: string) => void;
}) {
  return (
    <Section title="Upload a CSV file or workbook" icon="cloud-upload" className="fr-section" subtitle={`${site?.name} · ${round.label}`}>
      <SectionCard>
        <p className="fr-muted">
          The CSV template on the <Link to={paths.trialPlotPlan.href(trial.id, site?.id)}>Plot plan</Link> has every plot of the site and a column per measure;
          your own file works too when its headings name the plot label and the measures. Write “NA” for a missing value (and why, in the missing reason
          column) and “&gt;600” for a drain that had not finished by the cut-off.
        </p>
        <CsvDropZone onFile={onFile} disabled={disabled} />
        {chosen && (
          <p className="fr-intake__file">
            <strong>{chosen.file.name}</strong> · {fileSize(chosen.file.size)}
            {chosen.workbook?.preview
              ? ` · sheet “${chosen.workbook.sheet}” · header in row ${chosen.workbook.preview.headerRow} · ${rowCount(chosen.workbook.preview.dataRows)} · ${formatNumber(chosen.preview.headers.length, 0)} columns`
              : isWorkbook(chosen.file)
                ? ` · a workbook too large to preview here: the server reads ${chosen.workbook ? `the sheet “${chosen.workbook.sheet}”` : 'its first visible sheet'}, finds the header row by the plot label column and says what it found when you check it`
                : chosen.partial
                  ? ` · the first ${formatNumber(chosen.preview.rows.length, 0)} rows shown · ${formatNumber(chosen.preview.headers.length, 0)} columns`
                  : ` · ${formatNumber(chosen.preview.rows.length, 0)} rows · ${formatNumber(chosen.preview.headers.length, 0)} columns`}
          </p>
        )}
        {chosen?.workbook && <SheetPicker workbook={chosen.workbook} disabled={disabled} onPick={onPickSheet} />}
        {chosen?.preview.problem && (
          <Callout intent="warning" compact icon="warning-sign">
            {chosen.preview.problem}
          </Callout>
        )}
      </SectionCard>
    </Section>
  );
}

/** Which sheet of a workbook to read: every sheet by its tab name (the chosen one's rows are counted above it). */
function SheetPicker({ workbook, disabled, onPick }: { workbook: ChosenWorkbook; disabled: boolean; onPick: (sheet: string) => void }) {
  return (
    <label className="fr-site-picker fr-intake__sheet">
      <span>Sheet</span>
      <HTMLSelect aria-label="Sheet" value={workbook.sheet} disabled={disabled} onChange={(event) => onPick(event.target.value)}>
        {workbook.sheets.map((sheet) => (
          <option key={sheet.name} value={sheet.name}>
            {[sheet.name, sheet.rows === 0 ? 'empty' : null, sheet.hidden ? 'hidden' : null].filter(Boolean).join(' · ')}
          </option>
        ))}
      </HTMLSelect>
    </label>
  );
}
