import type { Plot, Treatment } from '@friable/contracts';
import type { TreatmentSwatch } from './treatment-palette';

function swatchClass(swatch: TreatmentSwatch | undefined, control: boolean): string {
  return `fr-plot fr-pattern--${swatch?.pattern ?? 'solid'}${control ? ' fr-plot--control' : ''}`;
}

/** A site's plot plan: one row per block, one cell per plot, with the plot label and treatment code. */
export function PlotMap({ plots, treatments, swatches, siteName, printed }: { plots: Plot[]; treatments: Treatment[]; swatches: Map<number, TreatmentSwatch>; siteName: string; printed?: boolean }) {
  const blocks = [...new Set(plots.map((p) => p.block))].sort((a, b) => a - b);
  const byId = new Map(treatments.map((t) => [t.id, t]));
  return (
    <div className="fr-map-scroll">
      <table className="fr-map" aria-label={`${printed ? 'Printed plot plan' : 'Plot plan'} of ${siteName}`}>
        <tbody>
          {blocks.map((block) => (
            <tr key={block}>
              <th scope="row" className="fr-map__block">
                <span className="fr-map__block-word">Block </span>
                {block}
              </th>
              {plots
                .filter((p) => p.block === block)
                .sort((a, b) => a.position - b.position)
                .map((plot) => {
                  const swatch = swatches.get(plot.treatmentId);
                  const treatment = byId.get(plot.treatmentId);
                  return (
                    <td key={plot.id} className="fr-map__cell">
                      <div
                        className={swatchClass(swatch, treatment?.isControl ?? false)}
                        style={{ backgroundColor: swatch?.fill, color: swatch?.ink }}
                        title={`${plot.label}: ${treatment?.name ?? plot.treatmentCode}`}
                      >
                        <span className="fr-plot__code">{plot.treatmentCode}</span>
                        <span className="fr-plot__label">{plot.label}</span>
                      </div>
                    </td>
                  );
                })}
            </tr>
          ))}
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
