import { describe, expect, it } from 'vitest';
import { renderMarkdown } from './render-markdown';

function dom(markdown: string): HTMLElement {
  const root = document.createElement('div');
  root.innerHTML = renderMarkdown(markdown);
  return root;
}

const IMAGE_ID = '3f2b8c1e-9a4d-4e6f-8b21-5c7d9e0a1b2c';

describe('renderMarkdown: raw HTML and links', () => {
  it('shows raw HTML as text, never as elements', () => {
    const root = dom('Look <img src=x onerror=alert(1)> here <script>alert(2)</script>');
    expect(root.querySelector('img')).toBeNull();
    expect(root.querySelector('script')).toBeNull();
    expect(root.textContent).toContain('<img src=x onerror=alert(1)>');
    expect(root.innerHTML).not.toMatch(/<img[^>]*onerror/);
  });

  it('does not make a javascript: or data: link', () => {
    const root = dom('[x](javascript:alert(1)) and [y](data:text/html,hi) and [z](JaVaScRiPt:alert(1)) and <javascript:alert(1)>');
    expect(root.querySelector('a')).toBeNull();
    expect(root.textContent).toContain('[x](javascript:alert(1))');
  });

  it('does not make relative links or links to our image paths', () => {
    const root = dom(`[a](/teacher/lessons) [b](/api/lesson-images/${IMAGE_ID})`);
    expect(root.querySelector('a')).toBeNull();
    expect(root.textContent).toContain('a');
    expect(root.textContent).toContain('b');
  });

  it('opens http(s) links in a new tab with noopener, noreferrer and nofollow', () => {
    const root = dom('See [the notes](https://fernhollow.example/notes) or http://fernhollow.example/a');
    const links = [...root.querySelectorAll('a')];
    expect(links.map((a) => a.getAttribute('href'))).toEqual(['https://fernhollow.example/notes', 'http://fernhollow.example/a']);
    for (const link of links) {
      expect(link.getAttribute('rel')).toBe('noopener noreferrer nofollow');
      expect(link.getAttribute('target')).toBe('_blank');
    }
  });

  it('does not turn e-mail addresses into mailto: links', () => {
    expect(dom('Write to lab@fernhollow.example').querySelector('a')).toBeNull();
  });

  it('shows only images from the school storage; other sources become their alt text', () => {
    const root = dom(
      `![coil](/api/lesson-images/${IMAGE_ID}) ![tracker](https://fernhollow.example/p.png) ![d](data:image/png;base64,AAAA)`,
    );
    const images = [...root.querySelectorAll('img')];
    expect(images).toHaveLength(1);
    expect(images[0]!.getAttribute('src')).toBe(`/api/lesson-images/${IMAGE_ID}`);
    expect(images[0]!.getAttribute('alt')).toBe('coil');
    expect(root.textContent).toContain('tracker');
    expect(root.textContent).toContain('d');
  });

  it('refuses an image path that only looks like ours', () => {
    const root = dom(`![x](/api/lesson-images/${IMAGE_ID}/../../me) ![y](/api/lesson-images/not-a-uuid)`);
    expect(root.querySelector('img')).toBeNull();
  });
});

describe('renderMarkdown: math', () => {
  it('renders inline $…$ with KaTeX', () => {
    const root = dom('The field is $B = \\mu_0 n I$ inside.');
    expect(root.querySelector('p .katex')).not.toBeNull();
    expect(root.querySelector('annotation')?.textContent).toBe('B = \\mu_0 n I');
    expect(root.textContent).toContain('The field is');
  });

  it('renders a $$…$$ block in display mode', () => {
    const root = dom('Before\n\n$$\nB = \\frac{\\mu_0 N I}{2a}\n$$\n\nAfter');
    const block = root.querySelector('.math-block .katex-display');
    expect(block).not.toBeNull();
    expect(block?.querySelector('.mfrac')).not.toBeNull();
    expect(root.textContent).toContain('After');
  });

  it('renders inline $$…$$ inside a sentence in display mode', () => {
    expect(dom('so $$x^2$$ holds').querySelector('p .katex-display')).not.toBeNull();
  });

  it('leaves prices and escaped dollars as text', () => {
    const root = dom('A coil costs $5 and a meter $10. Keep \\$x\\$ literal.');
    expect(root.querySelector('.katex')).toBeNull();
    expect(root.textContent).toContain('$5 and a meter $10');
    expect(root.textContent).toContain('$x$');
  });

  it('shows a broken formula as an error span with the source, and keeps the rest of the text', () => {
    const root = dom('Good $a+b$ then bad $\\frac{1}{$ and more');
    const error = root.querySelector('.katex-error');
    expect(error).not.toBeNull();
    expect(error?.textContent).toContain('\\frac{1}{');
    expect(root.querySelectorAll('.katex')).toHaveLength(1);
    expect(root.textContent).toContain('and more');
  });

  it('keeps \\href, \\url and \\htmlClass inert (KaTeX trust off)', () => {
    const root = dom(
      '$\\href{javascript:alert(1)}{x}$ $\\url{javascript:alert(2)}$ $\\htmlClass{pwn-class}{y}$ $\\htmlId{pwn-id}{z}$ $\\htmlStyle{position:fixed}{w}$',
    );
    for (const anchor of root.querySelectorAll('a')) expect(anchor.getAttribute('href') ?? '').not.toMatch(/javascript/i);
    expect(root.querySelector('a')).toBeNull();
    expect(root.querySelector('.pwn-class')).toBeNull();
    expect(root.querySelector('#pwn-id')).toBeNull();
    // The source stays readable in the MathML annotation; no element takes it as a style.
    const styles = [...root.querySelectorAll('[style]')].map((el) => el.getAttribute('style') ?? '');
    expect(styles.some((style) => style.includes('position'))).toBe(false);
    expect(root.querySelector('.katex-html')?.textContent).toContain('\\href');
  });

  it('does not treat math inside code as math', () => {
    expect(dom('`$x$`').querySelector('code')?.textContent).toBe('$x$');
    expect(dom('`$x$`').querySelector('.katex')).toBeNull();
  });

  it('bounds macro expansion so a formula cannot hang the page', () => {
    const root = dom('$\\def\\a{\\a\\a}\\a$');
    expect(root.querySelector('.katex-error')).not.toBeNull();
  });
});
