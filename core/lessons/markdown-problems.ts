import katex from 'katex';
import MarkdownIt from 'markdown-it';
import type { LessonProblem } from '../contracts/lessons';
import { KATEX_OPTIONS } from './katex-options';

/** Only this school's uploads may be shown as images (served by the API with their sniffed type). */
const LESSON_IMAGE = /^\/api\/lesson-images\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const HTTP = /^https?:\/\//i;

// The renderer's settings, but every written link becomes a token so that a refused one can be named.
const parser = new MarkdownIt({ html: false, linkify: true });
parser.validateLink = () => true;

type Token = ReturnType<typeof parser.parse>[number];

function* walk(tokens: Token[]): Generator<Token> {
  for (const token of tokens) {
    yield token;
    if (token.children) yield* walk(token.children);
  }
}

/** Whether LaTeX parses with the settings every renderer uses; the KaTeX message when it does not. */
export function latexProblem(latex: string, displayMode: boolean): string | null {
  try {
    katex.renderToString(latex, { ...KATEX_OPTIONS, throwOnError: true, displayMode });
    return null;
  } catch (error) {
    if (error instanceof katex.ParseError) {
      // rawMessage leaves out KaTeX's underlined excerpt, which reads badly as plain text.
      const at = error.position === undefined ? '' : ` (at character ${error.position + 1})`;
      return `KaTeX cannot read it: ${error.rawMessage}${at}.`;
    }
    if (error instanceof Error) return `KaTeX cannot render it: ${error.message}`;
    throw error;
  }
}

/** Code is shown as written, so math inside it is not checked. */
function withoutCode(markdown: string): string {
  return markdown.replace(/^(`{3,}|~{3,})[^\n]*\n[\s\S]*?^\1[^\n]*$/gm, ' ').replace(/(`+)[^`]*?\1/g, ' ');
}

/**
 * The math in a Markdown text: `$$…$$` (display) and `$…$` (inline: no space just inside the
 * dollars and no digit right after the closing one, so "$5 and $10" stays text); `\$` is a dollar.
 */
export function mathSpans(markdown: string): { tex: string; display: boolean }[] {
  const text = withoutCode(markdown);
  const spans: { tex: string; display: boolean }[] = [];
  let i = 0;
  while (i < text.length) {
    const ch = text[i];
    if (ch === '\\') {
      i += 2;
      continue;
    }
    if (ch !== '$') {
      i++;
      continue;
    }
    if (text[i + 1] === '$') {
      const end = text.indexOf('$$', i + 2);
      if (end < 0) break;
      spans.push({ tex: text.slice(i + 2, end), display: true });
      i = end + 2;
      continue;
    }
    const close = findInlineClose(text, i + 1);
    if (close < 0) {
      i++;
      continue;
    }
    spans.push({ tex: text.slice(i + 1, close), display: false });
    i = close + 1;
  }
  return spans;
}

function findInlineClose(text: string, start: number): number {
  if (start >= text.length || /\s/.test(text[start] ?? '')) return -1;
  for (let j = start; j < text.length; j++) {
    const ch = text[j];
    if (ch === '\\') {
      j++;
    } else if (ch === '\n' && text[j + 1] === '\n') {
      return -1;
    } else if (ch === '$' && j > start && !/\s/.test(text[j - 1] ?? '') && !/\d/.test(text[j + 1] ?? '')) {
      return j;
    }
  }
  return -1;
}

/**
 * Problems in one Markdown field: math that KaTeX cannot parse, links that are not http(s), images
 * that are not this school's uploads. Plain addresses the renderer links by itself are left to it.
 */
export function markdownProblems(markdown: string, path: string): LessonProblem[] {
  if (markdown.trim() === '') return [];
  const problems: LessonProblem[] = [];
  for (const span of mathSpans(markdown)) {
    const shown = span.display ? `$$${span.tex}$$` : `$${span.tex}$`;
    if (span.tex.trim() === '') {
      problems.push({ path, message: `The math ${shown} is empty: write the formula between the dollars or remove them.` });
      continue;
    }
    const problem = latexProblem(span.tex, span.display);
    if (problem) problems.push({ path, message: `The math ${short(shown)} cannot be shown: ${problem}` });
  }
  for (const token of walk(parser.parse(markdown, {}))) {
    if (token.type === 'link_open' && token.markup !== 'linkify') {
      const href = String(token.attrGet('href') ?? '');
      if (!HTTP.test(href)) problems.push({ path, message: `Links must start with http:// or https:// (this one is “${short(href)}”).` });
    }
    if (token.type === 'image') {
      const src = String(token.attrGet('src') ?? '');
      if (!LESSON_IMAGE.test(src)) {
        problems.push({
          path,
          message: `Images must be uploaded with “Add image”; “${short(src)}” is not an image uploaded to this lesson's school.`,
        });
      }
    }
  }
  return problems;
}

function short(text: string): string {
  return text.length > 60 ? `${text.slice(0, 57)}…` : text;
}
