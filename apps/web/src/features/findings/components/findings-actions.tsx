import { Button } from '@blueprintjs/core';
import type { FindingsModelsQuery, TrialDetail } from '@friable/contracts';
import { Link } from 'react-router-dom';
import { useDownloadBundle } from '../api/download-bundle';
import { useDownloadExport } from '../api/download-export';

/**
 * What can be taken away from Findings: the data as a tidy CSV or a workbook, the analysis on screen
 * with an R script that reproduces it (`bundleQuery`, once it has answered), and the printable report.
 */
export function FindingsActions({ trial, bundleQuery, reportHref }: { trial: TrialDetail; bundleQuery: FindingsModelsQuery | null; reportHref: string }) {
  const download = useDownloadExport();
  const bundle = useDownloadBundle();
  const error = download.error ?? bundle.error;
  return (
    <>
      <div className="fr-findings-actions">
        <Button icon="download" text="Tidy CSV" loading={download.isPending && download.variables?.kind === 'csv'} onClick={() => download.mutate({ trialId: trial.id, kind: 'csv', fallbackName: `${trial.code}.csv` })} />
        <Button icon="th" text="Workbook" loading={download.isPending && download.variables?.kind === 'xlsx'} onClick={() => download.mutate({ trialId: trial.id, kind: 'xlsx', fallbackName: `${trial.code}.xlsx` })} />
        <Button
          icon="archive"
          text="Analysis with R script"
          title="This analysis as a zip: the data it used, an R script that reproduces its tables, and Friable's answer"
          disabled={!bundleQuery}
          loading={bundle.isPending}
          onClick={() => bundleQuery && bundle.mutate({ trialId: trial.id, query: bundleQuery, fallbackName: `${trial.code}-analysis.zip` })}
        />
        <Link to={reportHref} className="bp6-button fr-findings-report-link">
          <span className="bp6-button-text">Printable report</span>
        </Link>
      </div>
      {error && (
        <p className="fr-error-line" role="alert">
          {error.message}
        </p>
      )}
    </>
  );
}
