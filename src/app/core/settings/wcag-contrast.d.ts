/** Types for wcag-contrast 3 (it ships none): contrast ratios by the WCAG 2 formula. */
declare module 'wcag-contrast' {
  export function hex(a: string, b: string): number;
  export function rgb(a: readonly number[], b: readonly number[]): number;
  export function luminance(a: number, b: number): number;
  export function score(contrast: number): string;
}
