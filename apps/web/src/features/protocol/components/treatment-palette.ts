import type { Treatment } from '@friable/contracts';
import { trialTreatmentStyles, styleOf, type TreatmentStyle } from '../../../lib/treatment-style';

export interface TreatmentSwatch {
  fill: string;
  ink: string;
  pattern: TreatmentStyle['pattern'];
}

/**
 * The map's swatch of each treatment (by id): the same colour and pattern the trial's charts give it
 * (lib/treatment-style: Okabe–Ito colours, the control neutral grey). The map never relies on colour
 * alone: every cell also shows its treatment code, and the control keeps its dashed edge.
 */
export function treatmentSwatches(treatments: Treatment[]): Map<number, TreatmentSwatch> {
  const styles = trialTreatmentStyles(treatments);
  return new Map(
    treatments.map((treatment) => {
      const style = styleOf(styles, treatment.code);
      return [treatment.id, { fill: style.colour, ink: style.ink, pattern: style.pattern }];
    }),
  );
}
