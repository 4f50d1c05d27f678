import { Button, Callout, Section, SectionCard } from '@blueprintjs/core';
import type { Site, TrialDetail } from '@friable/contracts';
import { isFactorDesign } from '@friable/field';
import { useMemo, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { SafetyCautions } from '../../../components/safety-cautions';
import { RoundPicker, SitePicker } from '../../../components/site-round-pickers';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { formatArea, formatNumber } from '../../../lib/format';
import { useAmounts } from '../api/get-amounts';
import { useLevelAmounts } from '../../../lib/api/get-level-amounts';
import { useSitePlots } from '../../../lib/api/get-site-plots';
import { SiteSheets } from './data-sheets';
import { PlotLegend, PlotMap } from './plot-map';
import { LevelAmounts } from './level-amounts';
import { SiteAmounts } from './site-amounts';
import { TemplateDownloads } from './template-downloads';
import { treatmentSwatches } from './treatment-palette';

/** The site shown first: the one in the address, else the caller's own site, else the first. */
function chooseSite(trial: TrialDetail, requested: string | null): Site | undefined {
  const byId = (id: number) => trial.sites.find((s) => s.id === id);
  return (requested ? byId(Number(requested)) : undefined) ?? trial.mySiteIds.map(byId).find(Boolean) ?? trial.sites[0];
}

/** Plot plan: per site, the map of blocks and plots, the amounts per plot, Sheets to print and templates (CSV and workbook). */
export function PlotPlanPage({ trial }: { trial: TrialDetail }) {
  const [params, setParams] = useSearchParams();
  const site = chooseSite(trial, params.get('site'));
  const plots = useSitePlots(trial.id, site?.randomizedAt ? site.id : undefined);
  const factorDesign = isFactorDesign(trial.design);
  const amounts = useAmounts(trial.id);
  const levelAmounts = useLevelAmounts(trial.id, factorDesign);
  const swatches = useMemo(() => treatmentSwatches(trial.treatments), [trial.treatments]);
  const [printLayout, setPrintLayout] = useState(false);
  const rounds = useMemo(() => [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset), [trial.rounds]);
  const sheetRound = params.get('round');
  const sheetRounds = sheetRound ? rounds.filter((r) => r.id === Number(sheetRound)) : rounds;

  if (!site) return <EmptyState title="No sites yet" description="Once the investigator adds a site and randomizes it, its plot plan appears here." />;
  const mine = trial.mySiteIds.includes(site.id);

  return (
    <div className={printLayout ? 'fr-plot-plan fr-plot-plan--print-layout' : 'fr-plot-plan'}>
      <div className="fr-plot-plan__bar fr-screen-only">
        <SitePicker trial={trial} value={site.id} onChange={(siteId) => setParams({ site: String(siteId) }, { replace: true })} />
        <span className="fr-muted">
          {formatNumber(site.blocks, 0)} blocks · {formatArea(site.areaM2)} per plot{mine ? ' · your site' : ''}
        </span>
        {plots.data && plots.data.length > 0 && (
          <span className="fr-plot-plan__print">
            <RoundPicker
              label="Sheets for"
              every="Every round"
              rounds={rounds}
              value={sheetRound ? Number(sheetRound) : null}
              onChange={(roundId) => setParams(roundId ? { site: String(site.id), round: String(roundId) } : { site: String(site.id) }, { replace: true })}
            />
            <Button icon={printLayout ? 'eye-open' : 'document'} text={printLayout ? 'Back to the plan' : 'Show Sheets'} onClick={() => setPrintLayout((on) => !on)} />
            <Button icon="print" intent="primary" text="Print Sheets" onClick={() => window.print()} />
          </span>
        )}
      </div>

      {!site.randomizedAt ? (
        <Callout icon="random" intent="primary" className="fr-gap fr-screen-only" title={`${site.name} is not randomized yet`}>
          The investigator randomizes each site on the Sites page; the plot plan, Sheets and templates follow.
        </Callout>
      ) : plots.isPending ? (
        <LoadingState what="the plot plan" />
      ) : plots.isError ? (
        <ErrorState title="The plot plan could not be loaded" error={plots.error} onRetry={() => plots.refetch()} />
      ) : (
        <>
          <div className="fr-screen-only fr-plot-plan__screen">
            <Section title={`Plot plan — ${site.name}`} icon="grid-view" className="fr-section" subtitle={`Seed ${site.randomizationSeed ?? trial.seed}`}>
              <SectionCard>
                <PlotMap plots={plots.data} treatments={trial.treatments} factors={trial.factors} swatches={swatches} siteName={site.name} />
                <PlotLegend treatments={trial.treatments} swatches={swatches} />
              </SectionCard>
            </Section>
          </div>
          <div className="fr-print-only">
            <SiteSheets trial={trial} site={site} plots={plots.data} swatches={swatches} amounts={amounts.data ?? []} levelAmounts={factorDesign ? (levelAmounts.data ?? []) : undefined} rounds={sheetRounds} />
          </div>
        </>
      )}

      <div className="fr-screen-only">
        <Section
          title={factorDesign ? 'Amount per unit each factor goes on' : 'Amount per plot'}
          icon="shopping-cart"
          className="fr-section"
          subtitle={factorDesign ? `${formatArea(site.areaM2)} of surface per plot; a whole plot holds its sub plots` : `For ${formatArea(site.areaM2)} of surface per plot`}
        >
          <SectionCard>
            {factorDesign ? (
              levelAmounts.isPending ? (
                <LoadingState what="the amounts" />
              ) : levelAmounts.isError ? (
                <ErrorState title="The amounts could not be worked out" error={levelAmounts.error} onRetry={() => levelAmounts.refetch()} />
              ) : (
                <LevelAmounts trial={trial} site={site} amounts={levelAmounts.data} />
              )
            ) : amounts.isPending ? (
              <LoadingState what="the amounts" />
            ) : amounts.isError ? (
              <ErrorState title="The amounts could not be worked out" error={amounts.error} onRetry={() => amounts.refetch()} />
            ) : (
              <SiteAmounts trial={trial} site={site} amounts={amounts.data} />
            )}
            <SafetyCautions />
          </SectionCard>
        </Section>
        <Section title="Templates" icon="th" className="fr-section" subtitle="Plot identifiers filled in, one column per measure: a CSV file, or a workbook that checks each value as it is typed">
          <SectionCard>{site.randomizedAt ? <TemplateDownloads trial={trial} site={site} /> : <p className="fr-muted">Templates come once the site is randomized.</p>}</SectionCard>
        </Section>
      </div>
    </div>
  );
}
