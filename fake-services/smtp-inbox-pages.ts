import { escapeHtml, htmlPage } from './html';
import type { StoredMessage } from './mail-store';

const INBOX_CSS = `
.bar{display:flex;gap:1rem;align-items:center;flex-wrap:wrap}
.bar form{margin:0}
.quiet{font:inherit;padding:.35rem .8rem;border:1px solid #8c959f;background:#fff;border-radius:6px;cursor:pointer}
.quiet:hover{background:#f6f8fa}
.when{white-space:nowrap;color:#57606a;font-variant-numeric:tabular-nums}
dl{display:grid;grid-template-columns:max-content 1fr;gap:.25rem 1rem;margin:0}
dt{color:#57606a}
dd{margin:0;overflow-wrap:anywhere}
pre{white-space:pre-wrap;overflow-wrap:anywhere;font:14px/1.5 ui-monospace,monospace;margin:0}
iframe{width:100%;min-height:28rem;border:1px solid #d0d7de;border-radius:6px;background:#fff}
`;

const URL_IN_TEXT = /https?:\/\/[^\s<>"']+/g;

/** Escapes plain text and turns http(s) URLs in it into links. */
export function linkify(text: string): string {
  let html = '';
  let last = 0;
  for (const match of text.matchAll(URL_IN_TEXT)) {
    // Sentence punctuation right after a URL is not part of it.
    const url = match[0].replace(/[.,;:!?)\]]+$/, '');
    const start = match.index;
    html += escapeHtml(text.slice(last, start));
    html += `<a href="${escapeHtml(url)}">${escapeHtml(url)}</a>`;
    last = start + url.length;
  }
  return html + escapeHtml(text.slice(last));
}

function shownTime(iso: string): string {
  return iso.replace('T', ' ').replace(/\.\d+Z$/, ' UTC');
}

function header(smtpUrl: string): string {
  return `<header class="card">
<span class="notice">Development only</span>
<h1>Local mail inbox</h1>
<p class="muted">Mail sent to <code>${escapeHtml(smtpUrl)}</code> stays on this machine and is shown here (kept in memory, newest first). JSON: <a href="/api/messages">/api/messages</a>.</p>
</header>`;
}

/** GET /: every message, newest first. */
export function renderInbox(messages: StoredMessage[], smtpUrl: string): string {
  const rows = messages
    .map(
      (message) => `<tr data-testid="mail-row">
<td class="when">${escapeHtml(shownTime(message.date))}</td>
<td>${escapeHtml(message.to.join(', '))}</td>
<td><a href="/messages/${encodeURIComponent(message.id)}">${escapeHtml(message.subject || '(no subject)')}</a></td>
</tr>`,
    )
    .join('\n');
  const list =
    messages.length === 0
      ? '<p data-testid="mail-empty">No messages yet.</p>'
      : `<table><caption class="muted" style="text-align:left;padding-bottom:.5rem">${messages.length} message${messages.length === 1 ? '' : 's'}</caption>
<thead><tr><th scope="col">Received</th><th scope="col">To</th><th scope="col">Subject</th></tr></thead>
<tbody>
${rows}
</tbody></table>`;
  const body = `${header(smtpUrl)}
<section class="card" aria-label="Messages">
<div class="bar"><a href="/">Refresh</a>
<form method="post" action="/clear"><button type="submit" class="quiet">Delete all messages</button></form></div>
${list}
</section>`;
  return htmlPage('Local mail inbox', body, INBOX_CSS);
}

/** GET /messages/:id: headers, the text part with live links, the HTML part sandboxed. */
export function renderMessage(message: StoredMessage, smtpUrl: string): string {
  // Links in the HTML part open in a new tab instead of inside the frame.
  const srcdoc = message.html === null ? '' : `<base target="_blank">${message.html}`;
  const htmlPart =
    message.html === null
      ? '<p class="muted">This message has no HTML part.</p>'
      : `<iframe title="HTML part of the message" sandbox="allow-popups allow-popups-to-escape-sandbox" srcdoc="${escapeHtml(srcdoc)}"></iframe>`;
  const body = `${header(smtpUrl)}
<p><a href="/">&larr; All messages</a></p>
<article class="card" aria-labelledby="subject">
<h2 id="subject">${escapeHtml(message.subject || '(no subject)')}</h2>
<dl>
<dt>From</dt><dd>${escapeHtml(message.from)}</dd>
<dt>To</dt><dd>${escapeHtml(message.to.join(', '))}</dd>
<dt>Received</dt><dd>${escapeHtml(shownTime(message.date))}</dd>
</dl>
</article>
<section class="card" aria-labelledby="text-part"><h2 id="text-part">Text part</h2>
<pre data-testid="mail-text">${message.text ? linkify(message.text) : '<span class="muted">(empty)</span>'}</pre></section>
<section class="card" aria-labelledby="html-part"><h2 id="html-part">HTML part</h2>
${htmlPart}</section>`;
  return htmlPage(`${message.subject || '(no subject)'} - Local mail inbox`, body, INBOX_CSS);
}

export function renderNotFound(id: string): string {
  return htmlPage(
    'Message not found',
    `<section class="card"><h1>Message not found</h1><p>No message has the id <code>${escapeHtml(id)}</code>; it may have been deleted or pushed out by newer mail.</p><p><a href="/">All messages</a></p></section>`,
  );
}
