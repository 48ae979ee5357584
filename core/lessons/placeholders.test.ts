import { describe, expect, it } from 'vitest';
import { fillPlaceholders, placeholderNames } from './placeholders';

describe('placeholderNames', () => {
  it('lists each name once, in order of first use, with spaces inside the braces allowed', () => {
    expect(placeholderNames('Radius {{a}}, {{ N }} turns, again {{a}} and {{  I  }}.')).toEqual(['a', 'N', 'I']);
  });

  it('reports a malformed name as written so it can be flagged as undeclared', () => {
    expect(placeholderNames('Value {{ 2a }} and {{}}')).toEqual(['2a', '']);
  });

  it('finds nothing in plain text or single braces', () => {
    expect(placeholderNames('A set {a, b} and $\\frac{1}{2}$')).toEqual([]);
  });
});

describe('fillPlaceholders', () => {
  it('replaces known names with their values and keeps unknown ones', () => {
    expect(fillPlaceholders('r = {{ a }}, N = {{N}}, {{b}}', { a: '4.5 cm', N: 20 })).toBe('r = 4.5 cm, N = 20, {{b}}');
  });

  it('does not treat inherited object properties as values', () => {
    expect(fillPlaceholders('{{toString}}', {})).toBe('{{toString}}');
  });
});
