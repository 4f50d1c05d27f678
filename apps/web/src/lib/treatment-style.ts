/**
 * Treatment style — the one colour, marker shape and fill pattern a treatment keeps on every chart,
 * map and sheet of its trial. Colours are Okabe & Ito's set (2008, "Color Universal Design",
 * https://jfly.uni-koeln.de/color/), chosen to stay apart for the common kinds of colour blindness;
 * each treatment also has its own marker shape, so no chart relies on colour alone. The control is
 * always neutral grey with an open circle. Styles follow the protocol's order of treatments, so the
 * same trial draws the same treatment the same way wherever it appears.
 *
 * Example: `treatmentStyles(['CTL', 'GYP', 'CMP'], 'CTL').get('GYP')` →
 * `{ colour: '#E69F00', ink: '#1f1a12', marker: 'circle', pattern: 'solid', isControl: false }`.
 */
export interface TreatmentStyle {
  /** Line, marker and fill colour. */
  colour: string;
  /** Text colour that reads on `colour`. */
  ink: string;
  /** A Plotly marker symbol. */
  marker: (typeof MARKERS)[number] | 'circle-open';
  /** A fill pattern class of theme.css (`fr-pattern--<pattern>`) for maps and swatches. */
  pattern: (typeof PATTERNS)[number];
  isControl: boolean;
}

/** Okabe–Ito, in the published order (orange, sky blue, bluish green, yellow, blue, vermilion, reddish purple, black). */
const OKABE_ITO = [
  { colour: '#E69F00', ink: '#1f1a12' },
  { colour: '#56B4E9', ink: '#10202b' },
  { colour: '#009E73', ink: '#ffffff' },
  { colour: '#F0E442', ink: '#1f1a12' },
  { colour: '#0072B2', ink: '#ffffff' },
  { colour: '#D55E00', ink: '#ffffff' },
  { colour: '#CC79A7', ink: '#1f1a12' },
  { colour: '#000000', ink: '#ffffff' },
] as const;

/** Filled shapes for treatments; the control alone has the open circle. */
const MARKERS = ['circle', 'square', 'diamond', 'triangle-up', 'triangle-down', 'cross', 'x', 'star', 'pentagon', 'hexagon', 'star-triangle-up', 'hourglass'] as const;

const PATTERNS = ['solid', 'stripes', 'dots', 'hatch', 'rows', 'columns'] as const;

/** Neutral grey for the untreated control (dark ink on it reads at 6:1). */
export const CONTROL_STYLE: TreatmentStyle = Object.freeze({ colour: '#999999', ink: '#1f1a12', marker: 'circle-open', pattern: 'solid', isControl: true });

/** The style of the n-th treatment that is not the control (0-based), repeating shapes and patterns offset from the colours. */
export function nthTreatmentStyle(index: number): TreatmentStyle {
  const colour = OKABE_ITO[index % OKABE_ITO.length];
  return Object.freeze({
    ...colour,
    marker: MARKERS[index % MARKERS.length],
    pattern: PATTERNS[(index + Math.floor(index / OKABE_ITO.length)) % PATTERNS.length],
    isControl: false,
  });
}

/**
 * Styles by treatment code. `codes` in the protocol's order; `controlCode` the untreated control
 * (grey). A code not in the list (an unexpected label in the data) gets the next style after them.
 */
export function treatmentStyles(codes: readonly string[], controlCode?: string | null): ReadonlyMap<string, TreatmentStyle> {
  const styles = new Map<string, TreatmentStyle>();
  let next = 0;
  for (const code of codes) {
    if (styles.has(code)) continue;
    if (controlCode !== undefined && controlCode !== null && code === controlCode) styles.set(code, CONTROL_STYLE);
    else styles.set(code, nthTreatmentStyle(next++));
  }
  return styles;
}

/** Styles of a trial's treatments (by code), from the protocol's own list and control flag. */
export function trialTreatmentStyles(treatments: ReadonlyArray<{ code: string; isControl: boolean; position: number }>): ReadonlyMap<string, TreatmentStyle> {
  const ordered = [...treatments].sort((a, b) => a.position - b.position);
  return treatmentStyles(
    ordered.map((t) => t.code),
    ordered.find((t) => t.isControl)?.code ?? null,
  );
}

/** One code's style from a map, or a stable fallback for a code the map does not know. */
export function styleOf(styles: ReadonlyMap<string, TreatmentStyle>, code: string): TreatmentStyle {
  return styles.get(code) ?? nthTreatmentStyle(styles.size + [...code].reduce((sum, c) => sum + c.charCodeAt(0), 0));
}
