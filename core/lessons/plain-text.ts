/**
 * Markdown reduced to plain words for short labels and messages: links and images keep their text,
 * emphasis, headings, quotes, list markers, code ticks and math dollars go. Not a renderer: the
 * result is only ever shown as text.
 */
export function markdownToPlain(markdown: string): string {
  return markdown
    .replace(/!\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/<((?:https?:\/\/)[^>]+)>/g, '$1')
    .replace(/^\s{0,3}(?:#{1,6}\s+|>\s?|[-*+]\s+|\d+[.)]\s+)/gm, '')
    .replace(/\$\$?/g, '')
    .replace(/\{\{\s*([^{}]*?)\s*\}\}/g, '$1')
    .replace(/\\([\\`*_{}[\]()#+\-.!$])/g, '$1')
    .replace(/[*_~`]+/g, '')
    .replace(/\s+/g, ' ')
    .trim();
}

/** The first words of a text, at most `maxWords` words and `maxChars` characters, with "…" when cut. */
export function firstWords(text: string, maxWords = 8, maxChars = 60): string {
  const words = text.split(' ').filter((w) => w !== '');
  let out = '';
  for (const word of words.slice(0, maxWords)) {
    const next = out === '' ? word : `${out} ${word}`;
    if (next.length > maxChars) break;
    out = next;
  }
  if (out === '' && words.length > 0) out = (words[0] ?? '').slice(0, maxChars);
  return out.length < words.join(' ').length ? `${out}…` : out;
}
