/**
 * Series colours, as theme tokens. Canvas cannot read CSS variables, and our tokens are
 * `light-dark()` pairs, so each is resolved by letting the browser compute a `color`.
 */
const SERIES_TOKENS = ['--mat-sys-primary', '--mat-sys-tertiary', '--mat-sys-secondary', '--mat-sys-error'] as const;

export interface ChartColours {
  readonly series: readonly string[];
  readonly text: string;
  readonly grid: string;
  readonly surface: string;
}

/** The theme's colours as the browser resolves them inside `host` (light or dark scheme). */
export function chartColours(host: HTMLElement): ChartColours {
  const resolve = (token: string) => {
    const probe = host.ownerDocument.createElement('span');
    probe.style.color = `var(${token})`;
    probe.hidden = true;
    host.appendChild(probe);
    const colour = getComputedStyle(probe).color;
    probe.remove();
    return colour;
  };
  return {
    series: SERIES_TOKENS.map(resolve),
    text: resolve('--mat-sys-on-surface-variant'),
    grid: resolve('--mat-sys-outline-variant'),
    surface: resolve('--mat-sys-surface'),
  };
}
