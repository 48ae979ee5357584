import MarkdownIt from 'markdown-it';
import type { Token } from 'markdown-it';
import { markdownMath } from './markdown-math';

/** Images may only come from the school's own storage, served by the API at the same origin. */
const LESSON_IMAGE = /^\/api\/lesson-images\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const WEB_LINK = /^https?:\/\//i;

export function isLessonImageUrl(url: string): boolean {
  return LESSON_IMAGE.test(url);
}

const md = new MarkdownIt({ html: false, linkify: true, typographer: false });
// markdown-it asks this for every link and image destination; anything else stays text.
md.validateLink = (url) => WEB_LINK.test(url.trim()) || LESSON_IMAGE.test(url.trim());
md.use(markdownMath);

/**
 * validateLink cannot tell links from images: after inline parsing, a link to one of our image paths
 * loses its anchor and an image from the web becomes its alt text.
 */
md.core.ruler.push('pinfield_link_kinds', (state) => {
  for (const block of state.tokens) {
    if (block.type !== 'inline' || !block.children) continue;
    const kept: Token[] = [];
    // Links do not nest in Markdown: a dropped opening is closed by the next link_close.
    let droppedOpen = false;
    for (const token of block.children) {
      if (token.type === 'link_open' && !WEB_LINK.test(String(token.attrGet('href') ?? ''))) {
        droppedOpen = true;
        continue;
      }
      if (token.type === 'link_close' && droppedOpen) {
        droppedOpen = false;
        continue;
      }
      if (token.type === 'image' && !LESSON_IMAGE.test(String(token.attrGet('src') ?? ''))) {
        const text = new state.Token('text', '', 0);
        text.content = token.content;
        kept.push(text);
        continue;
      }
      kept.push(token);
    }
    block.children = kept;
  }
});

const defaultLinkOpen = md.renderer.rules.link_open ?? ((tokens, idx, options, _env, self) => self.renderToken(tokens, idx, options));
md.renderer.rules.link_open = (tokens, idx, options, env, self) => {
  const token = tokens[idx]!;
  // Teachers link to outside pages: open them apart from the lesson and tell them nothing about it.
  token.attrSet('target', '_blank');
  token.attrSet('rel', 'noopener noreferrer nofollow');
  return defaultLinkOpen(tokens, idx, options, env, self);
};

const defaultImage = md.renderer.rules.image!;
md.renderer.rules.image = (tokens, idx, options, env, self) => {
  tokens[idx]!.attrSet('loading', 'lazy');
  return defaultImage(tokens, idx, options, env, self);
};

/**
 * A teacher's Markdown as safe HTML: raw HTML shown as text, http(s) links only (opened in a new tab
 * with noopener), images only from /api/lesson-images/<id>, `$…$` and `$$…$$` math through KaTeX with
 * trust off. The only HTML the app ever inserts from teacher text comes from here.
 */
export function renderMarkdown(text: string): string {
  return md.render(text);
}
