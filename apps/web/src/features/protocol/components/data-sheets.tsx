import type { Plot, Site, TrialDetail } from '@friable/contracts';
import { formatAmount, formatDate, formatNumber } from '../../../lib/format';
import { unitSymbol } from './measure-units';
import type { TreatmentSwatch } from './treatment-palette';
import { PlotLegend, PlotMap } from './plot-map';

/**
 * Sheets: what a collaborator takes to the garden for one site — the map, one data sheet per
 * assessment round (blank cells for each measure, with its unit) and a label for every plot.
 * Each part starts on a new printed page.
 */
export function SiteSheets({ trial, site, plots, swatches }: { trial: TrialDetail; site: Site; plots: Plot[]; swatches: Map<number, TreatmentSwatch> }) {
  const ordered = [...plots].sort((a, b) => a.block - b.block || a.position - b.position);
  const treatmentName = (id: number) => trial.treatments.find((t) => t.id === id)?.name ?? '';
  const units = unitColumns(plots);
  return (
    <div className="fr-sheets">
      <section className="fr-sheet">
        <SheetHeading trial={trial} site={site} title="Plot plan" />
        <PlotMap plots={plots} treatments={trial.treatments} factors={trial.factors} swatches={swatches} siteName={site.name} printed />
        <PlotLegend treatments={trial.treatments} swatches={swatches} />
        {trial.safetyNotes && <p className="fr-sheet__safety">Safety: {trial.safetyNotes}</p>}
      </section>
      {[...trial.rounds]
        .sort((a, b) => a.dayOffset - b.dayOffset)
        .map((round) => {
          const measures = trial.measures.filter((m) => round.measureIds.includes(m.id));
          return (
            <section className="fr-sheet" key={round.id}>
              <SheetHeading
                trial={trial}
                site={site}
                title={`Data sheet — ${round.label} (day ${formatNumber(round.dayOffset, 0)}${round.dueDate ? `, due ${formatDate(round.dueDate)}` : ''})`}
              />
              <p className="fr-sheet__fill">Recorded by ______________________ Date ____________</p>
              <table className="fr-sheet__table">
                <thead>
                  <tr>
                    <th>Plot</th>
                    <th>Block</th>
                    {units.map((unit) => (
                      <th key={unit.key}>{unit.header}</th>
                    ))}
                    <th>Treatment</th>
                    {measures.map((m) => (
                      <th key={m.id}>
                        {m.code}
                        <br />
                        <span className="fr-sheet__unit">
                          {m.name} ({unitSymbol(m.unit)})
                        </span>
                      </th>
                    ))}
                    <th>Notes</th>
                  </tr>
                </thead>
                <tbody>
                  {ordered.map((plot) => (
                    <tr key={plot.id}>
                      <td className="fr-sheet__plot">{plot.label}</td>
                      <td>{plot.block}</td>
                      {units.map((unit) => (
                        <td key={unit.key}>{unit.value(plot)}</td>
                      ))}
                      <td>{plot.treatmentCode}</td>
                      {measures.map((m) => (
                        <td key={m.id} className="fr-sheet__blank" />
                      ))}
                      <td className="fr-sheet__blank fr-sheet__notes" />
                    </tr>
                  ))}
                </tbody>
              </table>
              {measures
                .filter((m) => m.kind === 'time-with-cutoff' && m.cutoff !== null)
                .map((m) => (
                  <p key={m.id} className="fr-sheet__hint">
                    {m.code}: a plot not finished by the {formatAmount(m.cutoff, unitSymbol(m.unit))} cut-off is written “&gt;{formatNumber(m.cutoff ?? 0, 4)}”.
                  </p>
                ))}
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
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}

/** A split plot's identity columns on the data sheet, as the CSV template has them: whole plot, sub plot (and sub-sub plot). */
function unitColumns(plots: Plot[]): Array<{ key: string; header: string; value: (plot: Plot) => string }> {
  if (!plots.some((p) => p.wholePlot !== null)) return [];
  return [
    { key: 'whole', header: 'Whole plot', value: (p) => p.wholePlotLabel ?? '' },
    { key: 'sub', header: 'Sub plot', value: (p) => String(p.subPlot ?? '') },
    ...(plots.some((p) => p.subSubPlot !== null) ? [{ key: 'subsub', header: 'Sub-sub plot', value: (p: Plot) => String(p.subSubPlot ?? '') }] : []),
  ];
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
