/**
 * Contrast ratio of two sRGB colours, as defined by WCAG 2.2 ("contrast ratio" and "relative luminance"
 * in the Definitions section): (L1 + 0.05) / (L2 + 0.05), L1 the lighter colour's relative luminance.
 */
export function relativeLuminance(hex: string): number {
  const match = /^#([0-9a-f]{6})$/i.exec(hex.trim());
  if (!match?.[1]) throw new Error(`Expected a colour like #1b2430, got "${hex}".`);
  const value = match[1];
  const [r, g, b] = [0, 2, 4].map((offset) => {
    const channel = parseInt(value.slice(offset, offset + 2), 16) / 255;
    // WCAG 2.2 uses 0.04045 as the threshold (the sRGB standard's value; older WCAG text printed 0.03928).
    return channel <= 0.04045 ? channel / 12.92 : ((channel + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

export function contrastRatio(foreground: string, background: string): number {
  const a = relativeLuminance(foreground);
  const b = relativeLuminance(background);
  const [lighter, darker] = a >= b ? [a, b] : [b, a];
  return (lighter + 0.05) / (darker + 0.05);
}
