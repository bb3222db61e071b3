import { Component } from '@angular/core';

import { renderHost } from '../testing/render-host';
import { AddLine } from './add-line';

@Component({
  imports: [AddLine],
  template: `<ll-add-line label="Another prompt" (added)="lines.push($event)" />`,
})
class Host {
  readonly lines: string[] = [];
}

describe('AddLine', () => {
  it('sends the trimmed line and empties the field, and adds nothing for a blank line', async () => {
    const host = await renderHost(Host);
    const input = host.find<HTMLInputElement>('input');
    const add = (text: string) => {
      input.value = text;
      input.dispatchEvent(new Event('input'));
      host.find<HTMLButtonElement>('button').click();
    };
    expect(host.text('mat-label')).toBe('Another prompt');
    expect(input.maxLength).toBe(300);

    add('  A book set at sea  ');
    await host.fixture.whenStable();
    expect(input.value).toBe('');
    add('   ');
    expect(host.fixture.componentInstance.lines).toEqual(['A book set at sea']);
  });
});
