import type { ChartConfiguration } from 'chart.js';

import type { ChartModel } from '../chart-model';
import type { ChartColours } from './chart-colours';

/**
 * The chart.js configuration of a model in our theme's colours. Tooltips stay (they help pointer
 * users); the table under each chart carries the same values for everyone else. Without motion
 * when the reader asked their system for less.
 */
export function chartConfig(model: ChartModel, colours: ChartColours, reduceMotion: boolean): ChartConfiguration {
  const doughnut = model.kind === 'doughnut';
  const type = model.kind === 'horizontal-bar' ? 'bar' : model.kind;
  const datasets = model.series.map((series, index) => {
    const colour = colours.series[index % colours.series.length];
    return {
      label: series.label,
      data: [...series.values],
      backgroundColor: doughnut ? model.labels.map((_, i) => colours.series[i % colours.series.length]) : colour,
      borderColor: doughnut ? colours.surface : colour,
      borderWidth: doughnut ? 2 : model.kind === 'line' ? 2 : 0,
      borderRadius: type === 'bar' ? 4 : 0,
      spanGaps: true,
      pointRadius: 3,
    };
  });
  const axis = { ticks: { color: colours.text, precision: 0 }, grid: { color: colours.grid } };
  return {
    type,
    data: { labels: [...model.labels], datasets },
    options: {
      responsive: true,
      maintainAspectRatio: false,
      animation: reduceMotion ? false : { duration: 400 },
      indexAxis: model.kind === 'horizontal-bar' ? 'y' : 'x',
      plugins: {
        legend: { display: doughnut || model.series.length > 1, position: 'bottom', labels: { color: colours.text } },
      },
      scales: doughnut ? {} : { x: axis, y: { ...axis, beginAtZero: true } },
    },
  } as ChartConfiguration;
}
