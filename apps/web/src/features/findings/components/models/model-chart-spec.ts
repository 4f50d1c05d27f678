// What the model charts draw, built by the views without touching Plotly (which loads lazily).

export type ModelChartSpec =
  | {
      chart: 'not-drained';
      title: string;
      unit: string;
      band: boolean;
      curves: Array<{ treatment: string; name: string; points: Array<{ time: number; notDrained: number; lower: number | null; upper: number | null }> }>;
    }
  | { chart: 'ratios'; title: string; axis: string; ratios: Array<{ treatment: string; name: string; ratio: number; lower: number; upper: number }> }
  | {
      chart: 'over-time';
      title: string;
      axis: string;
      days: number[];
      dayLabels: string[];
      series: Array<{ treatment: string; name: string; points: Array<{ round: string; day: number; mean: number; se: number }> }>;
    }
  | { chart: 'shares'; title: string; categories: string[]; rows: Array<{ treatment: string; name: string; shares: number[] }> };

/** The height each model chart draws at (its place is kept at it before Plotly loads). */
export function modelChartHeight(spec: ModelChartSpec): number {
  switch (spec.chart) {
    case 'ratios':
      return 120 + 36 * spec.ratios.length;
    case 'shares':
      return 170 + 36 * spec.rows.length;
    default:
      return 380;
  }
}
