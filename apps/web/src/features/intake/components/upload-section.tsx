import { Callout, Section, SectionCard } from '@blueprintjs/core';
import type { AssessmentRound, Site, TrialDetail } from '@friable/contracts';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { formatNumber } from '../../../lib/format';
import { CsvDropZone } from './csv-drop-zone';
import type { CsvPreview } from './read-preview';

export const isWorkbook = (file: File) => /\.xlsx$/i.test(file.name);
const fileSize = (bytes: number) => (bytes < 1_048_576 ? `${formatNumber(bytes / 1024, 0)} kB` : `${formatNumber(bytes / 1_048_576, 1)} MB`);

/** Where the file is dropped, with what the templates hold and what was read of the chosen file. */
export function UploadSection({ trial, site, round, chosen, disabled, onFile }: { trial: TrialDetail; site: Site | undefined; round: AssessmentRound; chosen: { file: File; preview: CsvPreview; partial: boolean } | null; disabled: boolean; onFile: (file: File) => void }) {
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
            {isWorkbook(chosen.file)
              ? ' · a workbook: the server reads its first sheet, finds the header row by the plot label column and says what it found when you check it'
              : chosen.partial
                ? ` · the first ${formatNumber(chosen.preview.rows.length, 0)} rows shown · ${formatNumber(chosen.preview.headers.length, 0)} columns`
                : ` · ${formatNumber(chosen.preview.rows.length, 0)} rows · ${formatNumber(chosen.preview.headers.length, 0)} columns`}
          </p>
        )}
        {chosen?.preview.problem && (
          <Callout intent="warning" compact icon="warning-sign">
            {chosen.preview.problem}
          </Callout>
        )}
      </SectionCard>
    </Section>
  );
}
