import type { Factor, Plot, Treatment } from '@friable/contracts';
import type { TreatmentSwatch } from './treatment-palette';

function swatchClass(swatch: TreatmentSwatch | undefined, control: boolean): string {
  return `fr-plot fr-pattern--${swatch?.pattern ?? 'solid'}${control ? ' fr-plot--control' : ''}`;
}

/** The part of a plot's label inside its whole plot: `HL-B2-W3-S2` in `HL-B2-W3` → `S2`. */
function labelWithinWholePlot(plot: Plot): string {
  return plot.wholePlotLabel && plot.label.startsWith(`${plot.wholePlotLabel}-`) ? plot.label.slice(plot.wholePlotLabel.length + 1) : plot.label;
}

function PlotCell({ plot, treatment, swatch, short }: { plot: Plot; treatment: Treatment | undefined; swatch: TreatmentSwatch | undefined; short?: boolean }) {
  return (
    <div
      className={swatchClass(swatch, treatment?.isControl ?? false)}
      style={{ backgroundColor: swatch?.fill, color: swatch?.ink }}
      title={`${plot.label}: ${treatment?.name ?? plot.treatmentCode}`}
      aria-label={short ? `Sub plot ${plot.label}: ${plot.treatmentCode}` : undefined}
    >
      <span className="fr-plot__code">{plot.treatmentCode}</span>
      <span className="fr-plot__label">{short ? labelWithinWholePlot(plot) : plot.label}</span>
    </div>
  );
}

/** Groups in first-seen order: the plots of one whole plot (or one sub plot), kept in their positions. */
function groupBy(plots: Plot[], key: (plot: Plot) => number | null): Plot[][] {
  const groups = new Map<number | null, Plot[]>();
  for (const plot of plots) groups.set(key(plot), [...(groups.get(key(plot)) ?? []), plot]);
  return [...groups.values()];
}

/**
 * A whole plot drawn as an outlined group: its label and whole-plot level on top, its sub plots
 * inside (and, in a split-split plot, each sub plot's sub-sub plots in an inner dashed outline).
 */
function WholePlot({ plots, byId, swatches, wholeLevel }: { plots: Plot[]; byId: Map<number, Treatment>; swatches: Map<number, TreatmentSwatch>; wholeLevel: (plot: Plot) => string }) {
  const first = plots[0]!;
  const splitSplit = plots.some((p) => p.subSubPlot !== null);
  const cell = (plot: Plot) => <PlotCell key={plot.id} plot={plot} treatment={byId.get(plot.treatmentId)} swatch={swatches.get(plot.treatmentId)} short />;
  return (
    <div className="fr-whole-plot" role="group" aria-label={`Whole plot ${first.wholePlotLabel}: ${wholeLevel(first)}`}>
      <div className="fr-whole-plot__head">
        <span className="fr-whole-plot__label">{first.wholePlotLabel}</span> <span className="fr-whole-plot__level">{wholeLevel(first)}</span>
      </div>
      <div className="fr-whole-plot__subs">
        {splitSplit
          ? groupBy(plots, (p) => p.subPlot).map((sub) => (
              <div key={sub[0]!.id} className="fr-sub-plot" role="group" aria-label={`Sub plot ${sub[0]!.subPlot} of ${first.wholePlotLabel}`}>
                {sub.map(cell)}
              </div>
            ))
          : plots.map(cell)}
      </div>
    </div>
  );
}

/**
 * A site's plot plan: one row per block, one cell per plot, with the plot label and treatment code.
 * A split plot's whole plots are outlined groups with their sub plots inside, so the unit each
 * factor goes on can be seen at a glance.
 */
export function PlotMap({
  plots,
  treatments,
  swatches,
  siteName,
  printed,
  factors = [],
}: {
  plots: Plot[];
  treatments: Treatment[];
  swatches: Map<number, TreatmentSwatch>;
  siteName: string;
  printed?: boolean;
  factors?: Factor[];
}) {
  const blocks = [...new Set(plots.map((p) => p.block))].sort((a, b) => a - b);
  const byId = new Map(treatments.map((t) => [t.id, t]));
  const split = plots.some((p) => p.wholePlot !== null);
  const wholeFactor = factors.find((f) => f.position === 1);
  const wholeLevel = (plot: Plot) => {
    const level = wholeFactor?.levels.find((l) => byId.get(plot.treatmentId)?.factorLevelIds.includes(l.id));
    return level ? `${level.code} · ${level.name}` : '';
  };
  return (
    <div className="fr-map-scroll">
      <table className={split ? 'fr-map fr-map--split' : 'fr-map'} aria-label={`${printed ? 'Printed plot plan' : 'Plot plan'} of ${siteName}`}>
        <tbody>
          {blocks.map((block) => {
            const inBlock = plots.filter((p) => p.block === block).sort((a, b) => a.position - b.position);
            return (
              <tr key={block}>
                <th scope="row" className="fr-map__block">
                  <span className="fr-map__block-word">Block </span>
                  {block}
                </th>
                {split ? (
                  <td className="fr-map__cell">
                    <div className="fr-map__whole-plots">
                      {groupBy(inBlock, (p) => p.wholePlot).map((whole) => (
                        <WholePlot key={whole[0]!.id} plots={whole} byId={byId} swatches={swatches} wholeLevel={wholeLevel} />
                      ))}
                    </div>
                  </td>
                ) : (
                  inBlock.map((plot) => (
                    <td key={plot.id} className="fr-map__cell">
                      <PlotCell plot={plot} treatment={byId.get(plot.treatmentId)} swatch={swatches.get(plot.treatmentId)} />
                    </td>
                  ))
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

/** What each colour and pattern means; the code is printed on every cell as well. */
export function PlotLegend({ treatments, swatches }: { treatments: Treatment[]; swatches: Map<number, TreatmentSwatch> }) {
  return (
    <ul className="fr-legend" aria-label="Treatments on the map">
      {treatments.map((treatment) => {
        const swatch = swatches.get(treatment.id);
        return (
          <li key={treatment.id}>
            <span className={`fr-legend__swatch ${swatchClass(swatch, treatment.isControl)}`} style={{ backgroundColor: swatch?.fill, color: swatch?.ink }} aria-hidden="true">
              {treatment.code}
            </span>
            <span>
              <strong>{treatment.code}</strong> {treatment.name}
              {treatment.isControl ? ' (control)' : ''}
            </span>
          </li>
        );
      })}
    </ul>
  );
}
