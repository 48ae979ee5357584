import katex from 'katex';
import type { MarkdownIt, StateBlock, StateInline } from 'markdown-it';
import { KATEX_OPTIONS } from '@core/lessons/katex-options';

/**
 * `$…$` (inline) and `$$…$$` (display) math for markdown-it, rendered by KaTeX with the project's
 * KATEX_OPTIONS (trust off, bounded size and expansion). A broken formula becomes KaTeX's own red
 * error text instead of breaking the page.
 */
export function renderTex(tex: string, displayMode: boolean): string {
  try {
    return katex.renderToString(tex, { ...KATEX_OPTIONS, displayMode, throwOnError: false });
  } catch (error) {
    // throwOnError: false covers parse errors; anything else (an internal limit) is shown the same way.
    const message = error instanceof Error ? error.message : 'This formula could not be rendered.';
    const escape = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
    return `<span class="katex-error" title="${escape(message)}">${escape(tex)}</span>`;
  }
}

const DOLLAR = 0x24;
const BACKSLASH = 0x5c;

function isSpace(code: number): boolean {
  return code === 0x20 || code === 0x09 || code === 0x0a;
}

function isDigit(code: number): boolean {
  return code >= 0x30 && code <= 0x39;
}

/** The next unescaped `$` (or `$$`) at or after `from`, or -1. */
function findClosing(src: string, from: number, max: number, double: boolean): number {
  for (let pos = from; pos < max; pos++) {
    const code = src.charCodeAt(pos);
    if (code === BACKSLASH) {
      pos++;
      continue;
    }
    if (code !== DOLLAR) continue;
    if (!double) return pos;
    if (src.charCodeAt(pos + 1) === DOLLAR && pos + 1 < max) return pos;
  }
  return -1;
}

function mathInline(state: StateInline, silent: boolean): boolean {
  const { src, pos, posMax } = state;
  if (src.charCodeAt(pos) !== DOLLAR) return false;
  const double = src.charCodeAt(pos + 1) === DOLLAR;
  const start = pos + (double ? 2 : 1);
  if (start >= posMax) return false;
  // Like Pandoc: "$5 and $10" stays text (no space after the opening, none before the closing, no digit after it).
  if (!double && isSpace(src.charCodeAt(start))) return false;
  let close = findClosing(src, start, posMax, double);
  while (!double && close !== -1 && (isSpace(src.charCodeAt(close - 1)) || isDigit(src.charCodeAt(close + 1)))) {
    close = findClosing(src, close + 1, posMax, false);
  }
  if (close === -1 || close === start) return false;
  if (!silent) {
    const token = state.push(double ? 'math_display' : 'math_inline', 'math', 0);
    token.content = src.slice(start, close);
    token.markup = double ? '$$' : '$';
  }
  state.pos = close + (double ? 2 : 1);
  return true;
}

/** A paragraph-level `$$` block: opening `$$` at the start of a line, closing `$$` at the end of one. */
function mathBlock(state: StateBlock, startLine: number, endLine: number, silent: boolean): boolean {
  let pos = state.bMarks[startLine]! + state.tShift[startLine]!;
  let max = state.eMarks[startLine]!;
  if (state.sCount[startLine]! - state.blkIndent >= 4) return false;
  if (pos + 2 > max || state.src.slice(pos, pos + 2) !== '$$') return false;
  pos += 2;
  let firstLine = state.src.slice(pos, max);
  let lastLine = '';
  let next = startLine;
  let found = false;
  if (firstLine.trim().endsWith('$$')) {
    firstLine = firstLine.trim().slice(0, -2);
    found = true;
  }
  if (silent) return true;
  while (!found) {
    next++;
    if (next >= endLine) break;
    pos = state.bMarks[next]! + state.tShift[next]!;
    max = state.eMarks[next]!;
    if (pos < max && state.sCount[next]! < state.blkIndent) break;
    const line = state.src.slice(pos, max).trim();
    if (line.endsWith('$$')) {
      lastLine = line.slice(0, -2);
      found = true;
    }
  }
  // No closing `$$`: not a block; the inline rule or plain text takes it.
  if (!found) return false;
  state.line = next + 1;
  const token = state.push('math_block', 'math', 0);
  token.block = true;
  token.content =
    (firstLine.trim() ? `${firstLine}\n` : '') + state.getLines(startLine + 1, next, state.tShift[startLine]!, true) + lastLine;
  token.map = [startLine, state.line];
  token.markup = '$$';
  return true;
}

/** The markdown-it plugin: registers the rules and their renderers. */
export function markdownMath(md: MarkdownIt): void {
  md.inline.ruler.after('escape', 'math_inline', mathInline);
  md.block.ruler.before('fence', 'math_block', mathBlock, { alt: ['paragraph', 'reference', 'blockquote', 'list'] });
  md.renderer.rules.math_inline = (tokens, idx) => renderTex(tokens[idx]!.content, false);
  md.renderer.rules.math_display = (tokens, idx) => renderTex(tokens[idx]!.content, true);
  md.renderer.rules.math_block = (tokens, idx) => `<div class="math-block">${renderTex(tokens[idx]!.content, true)}</div>\n`;
}
