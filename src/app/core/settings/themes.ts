import type { Theme } from '@shared/sync/schema/collections';

/** The Material colour roles a Lamplight theme sets (as `--mat-sys-NAME`). */
export type ThemeRole =
  | 'primary'
  | 'on-primary'
  | 'primary-container'
  | 'on-primary-container'
  | 'secondary-container'
  | 'on-secondary-container'
  | 'tertiary'
  | 'on-tertiary'
  | 'tertiary-container'
  | 'on-tertiary-container'
  | 'error'
  | 'on-error'
  | 'background'
  | 'on-background'
  | 'surface'
  | 'on-surface'
  | 'surface-variant'
  | 'on-surface-variant'
  | 'surface-container-lowest'
  | 'surface-container-low'
  | 'surface-container'
  | 'surface-container-high'
  | 'surface-container-highest'
  | 'outline'
  | 'outline-variant'
  | 'inverse-surface'
  | 'inverse-on-surface'
  | 'inverse-primary';

/** One of Lamplight's own themes: its words and its colours. */
export interface ThemePalette {
  readonly id: Exclude<Theme, 'system'>;
  readonly name: string;
  readonly description: string;
  readonly scheme: 'light' | 'dark';
  readonly colours: Readonly<Record<ThemeRole, string>>;
}

/**
 * Our three themes besides the system's light and dark. Every text role keeps 4.5:1 on the
 * backgrounds it is drawn on (checked in themes.spec.ts).
 */
export const THEME_PALETTES: readonly ThemePalette[] = [
  {
    id: 'lamplight',
    name: 'Lamp at night',
    description: 'Warm amber light on a deep brown page, for reading late.',
    scheme: 'dark',
    colours: {
      primary: '#ffb86b',
      'on-primary': '#3a1e00',
      'primary-container': '#5c3400',
      'on-primary-container': '#ffdcbd',
      'secondary-container': '#4a3a2a',
      'on-secondary-container': '#f5dfc8',
      tertiary: '#9fd3c9',
      'on-tertiary': '#00302a',
      'tertiary-container': '#1f4d46',
      'on-tertiary-container': '#bdeee4',
      error: '#ffb4ab',
      'on-error': '#690005',
      background: '#1c140d',
      'on-background': '#f2e4d6',
      surface: '#1c140d',
      'on-surface': '#f2e4d6',
      'surface-variant': '#4a3d31',
      'on-surface-variant': '#dcc7b2',
      'surface-container-lowest': '#150e08',
      'surface-container-low': '#241a12',
      'surface-container': '#2a1f16',
      'surface-container-high': '#352920',
      'surface-container-highest': '#40332a',
      outline: '#a8917c',
      'outline-variant': '#554639',
      'inverse-surface': '#f2e4d6',
      'inverse-on-surface': '#382c22',
      'inverse-primary': '#8a4f00',
    },
  },
  {
    id: 'moss',
    name: 'Moss and paper',
    description: 'Deep green on a pale, cool page.',
    scheme: 'light',
    colours: {
      primary: '#2f5d3a',
      'on-primary': '#ffffff',
      'primary-container': '#c8e8c9',
      'on-primary-container': '#0c2a14',
      'secondary-container': '#dbe6d6',
      'on-secondary-container': '#1a2a1a',
      tertiary: '#55557f',
      'on-tertiary': '#ffffff',
      'tertiary-container': '#e0e0ff',
      'on-tertiary-container': '#151539',
      error: '#a8261c',
      'on-error': '#ffffff',
      background: '#f6f8f2',
      'on-background': '#1a1d18',
      surface: '#f6f8f2',
      'on-surface': '#1a1d18',
      'surface-variant': '#dde5d8',
      'on-surface-variant': '#414a3f',
      'surface-container-lowest': '#ffffff',
      'surface-container-low': '#f0f3ec',
      'surface-container': '#eaeee6',
      'surface-container-high': '#e4e9e0',
      'surface-container-highest': '#dee3da',
      outline: '#6e786b',
      'outline-variant': '#c1c9bd',
      'inverse-surface': '#2e322c',
      'inverse-on-surface': '#eff2ea',
      'inverse-primary': '#a6d3ab',
    },
  },
  {
    id: 'harbour',
    name: 'Harbour morning',
    description: 'Slate blue and sea-glass on a light page.',
    scheme: 'light',
    colours: {
      primary: '#245a7a',
      'on-primary': '#ffffff',
      'primary-container': '#c9e6ff',
      'on-primary-container': '#001e30',
      'secondary-container': '#d5e4f0',
      'on-secondary-container': '#0f1d29',
      tertiary: '#7a4a62',
      'on-tertiary': '#ffffff',
      'tertiary-container': '#ffd8ea',
      'on-tertiary-container': '#30071f',
      error: '#a8261c',
      'on-error': '#ffffff',
      background: '#f5f8fb',
      'on-background': '#171c20',
      surface: '#f5f8fb',
      'on-surface': '#171c20',
      'surface-variant': '#dce3ea',
      'on-surface-variant': '#3f4851',
      'surface-container-lowest': '#ffffff',
      'surface-container-low': '#eef2f6',
      'surface-container': '#e8edf2',
      'surface-container-high': '#e2e8ee',
      'surface-container-highest': '#dce3ea',
      outline: '#6b7580',
      'outline-variant': '#c0c8d0',
      'inverse-surface': '#2c3136',
      'inverse-on-surface': '#edf1f5',
      'inverse-primary': '#93cdf2',
    },
  },
];

/** Text roles and the backgrounds each is drawn on: the pairs that must keep 4.5:1 (WCAG 2.2 SC 1.4.3). */
export const TEXT_PAIRS: readonly (readonly [ThemeRole, ThemeRole])[] = [
  ['on-primary', 'primary'],
  ['on-primary-container', 'primary-container'],
  ['on-secondary-container', 'secondary-container'],
  ['on-tertiary', 'tertiary'],
  ['on-tertiary-container', 'tertiary-container'],
  ['on-error', 'error'],
  ['on-background', 'background'],
  ['inverse-on-surface', 'inverse-surface'],
  ...(['surface', 'surface-container-lowest', 'surface-container-low', 'surface-container', 'surface-container-high', 'surface-container-highest'] as const).flatMap(
    (background) => [
      ['on-surface', background] as const,
      ['on-surface-variant', background] as const,
      ['primary', background] as const,
      ['error', background] as const,
    ],
  ),
];

/** Outlines of fields and buttons against the page: 3:1 for user-interface components (WCAG 2.2 SC 1.4.11). */
export const OUTLINE_PAIRS: readonly (readonly [ThemeRole, ThemeRole])[] = [
  ['outline', 'surface'],
  ['outline', 'surface-container-low'],
];
