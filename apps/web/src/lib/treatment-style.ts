// One look per treatment on every chart: its own colour and marker, the control always grey with an open circle.

export interface TreatmentStyle {
  colour: string;
  /** A Plotly marker symbol. */
  marker: string;
  /** Line dash: solid for treatments, dotted for the control. */
  dash: 'solid' | 'dot';
}

/** Friable's earth tones, then steadier ones for many treatments. */
const COLOURS = ['#b5603d', '#7d9470', '#c9a227', '#4f6d8a', '#8c5a7a', '#3f7f7a', '#5b4332', '#d08c60', '#a3785a', '#2f5d50'];
const MARKERS = ['square', 'diamond', 'triangle-up', 'cross', 'star', 'triangle-down', 'x', 'pentagon', 'hexagon', 'star-diamond'];
export const CONTROL_STYLE: TreatmentStyle = Object.freeze({ colour: '#8a8580', marker: 'circle-open', dash: 'dot' });

/**
 * The style of each treatment, from the protocol's treatment order (so a treatment looks the same on every chart,
 * whatever the chart lists): the control grey, the others in order through the colours and markers.
 */
export function treatmentStyles(codes: readonly string[], controlCode: string | null | undefined): Map<string, TreatmentStyle> {
  const styles = new Map<string, TreatmentStyle>();
  let index = 0;
  for (const code of codes) {
    if (code === controlCode) {
      styles.set(code, CONTROL_STYLE);
      continue;
    }
    styles.set(code, { colour: COLOURS[index % COLOURS.length]!, marker: MARKERS[index % MARKERS.length]!, dash: 'solid' });
    index += 1;
  }
  return styles;
}

/** A treatment's style, or a neutral one for a treatment the protocol does not list. */
export function styleOf(styles: ReadonlyMap<string, TreatmentStyle>, code: string): TreatmentStyle {
  return styles.get(code) ?? { colour: '#6b6b6b', marker: 'circle', dash: 'solid' };
}
