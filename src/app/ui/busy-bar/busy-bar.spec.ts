import { ChangeDetectionStrategy, Component } from '@angular/core';
import { DeferBlockBehavior, DeferBlockState, TestBed } from '@angular/core/testing';

import { BusyBar } from './busy-bar';

@Component({
  imports: [BusyBar],
  template: `<ll-busy-bar label="Signing in" />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class Host {}

describe('BusyBar', () => {
  it('shows nothing until its deferred progress bar has loaded, then an indeterminate bar named by its label', async () => {
    TestBed.configureTestingModule({ imports: [Host], deferBlockBehavior: DeferBlockBehavior.Manual });
    const fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    expect(element.querySelector('mat-progress-bar')).toBeNull();

    const [block] = await fixture.getDeferBlocks();
    await block!.render(DeferBlockState.Complete);

    const bar = element.querySelector('mat-progress-bar');
    expect(bar?.getAttribute('role')).toBe('progressbar');
    expect(bar?.getAttribute('aria-label')).toBe('Signing in');
    expect(bar?.getAttribute('mode')).toBe('indeterminate');
  });
});
