import { inject } from '@angular/core';
import { MatIconRegistry } from '@angular/material/icon';

import { ICON_FONT_CLASS } from './icon-font-names';

export { ICON_FONT_CLASS } from './icon-font-names';

/**
 * Points every `<mat-icon>` without a `fontSet` of its own at our icon font (Material's default is
 * the `material-icons` font, which we do not ship). Set on the icon registry by the signed-in shell
 * rather than provided in the app config (`MAT_ICON_DEFAULT_OPTIONS`), whose import would bring
 * Material's icon module into the sign-in page; only signed-in screens show icons. Call it in an
 * injection context before the first icon renders.
 */
export function useIconFont(): void {
  inject(MatIconRegistry).setDefaultFontSetClass(ICON_FONT_CLASS);
}
