import { describe, expect, it } from 'vitest';
import { latexProblem, markdownProblems, mathSpans } from './markdown-problems';

const messages = (markdown: string) => markdownProblems(markdown, 'prompt').map((p) => p.message);

describe('mathSpans', () => {
  it('finds inline and display math, and leaves prices, escaped dollars and code alone', () => {
    expect(mathSpans('Field $B$ and $$B = \\mu_0 n I$$ cost $5 and $10, \\$3, `$x$`')).toEqual([
      { tex: 'B', display: false },
      { tex: 'B = \\mu_0 n I', display: true },
    ]);
  });

  it('ignores fenced code blocks', () => {
    expect(mathSpans('```\n$\\fracc$\n```\nthen $a$')).toEqual([{ tex: 'a', display: false }]);
  });
});

describe('markdownProblems', () => {
  it('accepts plain Markdown with valid math, http(s) links, bare addresses and uploaded images', () => {
    expect(
      messages(
        'See [the notes](https://example.org/notes) and www.example.org, $\\frac{\\mu_0 I}{2a}$ and ![coil](/api/lesson-images/0b7e0b8e-5a2f-4c1e-9d3a-1f2e3d4c5b6a).',
      ),
    ).toEqual([]);
  });

  it('gives the KaTeX error for math that does not parse', () => {
    const [message] = messages('Use $\\fracc{1}{2}$ here.');
    expect(message).toBe(
      'The math $\\fracc{1}{2}$ cannot be shown: KaTeX cannot read it: Undefined control sequence: \\fracc (at character 1).',
    );
    expect(messages('Empty $$ $$ math')).toEqual(['The math $$ $$ is empty: write the formula between the dollars or remove them.']);
  });

  it('refuses links that are not http(s), whatever their scheme', () => {
    expect(messages('[click](javascript:alert(1)) and [file](file:///etc/passwd) and [rel](notes.html)')).toEqual([
      'Links must start with http:// or https:// (this one is “javascript:alert(1)”).',
      'Links must start with http:// or https:// (this one is “file:///etc/passwd”).',
      'Links must start with http:// or https:// (this one is “notes.html”).',
    ]);
  });

  it('refuses images that are not uploads of this school', () => {
    expect(messages('![x](https://elsewhere.example/x.png)')[0]).toMatch(/^Images must be uploaded with “Add image”/);
  });
});

describe('latexProblem', () => {
  it('parses with the shared settings: \\href is inert, not an error', () => {
    expect(latexProblem('\\href{javascript:alert(1)}{x}', true)).toBeNull();
    expect(latexProblem('\\frac{1}{', true)).toMatch(/^KaTeX cannot read it: /);
  });
});
