import { Component, inject, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { provideRouter, Router } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';

import { clearOverlays } from '../testing/reader-moment';
import { UnsavedWork } from './unsaved-work';
import { leaveAnswer, leaveQuestion, untilTicked } from './testing/leave-question';
import { LEAVE_WITHOUT_ASKING, unsavedWorkGuard } from './unsaved-work-guard';

@Component({ selector: 'll-draft-page', template: '<p>Draft</p>' })
class DraftPage {
  readonly dirty = signal(false);
  constructor() {
    inject(UnsavedWork).track(this.dirty);
  }
}

@Component({ selector: 'll-elsewhere', template: '<p>Elsewhere</p>' })
class Elsewhere {}

describe('unsavedWorkGuard', () => {
  let harness: RouterTestingHarness;
  let router: Router;
  let page: DraftPage;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [
        provideRouter([
          { path: 'draft', component: DraftPage, canDeactivate: [unsavedWorkGuard] },
          { path: 'elsewhere', component: Elsewhere },
          { path: 'further', component: Elsewhere },
        ]),
      ],
    });
    harness = await RouterTestingHarness.create('/draft');
    router = TestBed.inject(Router);
    page = harness.routeDebugElement!.componentInstance as DraftPage;
  });

  afterEach(clearOverlays);

  it('lets the reader leave at once when nothing is unsaved', async () => {
    const open = spyOn(TestBed.inject(MatDialog), 'open').and.callThrough();
    expect(await router.navigateByUrl('/elsewhere')).toBeTrue();
    expect(router.url).toBe('/elsewhere');
    expect(open).not.toHaveBeenCalled();
  });

  it('asks with unsaved work, "Keep editing" focused, and stays on "Keep editing"', async () => {
    page.dirty.set(true);
    const navigation = router.navigateByUrl('/elsewhere');
    await untilTicked(() => document.activeElement === leaveAnswer('Keep editing'), 'the question, with focus on Keep editing');
    expect(leaveQuestion()?.querySelector('h2')?.textContent?.trim()).toBe('Leave without saving?');
    expect(leaveQuestion()?.textContent).toContain('Your changes to this page are not saved yet.');

    leaveAnswer('Keep editing').click();
    expect(await navigation).toBeFalse();
    expect(router.url).toBe('/draft');
    expect(harness.routeNativeElement?.textContent).toBe('Draft');
    expect(page.dirty()).toBeTrue();
  });

  it('leaves on "Leave"', async () => {
    page.dirty.set(true);
    const navigation = router.navigateByUrl('/elsewhere');
    await untilTicked(() => !!leaveQuestion(), 'the question');
    leaveAnswer('Leave').click();
    expect(await navigation).toBeTrue();
    expect(router.url).toBe('/elsewhere');
    expect(harness.routeNativeElement?.textContent).toBe('Elsewhere');
  });

  it('asks once when another navigation comes while it asks, and follows the answer to the last one', async () => {
    page.dirty.set(true);
    const first = router.navigateByUrl('/elsewhere');
    await untilTicked(() => !!leaveQuestion(), 'the question');
    const second = router.navigateByUrl('/further');
    await new Promise((resolve) => setTimeout(resolve, 50));
    TestBed.tick();
    expect(document.querySelectorAll('ll-leave-dialog').length).toBe(1);

    leaveAnswer('Leave').click();
    expect(await second).toBeTrue();
    expect(await first).toBeFalse(); // superseded by the second
    expect(router.url).toBe('/further');
  });

  it('does not ask when the page says it is done on purpose', async () => {
    const open = spyOn(TestBed.inject(MatDialog), 'open').and.callThrough();
    page.dirty.set(true);
    expect(await router.navigateByUrl('/elsewhere', { info: LEAVE_WITHOUT_ASKING })).toBeTrue();
    expect(router.url).toBe('/elsewhere');
    expect(open).not.toHaveBeenCalled();
  });
});
