import { chartConfig } from './chart-config';

const colours = { series: ['rgb(1, 1, 1)', 'rgb(2, 2, 2)'], text: 'rgb(3, 3, 3)', grid: 'rgb(4, 4, 4)', surface: 'rgb(5, 5, 5)' };

describe('chartConfig', () => {
  it('lays a horizontal bar chart on the y axis and keeps still when motion is reduced', () => {
    const config = chartConfig({ kind: 'horizontal-bar', labels: ['Sea'], series: [{ label: 'Books', values: [2] }], summary: '' }, colours, true);
    expect(config.type).toBe('bar');
    expect(config.options?.indexAxis).toBe('y');
    expect(config.options?.animation).toBeFalse();
    expect(config.data.datasets[0].backgroundColor).toBe('rgb(1, 1, 1)');
  });

  it('gives each slice of a ring its own colour, with no axes', () => {
    const config = chartConfig(
      { kind: 'doughnut', labels: ['Print', 'Ebook', 'Audiobook'], series: [{ label: 'Books', values: [1, 2, 3] }], summary: '' },
      colours,
      false,
    );
    expect(config.data.datasets[0].backgroundColor).toEqual(['rgb(1, 1, 1)', 'rgb(2, 2, 2)', 'rgb(1, 1, 1)']);
    expect(config.options?.scales).toEqual({});
    expect(config.options?.animation).toEqual({ duration: 400 });
  });
});
