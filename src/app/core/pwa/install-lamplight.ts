import { inject } from '@angular/core';

import { LazyOverlays } from '../../ui/lazy-overlays';
import { InstallPrompt } from './install-prompt';

/**
 * Installs Lamplight: the browser's own prompt where it offers one, else (iOS) the steps to add it
 * to the home screen. Call in an injection context.
 */
export function installLamplight(): () => void {
  const prompt = inject(InstallPrompt);
  const overlays = inject(LazyOverlays);
  return () => {
    if (prompt.option() === 'ios-how-to')
      void import('./install-help-dialog').then(({ InstallHelpDialog }) => overlays.dialog(InstallHelpDialog, { width: '440px' }));
    else void prompt.install();
  };
}
