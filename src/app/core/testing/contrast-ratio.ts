/**
 * Contrast as WCAG 2.2 defines it: (L1 + 0.05) / (L2 + 0.05), with L the relative luminance
 * 0.2126 R + 0.7152 G + 0.0722 B of linearised sRGB (WCAG 2.2, definition of "relative
 * luminance"; SC 1.4.3 Contrast (Minimum) asks 4.5:1 for text, SC 1.4.11 3:1 for components).
 * For specs of colours we choose; checked against the wcag-contrast library in its own spec.
 */
export function contrastRatio(foreground: string, background: string): number {
  const luminance = (colour: string) => {
    const [r, g, b] = [1, 3, 5].map((at) => parseInt(colour.slice(at, at + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
    return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
  };
  const [light, dark] = [luminance(foreground), luminance(background)].sort((a, b) => b - a);
  return (light! + 0.05) / (dark! + 0.05);
}
