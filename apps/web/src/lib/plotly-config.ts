/**
 * The options every Friable chart gives Plotly: no logo, and nothing that sends a chart's data to an
 * outside service (the cloud link, "edit in Chart Studio", "send data"). Lasso and box select are of
 * no use on these charts.
 */
export const plotlyConfig = Object.freeze({
  displaylogo: false,
  showLink: false,
  sendData: false,
  showSendToCloud: false,
  showEditInChartStudio: false,
  responsive: true,
  modeBarButtonsToRemove: ['lasso2d', 'select2d'],
} as const);
