import { inject } from '@angular/core';
import { Router, type CanDeactivateFn } from '@angular/router';

import { UnsavedWork } from './unsaved-work';

/**
 * Navigation `info` for a page that is done with its work on purpose (a Cancel, a delete, a
 * sign-out that already asked): the guard lets it go without asking.
 * `<a routerLink="…" [info]="leaveWithoutAsking">` or `router.navigate([…], { info: LEAVE_WITHOUT_ASKING })`.
 */
export const LEAVE_WITHOUT_ASKING: unique symbol = Symbol('leave without asking');

/** For routes whose page tracks unsaved work: leaving it asks first ("Leave without saving?"). */
export const unsavedWorkGuard: CanDeactivateFn<unknown> = () => {
  if (inject(Router).currentNavigation()?.extras.info === LEAVE_WITHOUT_ASKING) return true;
  return inject(UnsavedWork).mayLeave();
};
