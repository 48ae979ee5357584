// Vitest hands CSS imports (even ?raw) to tests as empty strings, so read the stylesheet as shipped from disk.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { contrastRatio, relativeLuminance } from './contrast';

// Source for every threshold and formula here: WCAG 2.2, definition of contrast ratio (and of relative
// luminance); success criteria 1.4.3 Contrast (Minimum): 4.5:1 for text, 3:1 for large text, and
// 1.4.11 Non-text Contrast: 3:1 for user-interface components and focus indicators.
const TEXT = 4.5;
const UI = 3;

/** The colour tokens as declared in styles.css' @theme block, so the test checks the values the app ships. */
function tokens(): Record<string, string> {
  const styles = readFileSync(`${import.meta.dirname}/../styles.css`, 'utf8');
  const found: Record<string, string> = {};
  for (const match of styles.matchAll(/--color-([a-z-]+):\s*(#[0-9a-fA-F]{6})\s*;/g)) {
    if (match[1] && match[2]) found[match[1]] = match[2];
  }
  return found;
}

// [foreground, background, minimum, where it is used]
const PAIRS: [string, string, number, string][] = [
  ['ink', 'paper', TEXT, 'body text'],
  ['ink', 'surface', TEXT, 'text in cards and tables'],
  ['ink', 'sunken', TEXT, 'table headers, neutral badges, codes'],
  ['ink', 'teal-soft', TEXT, 'demo accounts panel, info banners'],
  ['ink', 'danger-soft', TEXT, 'error banners, roster rows with problems'],
  ['ink', 'success-soft', TEXT, 'success banners'],
  ['ink-muted', 'paper', TEXT, 'secondary text'],
  ['ink-muted', 'surface', TEXT, 'hints, e-mails in tables, placeholders'],
  ['ink-muted', 'sunken', TEXT, 'muted text on sunken panels'],
  ['ink-muted', 'danger-soft', TEXT, 'muted cells in roster rows with problems'],
  ['copper', 'paper', TEXT, 'links'],
  ['copper', 'surface', TEXT, 'links in cards'],
  ['surface', 'copper', TEXT, 'primary button'],
  ['surface', 'copper-strong', TEXT, 'primary button, hovered'],
  ['copper-strong', 'copper-soft', TEXT, 'invited / admin badges'],
  ['surface', 'teal', TEXT, 'field-highlight button'],
  ['surface', 'teal-strong', TEXT, 'field-highlight button, hovered'],
  ['teal', 'paper', TEXT, 'field-related labels'],
  ['teal', 'surface', TEXT, 'icons and labels in cards'],
  ['teal', 'teal-soft', TEXT, 'icons in info banners'],
  ['teal-strong', 'teal-soft', TEXT, 'field badges, demo role labels'],
  ['teal-strong', 'surface', TEXT, 'demo role labels'],
  ['danger', 'paper', TEXT, 'field errors'],
  ['danger', 'surface', TEXT, 'field errors in cards, danger buttons'],
  ['danger', 'danger-soft', TEXT, 'errors in roster rows, danger badges, hovered danger button'],
  ['success', 'success-soft', TEXT, 'success badges'],
  ['success', 'surface', TEXT, '"Ready" rows, copied notice'],
  ['line-strong', 'surface', UI, 'input and button borders'],
  ['line-strong', 'paper', UI, 'dashed empty-state borders'],
  ['focus', 'paper', UI, 'focus ring on the page'],
  ['focus', 'surface', UI, 'focus ring in cards'],
  ['copper', 'surface', UI, 'active tab underline, checkbox accent'],
];

describe('contrast ratio (WCAG 2.2 definition)', () => {
  it('matches the definition at its fixed points', () => {
    expect(relativeLuminance('#000000')).toBe(0);
    expect(relativeLuminance('#ffffff')).toBeCloseTo(1, 10);
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 10);
    expect(contrastRatio('#777777', '#777777')).toBe(1);
    // Mid grey #777777 on white is the commonly quoted just-failing case: 4.48:1.
    expect(contrastRatio('#777777', '#ffffff')).toBeCloseTo(4.48, 2);
    expect(contrastRatio('#ffffff', '#777777')).toBe(contrastRatio('#777777', '#ffffff'));
  });

  it('refuses a colour it cannot read', () => {
    expect(() => relativeLuminance('teal')).toThrow('Expected a colour like #1b2430, got "teal".');
  });
});

describe('Pinfield colour tokens meet WCAG 2.2 AA', () => {
  const palette = tokens();

  it('reads the palette from styles.css', () => {
    expect(Object.keys(palette).length).toBeGreaterThanOrEqual(15);
  });

  it.each(PAIRS)('%s on %s is at least %s:1 (%s)', (foreground, background, minimum) => {
    const fg = palette[foreground];
    const bg = palette[background];
    expect(fg, `--color-${foreground} is declared`).toBeDefined();
    expect(bg, `--color-${background} is declared`).toBeDefined();
    expect(contrastRatio(fg ?? '', bg ?? '')).toBeGreaterThanOrEqual(minimum);
  });
});
