// The insights area's public face: the year's reading heatmap, also shown on the today page.
export { YearHeatmap } from './year-heatmap/year-heatmap';
