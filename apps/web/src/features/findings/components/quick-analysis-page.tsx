import { Button, Callout, H2, HTMLSelect, HTMLTable, TextArea } from '@blueprintjs/core';
import { FilePick } from '../../../components/file-pick';
import { useMemo, useState } from 'react';
import { ErrorState, LoadingState } from '../../../components/states';
import { designLabels } from '../../../lib/format';
import { anovaQueryOptions, runAnova, useAnova, type AnovaRequest, type QuickDesign } from '../api/run-anova';
import { useRankTest } from '../api/run-rank-test';
import { useSiteMeans } from '../hooks/use-site-means';
import { AnalysisChoices, OptionChoice, defaultAnalysisOptions, type AnalysisOptions } from './analysis-choices';
import { FindingsView } from './findings-view';
import { columnRoleLabels, guessColumnRoles, guessDesign, missingColumns, quickObservations, readQuickTable, typedDecimals, type ColumnRole } from './quick-data';

const DESIGNS: QuickDesign[] = ['crd', 'rcbd', 'factorial-rcbd', 'multisite-rcbd'];
const quickDesignLabels: Record<QuickDesign, string> = { ...designLabels, 'multisite-rcbd': 'Blocks at several sites, combined' } as Record<QuickDesign, string>;
const ROLES = Object.keys(columnRoleLabels) as ColumnRole[];
const PREVIEW_ROWS = 8;

function readFile(file: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result ?? ''));
    reader.onerror = () => reject(reader.error ?? new Error('The file could not be read.'));
    reader.readAsText(file, 'utf-8');
  });
}

/** Quick analysis: paste or upload a small CSV, check its columns and design, and get the Findings view; nothing is stored. */
export function QuickAnalysisPage() {
  const [text, setText] = useState('');
  const [roles, setRoles] = useState<ColumnRole[]>([]);
  const [design, setDesign] = useState<QuickDesign>('rcbd');
  const [control, setControl] = useState('');
  const [options, setOptions] = useState<AnalysisOptions>(defaultAnalysisOptions);
  const [request, setRequest] = useState<AnovaRequest | null>(null);
  const [fileProblem, setFileProblem] = useState<string | null>(null);
  const table = useMemo(() => readQuickTable(text), [text]);

  function take(next: string) {
    setText(next);
    setRequest(null);
    const read = readQuickTable(next);
    const guessed = read.problem ? [] : guessColumnRoles(read);
    setRoles(guessed);
    setDesign(guessDesign(guessed));
    setControl('');
  }

  const missing = table.problem ? [] : missingColumns(design, roles);
  const observations = useMemo(() => (table.problem || missing.length ? [] : quickObservations(table, roles, design)), [table, roles, design, missing.length]);
  const treatments = useMemo(() => [...new Set(observations.map((o) => o.treatment ?? Object.values(o.factors ?? {}).join(' × ')))], [observations]);

  function analyse() {
    setRequest({
      design,
      alpha: options.alpha,
      transform: options.transform,
      meanSeparation: [options.method],
      ...(design === 'multisite-rcbd' ? { sitesAre: options.sitesAre } : {}),
      ...(control ? { control } : {}),
      observations,
    });
  }

  return (
    <div className="fr-quick">
      <H2>Quick analysis</H2>
      <p className="fr-muted">
        Paste a small table or choose a CSV file: one row per plot with its treatment, block, site (if several) and value — or two factor columns in place of
        the treatment. Friable analyses it as it stands; nothing is saved and no trial is created.
      </p>
      <div className="fr-quick__input">
        <label className="fr-findings-choice fr-quick__paste">
          <span>Data (CSV, with a heading row)</span>
          <TextArea
            aria-label="Data to analyse"
            value={text}
            onChange={(event) => take(event.target.value)}
            rows={8}
            fill
            placeholder={'treatment,block,value\nCTRL,1,9.3\nGYP,1,9.4\n…'}
          />
        </label>
        <FilePick
          className="fr-findings-choice"
          label="Or a CSV file"
          accept=".csv,.tsv,.txt,text/csv,text/plain"
          ariaLabel="CSV file"
          onFile={(file) => {
            setFileProblem(null);
            readFile(file).then(take, (error: Error) => setFileProblem(error.message));
          }}
        />
      </div>
      {fileProblem && <p className="fr-error-line" role="alert">{fileProblem}</p>}
      {text.trim() !== '' && table.problem && (
        <Callout intent="warning" role="alert" compact>
          {table.problem}
        </Callout>
      )}
      {!table.problem && (
        <>
          <h3 className="fr-findings-heading">Preview and columns</h3>
          <div className="fr-table-scroll">
            <HTMLTable compact bordered className="fr-findings-table" aria-label="Preview">
              <thead>
                <tr>
                  {table.headers.map((header, c) => (
                    <th key={`${header}-${c}`} scope="col">
                      <div>{header}</div>
                      <HTMLSelect
                        aria-label={`Role of column ${header}`}
                        value={roles[c] ?? 'ignore'}
                        onChange={(event) => {
                          const next = [...roles];
                          next[c] = event.target.value as ColumnRole;
                          setRoles(next);
                          setDesign(guessDesign(next));
                          setRequest(null);
                        }}
                      >
                        {ROLES.map((role) => (
                          <option key={role} value={role}>
                            {columnRoleLabels[role]}
                          </option>
                        ))}
                      </HTMLSelect>
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {table.rows.slice(0, PREVIEW_ROWS).map((row, r) => (
                  <tr key={r}>
                    {row.map((cell, c) => (
                      <td key={c}>{cell}</td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          </div>
          <p className="fr-muted fr-small">
            {table.rows.length} rows{table.rows.length > PREVIEW_ROWS ? `, the first ${PREVIEW_ROWS} shown` : ''}.
          </p>
          <AnalysisChoices
            options={options}
            onChange={(next) => {
              setOptions(next);
              setRequest(null);
            }}
            showSites={design === 'multisite-rcbd'}
            dunnettAllowed={control !== ''}
            before={
              <>
                <OptionChoice
                  label="Design"
                  value={design}
                  options={DESIGNS.map((d) => ({ value: d, label: quickDesignLabels[d] }))}
                  onChange={(value) => {
                    setDesign(value as QuickDesign);
                    setRequest(null);
                  }}
                />
                {design !== 'factorial-rcbd' && (
                  <OptionChoice
                    label="Control"
                    value={control}
                    options={[{ value: '', label: 'None' }, ...treatments.map((t) => ({ value: t, label: t }))]}
                    onChange={(value) => {
                      setControl(value);
                      setRequest(null);
                      if (!value && options.method === 'dunnett') setOptions({ ...options, method: 'tukey' });
                    }}
                  />
                )}
              </>
            }
          />
          {missing.length > 0 && (
            <Callout intent="warning" compact>
              This design needs a column for: {missing.join(', ')}. Choose it above.
            </Callout>
          )}
          <Button intent="primary" icon="calculator" text="Analyse" disabled={missing.length > 0} onClick={analyse} className="fr-gap" />
        </>
      )}
      {request && <QuickAnswer request={request} />}
    </div>
  );
}

function QuickAnswer({ request }: { request: AnovaRequest }) {
  const anova = useAnova(request);
  const blocked = request.design !== 'crd';
  const rankObservations = useMemo(
    () => request.observations.map((o) => ({ ...o, treatment: o.treatment ?? Object.values(o.factors ?? {}).join(' × '), factors: undefined })),
    [request.observations],
  );
  const rank = useRankTest(blocked ? 'friedman' : 'kruskal', rankObservations);
  const siteNames = request.design === 'multisite-rcbd' ? [...new Set(request.observations.map((o) => o.site ?? ''))] : [];
  const interaction = useSiteMeans(
    siteNames.map((name) => {
      const siteRequest: AnovaRequest = { ...request, design: 'rcbd', sitesAre: undefined, observations: request.observations.filter((o) => o.site === name).map((o) => ({ ...o, site: undefined })) };
      return { name, options: { queryKey: anovaQueryOptions(siteRequest).queryKey, queryFn: () => runAnova(siteRequest) } };
    }),
  );
  if (anova.isPending) return <LoadingState what="the analysis" />;
  if (anova.isError) return <ErrorState title="These data could not be analysed" error={anova.error} />;
  const method = request.meanSeparation?.[0] ?? 'tukey';
  return (
    <FindingsView
      answer={anova.data}
      method={method}
      alpha={request.alpha ?? 0.05}
      control={request.control}
      decimals={typedDecimals(request.observations)}
      rankTest={{ kind: blocked ? 'friedman' : 'kruskal-wallis', answer: rank.data, error: rank.error, pending: rank.isPending }}
      plots={{
        measureName: 'Value',
        values: rankObservations.map((o) => ({ treatment: o.treatment, site: o.site, value: Number(o.value), censored: false })),
        interaction,
      }}
    />
  );
}
