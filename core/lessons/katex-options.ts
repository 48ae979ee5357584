import type { KatexOptions } from 'katex';

/**
 * KaTeX settings for everything a teacher writes: no trust (\href, \url, \htmlClass, \includegraphics
 * stay inert), bounded sizes and macro expansion so a formula cannot freeze a student's browser.
 */
export const KATEX_OPTIONS = {
  trust: false,
  maxSize: 10,
  maxExpand: 200,
  strict: 'ignore',
  output: 'htmlAndMathml',
} as const satisfies KatexOptions;
