// What the plots draw, built by the pages without touching Plotly (which loads lazily).

/** One plot's value; a censored value sits at its cut-off (e.g. not drained by 600 s). */
export interface PlotValue {
  treatment: string;
  site?: string;
  value: number;
  censored: boolean;
}

/** A line of points per series: sites in the interaction plot, treatments over time or drainage. */
export interface PlotSeries {
  name: string;
  points: Array<{ x: number | string; y: number; se?: number | null }>;
}

export interface FindingsPlotInputs {
  measureName: string;
  unit?: string;
  values: PlotValue[];
  /** Site × treatment means from the server (combined analyses only). */
  interaction?: PlotSeries[];
  /** Time-with-cutoff measures: share of plots not yet drained against time, per treatment. */
  notDrained?: { unit: string; series: PlotSeries[] };
  /** Across rounds: treatment means per round. */
  overTime?: PlotSeries[];
}

/** The height a chart draws at unless its layout says otherwise (its place is kept at it before it loads). */
export const CHART_HEIGHT = 320;
