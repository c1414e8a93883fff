// plotly.js-dist-min ships no types; the bench uses a handful of its functions through load-plotly.ts.
declare module "plotly.js-dist-min";
