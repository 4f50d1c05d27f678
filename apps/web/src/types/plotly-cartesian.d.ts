// The cartesian bundle ships no types of its own: it is Plotly's API with fewer trace types.
declare module 'plotly.js-cartesian-dist-min' {
  import Plotly from 'plotly.js-dist-min';
  export default Plotly;
}
