import { TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';
import { BaseChartDirective } from 'ng2-charts';

import type { ChartModel } from '../chart-model';
import { InsightsChart } from './insights-chart';

const MODEL: ChartModel = { kind: 'bar', labels: ['Jan', 'Feb'], series: [{ label: 'Minutes', values: [30, 45] }], summary: '75 minutes in all.' };

describe('InsightsChart', () => {
  it('redraws at its box’s width when the window is resized or the device turned', async () => {
    const host = document.createElement('div');
    host.style.width = '600px';
    document.body.appendChild(host);
    const fixture = TestBed.createComponent(InsightsChart);
    host.appendChild(fixture.nativeElement);
    fixture.componentRef.setInput('model', MODEL);
    fixture.componentRef.setInput('name', 'Minutes per month');
    await fixture.whenStable();
    const directive = fixture.debugElement.query(By.directive(BaseChartDirective)).injector.get(BaseChartDirective);
    await new Promise((resolve) => setTimeout(resolve, 50));
    const canvas = (fixture.nativeElement as HTMLElement).querySelector('canvas')!;
    expect(canvas.parentElement?.getAttribute('aria-hidden')).toBe('true');
    const resize = spyOn(directive.chart!, 'resize').and.callThrough();

    host.style.width = '300px';
    window.dispatchEvent(new Event('resize'));
    window.dispatchEvent(new Event('orientationchange'));

    expect(resize).toHaveBeenCalledTimes(2);
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(directive.chart!.width).toBeLessThanOrEqual(300);
    host.remove();
  });
});
