import { describe, expect, it } from 'vitest';
import { formatDuration } from './timing';

describe('formatDuration', () => {
  it.each([
    [850, '850 ms'],
    [12_340, '12.3 s'],
    [125_000, '2 min 05 s'],
    [119_600, '2 min 00 s'],
  ])('%d ms -> %s', (ms, text) => {
    expect(formatDuration(ms)).toBe(text);
  });
});
