import { DOCUMENT, effect, inject, Injectable } from '@angular/core';

import { ReaderSettings } from './reader-settings';
import { THEME_PALETTES, type ThemeRole } from './themes';

/**
 * Puts the reader's theme on the page: one of ours sets Material's colour roles on <html> (and
 * its light or dark scheme); "system" removes them, so the stylesheet's light/dark follows the device.
 */
@Injectable({ providedIn: 'root' })
export class ApplyTheme {
  private readonly root = inject(DOCUMENT).documentElement;
  private readonly settings = inject(ReaderSettings);
  private applied: readonly ThemeRole[] = [];

  constructor() {
    effect(() => this.apply(this.settings.theme()));
  }

  private apply(id: string): void {
    for (const role of this.applied) this.root.style.removeProperty(`--mat-sys-${role}`);
    const palette = THEME_PALETTES.find((theme) => theme.id === id);
    this.applied = palette ? (Object.keys(palette.colours) as ThemeRole[]) : [];
    if (!palette) {
      this.root.style.removeProperty('color-scheme');
      delete this.root.dataset['theme'];
      return;
    }
    for (const role of this.applied) this.root.style.setProperty(`--mat-sys-${role}`, palette.colours[role]);
    this.root.style.setProperty('color-scheme', palette.scheme);
    this.root.dataset['theme'] = palette.id;
  }
}
