/**
 * Starts loading the charting library without drawing anything: a page whose charts are its content (Findings)
 * calls it as it opens, so Plotly's chunk downloads and compiles while the analysis is computed instead of after it.
 */
export function preloadPlotly(): void {
  // A failure here is not shown: the chart's own import retries and says so where the chart would be.
  import('./plotly').catch(() => undefined);
}
