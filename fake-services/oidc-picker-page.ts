import type { AuthorizeParams } from './oidc-authorize';
import { errorRedirect, paramsToSearch } from './oidc-authorize';
import { escapeHtml, htmlPage } from './html';
import type { OidcAccount } from './oidc-identity';
import { initialsOf, subFor } from './oidc-identity';

export interface TypedAddress {
  email: string;
  name: string;
  unverified: boolean;
}

export interface PickerView {
  params: AuthorizeParams;
  accounts: OidcAccount[];
  /** Shown above the typed-address form after a refused submission. */
  error?: string;
  typed?: TypedAddress;
}

const PICKER_CSS = `
.accounts{list-style:none;margin:0;padding:0;display:grid;gap:.5rem}
.account{display:flex;align-items:center;gap:.75rem;width:100%;text-align:left;padding:.6rem .75rem;background:#fff;border:1px solid #d0d7de;border-radius:6px;cursor:pointer;color:inherit}
.account:hover{background:#f6f8fa;border-color:#8c959f}
.account img{width:40px;height:40px;border-radius:50%;flex:none}
.who{display:flex;flex-direction:column;min-width:0;flex:1}
.who .name{font-weight:600}
.who .email{color:#57606a;font-size:.9rem;overflow-wrap:anywhere}
.role{font-size:.8rem;color:#24292f;background:#eaeef2;border-radius:999px;padding:.1rem .6rem;white-space:nowrap}
.field{display:flex;flex-direction:column;gap:.25rem;margin-bottom:.75rem}
.field input{font:inherit;padding:.45rem .6rem;border:1px solid #8c959f;border-radius:6px}
.check{display:flex;gap:.5rem;align-items:flex-start;margin-bottom:.25rem}
.check input{margin-top:.3rem}
.hint{font-size:.9rem;color:#57606a;margin:0 0 .75rem}
.primary{padding:.5rem 1rem;border:1px solid #0b57a4;background:#0b57a4;color:#fff;border-radius:6px;cursor:pointer}
.primary:hover{background:#094a8c}
`;

function hiddenFields(params: AuthorizeParams): string {
  return [...paramsToSearch(params)]
    .map(([name, value]) => `<input type="hidden" name="${escapeHtml(name)}" value="${escapeHtml(value)}">`)
    .join('\n');
}

function accountButton(account: OidcAccount): string {
  const avatar = `/avatar/${subFor(account.email)}.svg?initials=${encodeURIComponent(initialsOf(account.name))}`;
  const email = escapeHtml(account.email);
  return `<li><button type="submit" class="account" name="account" value="${email}" data-testid="oidc-account" data-account-email="${email}">
<img src="${escapeHtml(avatar)}" alt="" width="40" height="40">
<span class="who"><span class="name">${escapeHtml(account.name)}</span><span class="email">${email}</span></span>
<span class="role">${escapeHtml(account.label)}</span>
</button></li>`;
}

function demoSection(view: PickerView): string {
  if (view.accounts.length === 0) {
    return '<section class="card" aria-labelledby="demo-heading"><h2 id="demo-heading">Demo accounts</h2><p class="muted">No demo accounts are configured; type an address below.</p></section>';
  }
  return `<section class="card" aria-labelledby="demo-heading">
<h2 id="demo-heading">Demo accounts</h2>
<form method="post" action="/authorize">
${hiddenFields(view.params)}
<ul class="accounts">
${view.accounts.map(accountButton).join('\n')}
</ul>
</form>
</section>`;
}

function typedSection(view: PickerView): string {
  const typed = view.typed ?? { email: view.params.login_hint ?? '', name: '', unverified: false };
  const error = view.error ? `<p class="alert" role="alert" id="typed-error" data-testid="oidc-error">${escapeHtml(view.error)}</p>` : '';
  const invalid = view.error ? ' aria-invalid="true" aria-describedby="typed-error"' : '';
  return `<section class="card" aria-labelledby="typed-heading">
<h2 id="typed-heading">Any other address</h2>
<form method="post" action="/authorize" novalidate>
${hiddenFields(view.params)}
${error}
<div class="field"><label for="typed-email">E-mail address</label>
<input id="typed-email" name="email" type="email" autocomplete="email" value="${escapeHtml(typed.email)}" data-testid="oidc-email"${invalid}></div>
<div class="field"><label for="typed-name">Name <span class="muted">(optional)</span></label>
<input id="typed-name" name="name" type="text" autocomplete="name" value="${escapeHtml(typed.name)}" data-testid="oidc-name"></div>
<div class="check"><input id="typed-unverified" name="unverified" type="checkbox" value="yes"${typed.unverified ? ' checked' : ''} data-testid="oidc-unverified">
<label for="typed-unverified">Treat this address as unverified</label></div>
<p class="hint">The app is then told <code>email_verified: false</code>, as a provider does for an address it has not confirmed.</p>
<button type="submit" class="primary" data-testid="oidc-continue">Continue with this address</button>
</form>
</section>`;
}

/** The account picker shown at /authorize in front of the mock's auto-approving authorize step. */
export function renderPicker(view: PickerView): string {
  const cancel = errorRedirect(view.params, 'access_denied', 'The person cancelled the sign-in.');
  const body = `<header class="card">
<span class="notice">Development only</span>
<h1>Local sign-in stand-in</h1>
<p>This page belongs to the local development fakes. It is <strong>not a real account provider</strong>: no password is asked, and nothing leaves this machine.
Choose who to be for this sign-in to <strong>${escapeHtml(view.params.client_id)}</strong>.</p>
</header>
${demoSection(view)}
${typedSection(view)}
<p><a href="${escapeHtml(cancel)}" data-testid="oidc-cancel">Cancel</a> <span class="muted">and return to the app without signing in.</span></p>`;
  return htmlPage('Local sign-in stand-in', body, PICKER_CSS);
}

/** A plain error page for requests that cannot be answered with a redirect. */
export function renderProblem(message: string): string {
  const body = `<section class="card">
<span class="notice">Development only</span>
<h1>This sign-in request cannot be used</h1>
<p class="alert" role="alert" data-testid="oidc-problem">${escapeHtml(message)}</p>
<p class="muted">Local sign-in stand-in: start the sign-in again from the app.</p>
</section>`;
  return htmlPage('Sign-in request refused', body);
}
