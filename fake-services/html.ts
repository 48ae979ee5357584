import type { Response } from 'express';

/** Escapes text for HTML element content and double-quoted attributes. */
export function escapeHtml(value: string): string {
  return value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

// Neutral, self-contained styling: system fonts only, nothing fetched from anywhere.
const BASE_CSS = `
*{box-sizing:border-box}
body{margin:0;font:16px/1.5 system-ui,-apple-system,"Segoe UI",sans-serif;color:#1f2328;background:#f3f4f6}
main{max-width:46rem;margin:2rem auto;padding:0 1rem}
.card{background:#fff;border:1px solid #d0d7de;border-radius:8px;padding:1.25rem 1.5rem;margin-bottom:1rem}
h1{font-size:1.5rem;margin:.25rem 0 .5rem}
h2{font-size:1.1rem;margin:0 0 .75rem}
.notice{display:inline-block;font-size:.8rem;font-weight:600;letter-spacing:.02em;text-transform:uppercase;color:#5c3c00;background:#fff4d6;border:1px solid #e3c77a;border-radius:4px;padding:.1rem .5rem}
.muted{color:#57606a}
a{color:#0b57a4}
a:focus-visible,button:focus-visible,input:focus-visible{outline:3px solid #0b57a4;outline-offset:2px}
button{font:inherit}
.alert{border:1px solid #d1242f;background:#ffebe9;color:#82071e;border-radius:6px;padding:.5rem .75rem;margin:0 0 1rem}
table{border-collapse:collapse;width:100%}
th,td{text-align:left;padding:.5rem;border-bottom:1px solid #d0d7de;vertical-align:top}
`;

/** A complete HTML page with inline CSS; `extraCss` adds page-specific rules. */
export function htmlPage(title: string, body: string, extraCss = ''): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>${BASE_CSS}${extraCss}</style>
</head>
<body>
<main>
${body}
</main>
</body>
</html>`;
}

/** Sends a page with headers that keep it local: no scripts, no remote loads, never cached. */
export function sendPage(res: Response, status: number, html: string, csp: string): void {
  res
    .status(status)
    .set({
      'Content-Type': 'text/html; charset=utf-8',
      'Content-Security-Policy': csp,
      'X-Content-Type-Options': 'nosniff',
      'Referrer-Policy': 'no-referrer',
      'Cache-Control': 'no-store',
    })
    .send(html);
}
