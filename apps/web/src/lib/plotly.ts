import Plotly from 'plotly.js-cartesian-dist-min';
import createPlotlyComponent from 'react-plotly.js/factory';

// Plotly's cartesian bundle (scatter, box, bar, heatmap…: what Friable draws; 1.5 MB, a third of the
// full bundle with its maps and 3-D). Import this module only from a file that is itself loaded
// lazily (React.lazy), so that the charting library comes with the first chart and never earlier.
export const Plot = createPlotlyComponent(Plotly);
