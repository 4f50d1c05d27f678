import { Button } from '@blueprintjs/core';
import type { Site, TrialDetail } from '@friable/contracts';
import { formatDate } from '../../../lib/format';
import { useDownloadTemplate } from '../api/download-template';

function fileName(trial: TrialDetail, site: Site, label: string, format: 'csv' | 'xlsx'): string {
  const safe = (text: string) => text.replace(/[^A-Za-z0-9-]+/g, '-').replace(/^-|-$/g, '');
  return `${safe(trial.code)}_${safe(site.labelPrefix || site.name)}_${safe(label)}.${format}`;
}

/** Per round for this site, the template as a CSV file and as a workbook: the plot identifiers filled in, a column per measure. */
export function TemplateDownloads({ trial, site }: { trial: TrialDetail; site: Site }) {
  const download = useDownloadTemplate();
  const rounds = [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset);
  if (rounds.length === 0) return <p className="fr-muted">The protocol has no assessment rounds yet, so there is no template to fill in.</p>;
  return (
    <>
      <ul className="fr-downloads">
        {rounds.map((round) => (
          <li key={round.id}>
            {(['csv', 'xlsx'] as const).map((format) => (
              <Button
                key={format}
                icon="download"
                text={`${format === 'csv' ? 'CSV template' : 'Workbook'} — ${round.label}`}
                title={format === 'xlsx' ? 'The plot labels are locked; each measure’s cells take only what Intake accepts.' : undefined}
                loading={download.isPending && download.variables?.roundId === round.id && download.variables.format === format}
                onClick={() => download.mutate({ trialId: trial.id, siteId: site.id, roundId: round.id, fileName: fileName(trial, site, round.label, format), format })}
              />
            ))}
            <span className="fr-muted fr-small">{round.dueDate ? ` due ${formatDate(round.dueDate)}` : ` day ${round.dayOffset}`}</span>
          </li>
        ))}
      </ul>
      {download.error && (
        <p className="fr-error-line" role="alert">
          {download.error.message}
        </p>
      )}
    </>
  );
}
