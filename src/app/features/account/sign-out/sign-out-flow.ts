import { inject, Injectable } from '@angular/core';
import { Router } from '@angular/router';
import { firstValueFrom } from 'rxjs';

import { Auth } from '../../../core/auth/auth';
import { LocalJournal } from '../../../core/data/local-journal';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { LEAVE_WITHOUT_ASKING } from '../../../core/pwa/unsaved-work-guard';
import { LazyOverlays } from '../../../ui/lazy-overlays';
import type { SignOutChoice, SignOutDialog, SignOutDialogData } from './sign-out-dialog';

/**
 * Signing out: first, if the page holds unsaved changes, whether to leave them; then keep-or-erase
 * (with a warning about unsynced changes), then do it.
 */
@Injectable({ providedIn: 'root' })
export class SignOutFlow {
  private readonly auth = inject(Auth);
  private readonly journal = inject(LocalJournal);
  private readonly overlays = inject(LazyOverlays);
  private readonly router = inject(Router);
  private readonly unsaved = inject(UnsavedWork);

  async start(): Promise<void> {
    const user = this.auth.user();
    if (!user) return;
    // Asked before signing out, so that "Keep editing" still has a signed-in page to go on with.
    if (!(await this.unsaved.mayLeave())) return;
    const data: SignOutDialogData = { pendingChanges: await this.journal.pendingChanges() };
    const { SignOutDialog } = await import('./sign-out-dialog');
    const ref = await this.overlays.dialog<SignOutDialog, SignOutDialogData, SignOutChoice>(SignOutDialog, { data, width: '480px' });
    const choice = await firstValueFrom(ref.afterClosed());
    if (!choice) return;
    await this.auth.signOut();
    if (choice === 'erase') await this.journal.erase(user.id);
    await this.router.navigateByUrl('/sign-in', { info: LEAVE_WITHOUT_ASKING });
  }
}
