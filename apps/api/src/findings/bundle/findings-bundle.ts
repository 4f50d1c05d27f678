import { isModelFindings, type FindingsAnswer } from '@friable/contracts';
import JSZip from 'jszip';
import Papa from 'papaparse';
import { rScript } from './r-script';

/** The rows an analysis used, as the engine was given them (a model's own observations; the ANOVA's rows by plot). */
function tidyRows(answer: FindingsAnswer): Array<Record<string, unknown>> {
  const { context } = answer;
  if (isModelFindings(answer)) return answer.context.engineObservations;
  const combined = answer.context.scope.siteNames.length > 1;
  const factorNames = answer.context.engineRequest.factorNames ?? [];
  return context.observations.map((row) => ({
    treatment: row.treatment,
    ...Object.fromEntries(factorNames.map((name) => [name, row.factors?.[name] ?? ''])),
    ...(answer.context.engineRequest.design === 'crd' ? {} : { block: String(row.block) }),
    ...(combined ? { site: row.siteName } : {}),
    value: row.value,
    censored: row.censored,
    plot: row.plotLabel,
  }));
}

const safeName = (text: string) => text.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');

/**
 * Findings bundle — one analysis as a small zip anyone can check: data.csv (the tidy data it used), analysis.R (R's
 * standard packages reproducing its tables, writing r-results.json), friable.json (Friable's own answer) and a README.
 * Throws: nothing.
 * Example: await findingsBundle(answer) → { filename: 'FW-CLAY-26-DRAIN-Day-14-censored.zip', bytes: <zip> }
 */
export async function findingsBundle(answer: FindingsAnswer): Promise<{ filename: string; bytes: Buffer }> {
  const { context } = answer;
  const analysis = isModelFindings(answer) ? answer.analysis : 'anova';
  const rows = tidyRows(answer);
  const columns = [...new Set(rows.flatMap((row) => Object.keys(row)))];
  const csv = Papa.unparse({ fields: columns, data: rows.map((row) => columns.map((column) => (row[column] === undefined ? '' : String(row[column])))) }, { newline: '\n' });
  const label = context.modelChoice?.options.find((o) => o.analysis === analysis)?.label ?? analysis;
  const title = `Friable ${context.trialCode} · ${context.measure.name} (${context.measure.unit}) · ${context.round.label} · ${context.scope.label}: ${label}`;
  const zip = new JSZip();
  zip.file('data.csv', `${csv}\n`);
  const modelKind = isModelFindings(answer) ? undefined : answer.model?.kind;
  zip.file('analysis.R', rScript({ analysis, request: context.engineRequest as Record<string, unknown>, title, ...(modelKind ? { modelKind } : {}) }));
  zip.file('friable.json', JSON.stringify(answer, null, 2));
  zip.file(
    'README.txt',
    [
      title,
      '',
      'data.csv      the values this analysis used, one row per plot (and round), as Friable gave them to its engine',
      'analysis.R    reproduces the tables with R: Rscript analysis.R (writes r-results.json)',
      'friable.json  Friable\'s own answer, to compare with r-results.json',
      '',
      'R packages: jsonlite, emmeans, survival, multcomp, nlme, MASS; for REML fits lme4, pbkrtest and lmerTest (Debian: r-cran-jsonlite, r-cran-emmeans, r-cran-survival, r-cran-multcomp, r-cran-nlme, r-cran-mass, r-cran-lme4, r-cran-pbkrtest, r-cran-lmertest).',
      'Statistics are decision support, not advice.',
      '',
    ].join('\n'),
  );
  const bytes = await zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
  const filename = `${safeName([context.trialCode, context.measure.code, context.round.label, analysis].join('-'))}.zip`;
  return { filename, bytes };
}
