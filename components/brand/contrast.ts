// WCAG contrast arithmetic, kept pure so the palette can be checked in unit tests.
// Source: W3C, "Web Content Accessibility Guidelines (WCAG) 2.2" (2023), definitions of
// "relative luminance" and "contrast ratio" (sRGB linearisation threshold 0.04045).

const hexPattern = /^#([0-9a-f]{6})$/i;

/** Relative luminance (0 = black, 1 = white) of a `#rrggbb` colour. */
export function getRelativeLuminance(hex: string): number {
  const match = hexPattern.exec(hex);
  if (!match?.[1]) throw new Error(`Expected a #rrggbb colour, got "${hex}"`);
  const digits = match[1];
  const [r, g, b] = [0, 2, 4].map((start) => {
    const channel = parseInt(digits.slice(start, start + 2), 16) / 255;
    return channel <= 0.04045 ? channel / 12.92 : ((channel + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** Contrast ratio between two colours, from 1 (same) to 21 (black on white); order does not matter. */
export function getContrastRatio({
  foreground,
  background,
}: {
  foreground: string;
  background: string;
}): number {
  const a = getRelativeLuminance(foreground);
  const b = getRelativeLuminance(background);
  const [lighter, darker] = a > b ? [a, b] : [b, a];
  return (lighter + 0.05) / (darker + 0.05);
}

// WCAG 2.2 AA minimums: 1.4.3 (text), 1.4.3 large text (≥ 24 px, or ≥ 18.66 px bold),
// 1.4.11 (non-text: borders of controls, focus indicators, icons that carry meaning).
export const contrastMinimum = { text: 4.5, largeText: 3, ui: 3 } as const;
export type ContrastUse = keyof typeof contrastMinimum;
