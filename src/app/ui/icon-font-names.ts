// Names only, no Angular Material: main.ts's start imports these, and the sign-in page loads
// without Material's icon module.

/** The class of Lamplight's icon font (`.material-symbols-outlined` in styles.scss). */
export const ICON_FONT_CLASS = 'material-symbols-outlined';
/** Its `font-family` (the `@font-face` in styles.scss). */
export const ICON_FONT_FAMILY = 'Material Symbols Outlined';
