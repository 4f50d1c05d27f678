import type { AssessmentRound, LevelAmount, Plot, PlotAmount, Site, TrialDetail } from '@friable/contracts';
import type { ReactNode } from 'react';
import { SafetyCautions } from '../../../components/safety-cautions';
import { paths } from '../../../config/paths';
import { formatAmount, formatDate, formatDoseShort, formatNumber, formatRate } from '../../../lib/format';
import { useQrCodes } from '../hooks/use-qr-codes';
import { unitSymbol } from './measure-units';
import type { TreatmentSwatch } from './treatment-palette';
import { PlotLegend, PlotMap } from './plot-map';
import { plotLevelAmountText } from '../../../lib/level-amount-text';
import { SheetLevelAmounts } from './sheet-level-amounts';

/**
 * A column of a data sheet that says which plot a row is, beside the plot label, block and
 * treatment (a split plot's whole plot, for example). Other identity columns can be added the same way.
 */
export interface SheetIdentityColumn {
  heading: string;
  cell: (plot: Plot) => ReactNode;
}

/** The Round walk's address of one plot, absolute, for its QR code. */
const walkAddress = (trial: TrialDetail, site: Site, round: AssessmentRound | undefined, plot: Plot) =>
  `${window.location.origin}${paths.trialWalk.href(trial.id, site.id, round?.id, plot.id)}`;

/**
 * Sheets: what a collaborator takes to the garden for one site — the plot plan with the amount of
 * each amendment per plot and the cautions on the first page, then a data sheet for each chosen round
 * (every plot with its block, treatment and amount in both unit systems, the round's measures with
 * units and cut-offs, boxes to write in, a QR code that opens the plot in the Round walk), then a
 * label for every plot. Each part starts on a new printed page.
 */
export function SiteSheets({
  trial,
  site,
  plots,
  swatches,
  amounts,
  rounds,
  identityColumns,
  levelAmounts,
}: {
  trial: TrialDetail;
  site: Site;
  plots: Plot[];
  swatches: Map<number, TreatmentSwatch>;
  amounts: PlotAmount[];
  /** Factorials and split plots: each level's amount per unit it goes on (GET …/level-amounts). */
  levelAmounts?: LevelAmount[];
  /** The rounds to print a data sheet for. */
  rounds: AssessmentRound[];
  identityColumns?: SheetIdentityColumn[];
}) {
  const ordered = [...plots].sort((a, b) => a.block - b.block || a.position - b.position);
  const treatmentName = (id: number) => trial.treatments.find((t) => t.id === id)?.name ?? '';
  const amountOf = (treatmentId: number) => amounts.find((a) => a.siteId === site.id && a.treatmentId === treatmentId);
  const plotAmount = (plot: Plot) => (levelAmounts ? plotLevelAmountText(trial, site, levelAmounts, plot) : formatDoseShort(amountOf(plot.treatmentId)?.perPlot ?? null));
  const columns = identityColumns ?? splitPlotColumns(plots);
  const labelRound = rounds[0];
  const addresses = [...new Set([...rounds.flatMap((round) => ordered.map((plot) => walkAddress(trial, site, round, plot))), ...ordered.map((plot) => walkAddress(trial, site, labelRound, plot))])];
  const qr = useQrCodes(addresses);
  const qrImage = (round: AssessmentRound | undefined, plot: Plot) => {
    const src = qr.get(walkAddress(trial, site, round, plot));
    return src ? <img className="fr-sheet__qr" src={src} alt={`QR code: open ${plot.label} in the Round walk`} /> : null;
  };

  return (
    <div className="fr-sheets">
      <section className="fr-sheet">
        <SheetHeading trial={trial} site={site} title="Plot plan" />
        <PlotMap plots={plots} treatments={trial.treatments} factors={trial.factors} swatches={swatches} siteName={site.name} printed />
        <PlotLegend treatments={trial.treatments} swatches={swatches} />
        {levelAmounts ? <SheetLevelAmounts trial={trial} site={site} amounts={levelAmounts} /> : <SheetTreatmentAmounts trial={trial} site={site} amountOf={amountOf} />}
        <SheetCautions trial={trial} />
      </section>
      {rounds.map((round) => {
        const measures = trial.measures.filter((m) => round.measureIds.includes(m.id)).sort((a, b) => a.position - b.position);
        return (
          <section className="fr-sheet" key={round.id}>
            <SheetHeading
              trial={trial}
              site={site}
              title={`Data sheet — ${round.label} (day ${formatNumber(round.dayOffset, 0)}${round.dueDate ? `, due ${formatDate(round.dueDate)}` : ''})`}
            />
            <p className="fr-sheet__fill">Recorded by ______________________ Date ____________ Weather / soil moisture ______________________</p>
            <table className="fr-sheet__table" aria-label={`Data sheet ${round.label} at ${site.name}`}>
              <thead>
                <tr>
                  <th>Plot</th>
                  <th>Block</th>
                  {columns.map((column) => (
                    <th key={column.heading}>{column.heading}</th>
                  ))}
                  <th>Treatment</th>
                  <th>Amount per plot</th>
                  {measures.map((m) => (
                    <th key={m.id}>
                      {m.name}
                      <br />
                      <span className="fr-sheet__unit">
                        {unitSymbol(m.unit)}
                        {m.kind === 'time-with-cutoff' && m.cutoff !== null ? ` · cut-off ${formatNumber(m.cutoff, 4)}` : ''}
                        {m.kind === 'score' && m.scaleMin !== null && m.scaleMax !== null ? ` · ${formatNumber(m.scaleMin, 2)}–${formatNumber(m.scaleMax, 2)}` : ''}
                      </span>
                    </th>
                  ))}
                  <th>Notes</th>
                  <th>Walk</th>
                </tr>
              </thead>
              <tbody>
                {ordered.map((plot) => (
                  <tr key={plot.id}>
                    <td className="fr-sheet__plot">{plot.label}</td>
                    <td>{plot.block}</td>
                    {columns.map((column) => (
                      <td key={column.heading}>{column.cell(plot)}</td>
                    ))}
                    <td>{plot.treatmentCode}</td>
                    <td className="fr-sheet__amount">{plotAmount(plot)}</td>
                    {measures.map((m) => (
                      <td key={m.id} className="fr-sheet__blank" />
                    ))}
                    <td className="fr-sheet__blank fr-sheet__notes" />
                    <td className="fr-sheet__qr-cell">{qrImage(round, plot)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            {measures
              .filter((m) => m.kind === 'time-with-cutoff' && m.cutoff !== null)
              .map((m) => (
                <p key={m.id} className="fr-sheet__hint">
                  {m.name}: a plot not finished by the {formatAmount(m.cutoff, unitSymbol(m.unit))} cut-off is written “&gt;{formatNumber(m.cutoff ?? 0, 4)}”, not {formatNumber(m.cutoff ?? 0, 4)}.
                </p>
              ))}
            <p className="fr-sheet__hint">A value that could not be taken is written NA with the reason in Notes. Scan a plot’s code to open it in the Round walk.</p>
            <SheetCautions trial={trial} />
          </section>
        );
      })}
      <section className="fr-sheet">
        <SheetHeading trial={trial} site={site} title="Plot labels" />
        <ul className="fr-labels">
          {ordered.map((plot) => (
            <li key={plot.id} className="fr-label">
              <span className="fr-label__plot">{plot.label}</span>
              <span className="fr-label__treatment">
                {plot.treatmentCode} · {treatmentName(plot.treatmentId)}
              </span>
              {plot.wholePlotLabel && (
                <span className="fr-label__unit">
                  whole plot {plot.wholePlotLabel} · sub plot {plot.subPlot}
                  {plot.subSubPlot !== null ? ` · sub-sub plot ${plot.subSubPlot}` : ''}
                </span>
              )}
              <span className="fr-label__where">
                {trial.code} · {site.name} · block {plot.block}
              </span>
              {qrImage(labelRound, plot)}
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}

/** Each treatment's amount per plot at the site, for the printed first page. */
function SheetTreatmentAmounts({ trial, site, amountOf }: { trial: TrialDetail; site: Site; amountOf: (treatmentId: number) => PlotAmount | undefined }) {
  return (
    <table className="fr-sheet__table fr-sheet__amounts" aria-label={`Amount per plot at ${site.name}`}>
      <thead>
        <tr>
          <th>Treatment</th>
          <th>Rate</th>
          <th>Amount per plot ({formatNumber(site.areaM2, 2)} m²)</th>
          <th>Plots</th>
        </tr>
      </thead>
      <tbody>
        {trial.treatments.map((treatment) => {
          const amount = amountOf(treatment.id);
          return (
            <tr key={treatment.id}>
              <td>
                <strong>{treatment.code}</strong> {treatment.name}
                {treatment.product ? ` (${treatment.product})` : ''}
              </td>
              <td>{formatRate(treatment.rateValue, treatment.rateUnit)}</td>
              <td>{formatDoseShort(amount?.perPlot ?? null)}</td>
              <td>{amount ? formatNumber(amount.plots, 0) : '—'}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

/** A split plot's identity columns on the data sheet, as the CSV template has them: whole plot, sub plot (and sub-sub plot). */
function splitPlotColumns(plots: Plot[]): SheetIdentityColumn[] {
  if (!plots.some((p) => p.wholePlot !== null)) return [];
  return [
    { heading: 'Whole plot', cell: (p) => p.wholePlotLabel ?? '' },
    { heading: 'Sub plot', cell: (p) => String(p.subPlot ?? '') },
    ...(plots.some((p) => p.subSubPlot !== null) ? [{ heading: 'Sub-sub plot', cell: (p: Plot) => String(p.subSubPlot ?? '') }] : []),
  ];
}

/** The cautions printed on every sheet, with the trial's own safety notes. */
function SheetCautions({ trial }: { trial: TrialDetail }) {
  return (
    <div className="fr-sheet__cautions">
      <SafetyCautions title="Safety" />
      {trial.safetyNotes && <p className="fr-sheet__safety">This trial: {trial.safetyNotes}</p>}
    </div>
  );
}

function SheetHeading({ trial, site, title }: { trial: TrialDetail; site: Site; title: string }) {
  return (
    <header className="fr-sheet__head">
      <div className="fr-sheet__title">{title}</div>
      <div className="fr-sheet__meta">
        {trial.code} · {trial.title} · {site.name}
      </div>
    </header>
  );
}
