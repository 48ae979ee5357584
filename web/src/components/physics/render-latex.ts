import katex from 'katex';
import { KATEX_OPTIONS } from '@core/lessons/katex-options';

export type LatexParseProblem = { message: string; position: number | null };

/**
 * Renders teacher LaTeX with the shared KATEX_OPTIONS (trust off, bounded sizes). A parse error
 * never throws: it comes back as a readable message with its position in the source, and the
 * HTML is KaTeX's own inert error rendering (the source in red).
 */
export function renderLatex(latex: string, display: boolean): { html: string; problem: LatexParseProblem | null } {
  let problem: LatexParseProblem | null = null;
  try {
    katex.renderToString(latex, { ...KATEX_OPTIONS, displayMode: display, throwOnError: true });
  } catch (error) {
    if (error instanceof katex.ParseError) {
      problem = { message: error.rawMessage || error.message, position: Number.isInteger(error.position) ? error.position : null };
    } else {
      problem = { message: error instanceof Error ? error.message : 'The formula could not be read.', position: null };
    }
  }
  const html = katex.renderToString(latex, { ...KATEX_OPTIONS, displayMode: display, throwOnError: false });
  return { html, problem };
}

/**
 * "Undefined control sequence: \foo (at character 12)": the position counted from 1, as people
 * count, or "at the end of the formula" when the input ran out.
 */
export function describeLatexProblem(problem: LatexParseProblem, latex: string): string {
  const text = problem.message.replace(/^KaTeX parse error:\s*/, '');
  if (problem.position === null) return text;
  return problem.position >= latex.length ? `${text} (at the end of the formula)` : `${text} (at character ${problem.position + 1})`;
}
