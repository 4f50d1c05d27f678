import type { Treatment } from '@friable/contracts';

/**
 * Okabe–Ito colours (Okabe & Ito 2008, "Color Universal Design", https://jfly.uni-koeln.de/color/),
 * chosen to stay apart for the common kinds of colour blindness, each with the text colour that
 * reads on it. The map never relies on colour alone: every cell also shows its treatment code
 * and a fill pattern.
 */
const OKABE_ITO = [
  { fill: '#E69F00', ink: '#1f1a12' },
  { fill: '#56B4E9', ink: '#10202b' },
  { fill: '#009E73', ink: '#ffffff' },
  { fill: '#F0E442', ink: '#1f1a12' },
  { fill: '#0072B2', ink: '#ffffff' },
  { fill: '#D55E00', ink: '#ffffff' },
  { fill: '#CC79A7', ink: '#1f1a12' },
  { fill: '#000000', ink: '#ffffff' },
] as const;

/** Fill patterns (classes in theme.css) that repeat with the colours offset, so pairs stay unique longer. */
const PATTERNS = ['solid', 'stripes', 'dots', 'hatch', 'rows', 'columns'] as const;

export interface TreatmentSwatch {
  fill: string;
  ink: string;
  pattern: (typeof PATTERNS)[number];
}

/** The control is plain paper with a dashed edge; every other treatment takes the next colour and pattern. */
export function treatmentSwatches(treatments: Treatment[]): Map<number, TreatmentSwatch> {
  const swatches = new Map<number, TreatmentSwatch>();
  let next = 0;
  for (const treatment of [...treatments].sort((a, b) => a.position - b.position)) {
    if (treatment.isControl) {
      swatches.set(treatment.id, { fill: '#ffffff', ink: '#2b2420', pattern: 'solid' });
      continue;
    }
    const colour = OKABE_ITO[next % OKABE_ITO.length];
    const pattern = PATTERNS[(next + Math.floor(next / OKABE_ITO.length)) % PATTERNS.length];
    swatches.set(treatment.id, { ...colour, pattern });
    next += 1;
  }
  return swatches;
}
