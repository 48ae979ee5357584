import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startOidcFake } from './oidc';
import type { RunningFake } from './server-lifecycle';

const CLIENT_ID = 'pinfield-test-client';
const CLIENT_SECRET = 'pinfield-test-secret';
const REDIRECT_URI = 'http://127.0.0.1:4999/api/auth/google/callback';
const ACCOUNTS = [
  { email: 'ada.quill@fernhollow.example', name: 'Ada Quill', label: 'Teacher' },
  { email: 'tomas.reed@fernhollow.example', name: 'Tomas Reed', label: 'Student' },
];

let fake: RunningFake;

beforeAll(async () => {
  fake = await startOidcFake({ port: 0, clientId: CLIENT_ID, clientSecret: CLIENT_SECRET, accounts: ACCOUNTS });
});
afterAll(async () => {
  await fake?.close();
});

function unescapeHtml(value: string): string {
  return value
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');
}

/** Hidden fields of the first form on the page (both picker forms carry the same ones). */
function hiddenFields(html: string): Record<string, string> {
  const fields: Record<string, string> = {};
  const form = html.slice(html.indexOf('<form'), html.indexOf('</form>'));
  for (const match of form.matchAll(/<input type="hidden" name="([^"]+)" value="([^"]*)">/g)) {
    fields[unescapeHtml(match[1]!)] = unescapeHtml(match[2]!);
  }
  return fields;
}

function authorizeUrl(extra: Record<string, string> = {}): string {
  const search = new URLSearchParams({
    client_id: CLIENT_ID,
    redirect_uri: REDIRECT_URI,
    response_type: 'code',
    scope: 'openid email profile',
    state: 'st-42',
    ...extra,
  });
  return `${fake.url}/authorize?${search.toString()}`;
}

/** Opens the picker, submits a choice and follows the fake's own redirects to the redirect_uri. */
async function choose(choice: Record<string, string>, extra: Record<string, string> = {}): Promise<URL> {
  const page = await fetch(authorizeUrl(extra));
  expect(page.status).toBe(200);
  const form = new URLSearchParams({ ...hiddenFields(await page.text()), ...choice });
  const picked = await fetch(`${fake.url}/authorize`, { method: 'POST', body: form, redirect: 'manual' });
  expect(picked.status).toBe(303);
  const second = await fetch(new URL(picked.headers.get('location')!, fake.url), { redirect: 'manual' });
  expect(second.status).toBe(302);
  return new URL(second.headers.get('location')!);
}

async function redeem(code: string, extra: Record<string, string> = {}): Promise<Response> {
  const body = new URLSearchParams({
    grant_type: 'authorization_code',
    code,
    redirect_uri: REDIRECT_URI,
    client_id: CLIENT_ID,
    client_secret: CLIENT_SECRET,
    ...extra,
  });
  return fetch(`${fake.url}/token`, { method: 'POST', body });
}

async function userinfoFor(choice: Record<string, string>): Promise<Record<string, unknown>> {
  const back = await choose(choice);
  const token = (await (await redeem(back.searchParams.get('code')!)).json()) as { access_token: string };
  const info = await fetch(`${fake.url}/userinfo?access_token=${encodeURIComponent(token.access_token)}`);
  expect(info.status).toBe(200);
  return (await info.json()) as Record<string, unknown>;
}

function jwtPayload(jwt: string): Record<string, unknown> {
  return JSON.parse(Buffer.from(jwt.split('.')[1]!, 'base64url').toString('utf8')) as Record<string, unknown>;
}

describe('OIDC fake picker page', () => {
  it('says it is a local stand-in and lists each demo account with name, e-mail and label', async () => {
    const response = await fetch(authorizeUrl());
    const html = await response.text();
    expect(response.headers.get('content-type')).toContain('text/html');
    expect(html).toContain('<h1>Local sign-in stand-in</h1>');
    expect(html).toContain('not a real account provider');
    for (const account of ACCOUNTS) {
      const button = new RegExp(`<button[^>]*data-account-email="${account.email}"[^>]*>[\\s\\S]*?</button>`).exec(html)?.[0] ?? '';
      expect(button).toContain(account.name);
      expect(button).toContain(`<span class="email">${account.email}</span>`);
      expect(button).toContain(`<span class="role">${account.label}</span>`);
    }
    expect(html).toContain('Treat this address as unverified');
    expect(html).not.toMatch(/(src|href)="https?:\/\/(?!127\.0\.0\.1:4999)/);
  });

  it('pre-fills the typed address from login_hint', async () => {
    const html = await (await fetch(authorizeUrl({ login_hint: 'sam@school.example' }))).text();
    expect(html).toMatch(/<input id="typed-email" name="email" type="email"[^>]*value="sam@school\.example"/);
  });

  it('refuses a request without redirect_uri or with an unknown client_id, on the page', async () => {
    const missing = await fetch(`${fake.url}/authorize?client_id=${CLIENT_ID}&response_type=code`);
    expect(missing.status).toBe(400);
    expect(await missing.text()).toContain('The sign-in request has no redirect_uri');
    const unknown = await fetch(authorizeUrl({ client_id: 'someone-else' }), { redirect: 'manual' });
    expect(unknown.status).toBe(400);
    expect(await unknown.text()).toContain('Unknown client_id &quot;someone-else&quot;');
  });

  it('re-shows the picker with a message for a malformed typed address', async () => {
    const page = await fetch(authorizeUrl());
    const form = new URLSearchParams({ ...hiddenFields(await page.text()), email: 'not-an-address' });
    const response = await fetch(`${fake.url}/authorize`, { method: 'POST', body: form, redirect: 'manual' });
    expect(response.status).toBe(400);
    expect(await response.text()).toContain('&quot;not-an-address&quot; is not an e-mail address');
  });

  it('cancel returns access_denied with the same state to the redirect_uri', async () => {
    const html = await (await fetch(authorizeUrl())).text();
    const href = unescapeHtml(/<a href="([^"]+)" data-testid="oidc-cancel">Cancel<\/a>/.exec(html)?.[1] ?? '');
    const target = new URL(href);
    expect(`${target.origin}${target.pathname}`).toBe(REDIRECT_URI);
    expect(target.searchParams.get('error')).toBe('access_denied');
    expect(target.searchParams.get('state')).toBe('st-42');
  });
});

describe('OIDC fake authorization-code flow', () => {
  it('carries the picked demo account through code, token and userinfo', async () => {
    const back = await choose({ account: 'ada.quill@fernhollow.example' }, { nonce: 'n-1' });
    expect(`${back.origin}${back.pathname}`).toBe(REDIRECT_URI);
    expect(back.searchParams.get('state')).toBe('st-42');
    const code = back.searchParams.get('code')!;
    expect(code).toBeTruthy();

    const tokenResponse = await redeem(code);
    expect(tokenResponse.status).toBe(200);
    const tokens = (await tokenResponse.json()) as { access_token: string; id_token: string; token_type: string };
    expect(tokens.token_type).toBe('Bearer');
    expect(jwtPayload(tokens.id_token)).toMatchObject({
      email: 'ada.quill@fernhollow.example',
      aud: CLIENT_ID,
      nonce: 'n-1',
      iss: fake.url,
    });

    const info = await fetch(`${fake.url}/userinfo?access_token=${encodeURIComponent(tokens.access_token)}`);
    const claims = (await info.json()) as Record<string, unknown>;
    expect(claims).toMatchObject({
      email: 'ada.quill@fernhollow.example',
      email_verified: true,
      name: 'Ada Quill',
      given_name: 'Ada',
      family_name: 'Quill',
    });
    expect(claims['sub']).toMatch(/^[0-9a-f]{24}$/);
    const picture = String(claims['picture']);
    expect(picture.startsWith(`${fake.url}/avatar/${String(claims['sub'])}.svg`)).toBe(true);
    const avatar = await fetch(picture);
    expect(avatar.headers.get('content-type')).toContain('image/svg+xml');
    expect(await avatar.text()).toContain('>AQ</text>');

    const bearer = await fetch(`${fake.url}/userinfo`, { headers: { Authorization: `Bearer ${tokens.access_token}` } });
    expect(((await bearer.json()) as { email: string }).email).toBe('ada.quill@fernhollow.example');
    expect((await redeem(code)).status).toBe(400);
  });

  it('reports a typed address as unverified when asked, and gives one e-mail one sub', async () => {
    const unverified = await userinfoFor({ email: 'Visitor.Lane@elsewhere.example', unverified: 'yes' });
    expect(unverified).toMatchObject({ email: 'visitor.lane@elsewhere.example', email_verified: false, name: 'Visitor Lane' });
    const again = await userinfoFor({ email: 'visitor.lane@elsewhere.example', name: 'V. Lane' });
    expect(again).toMatchObject({ email_verified: true, name: 'V. Lane', sub: unverified['sub'] });
    const other = await userinfoFor({ account: 'tomas.reed@fernhollow.example' });
    expect(other['sub']).not.toBe(unverified['sub']);
  });

  it('refuses a wrong client secret and an unknown access token', async () => {
    const back = await choose({ account: 'tomas.reed@fernhollow.example' });
    const refused = await redeem(back.searchParams.get('code')!, { client_secret: 'guessed' });
    expect(refused.status).toBe(401);
    expect(await refused.json()).toEqual({ error: 'invalid_client', error_description: 'The client secret is wrong.' });
    const info = await fetch(`${fake.url}/userinfo?access_token=made-up`);
    expect(info.status).toBe(401);
    expect(((await info.json()) as { error: string }).error).toBe('invalid_token');
  });

  it('checks PKCE: the right verifier passes, a missing one is refused', async () => {
    const verifier = 'v'.repeat(20) + 'erifier-0123456789-abcdefghijkl';
    const challenge = createHash('sha256').update(verifier).digest('base64url');
    const pkce = { code_challenge: challenge, code_challenge_method: 'S256' };
    const first = await choose({ account: 'ada.quill@fernhollow.example' }, pkce);
    expect((await redeem(first.searchParams.get('code')!)).status).toBe(400);
    const second = await choose({ account: 'ada.quill@fernhollow.example' }, pkce);
    expect((await redeem(second.searchParams.get('code')!, { code_verifier: verifier })).status).toBe(200);
  });

  it('serves discovery and JWKS from the fake itself', async () => {
    const discovery = (await (await fetch(`${fake.url}/.well-known/openid-configuration`)).json()) as Record<string, unknown>;
    expect(discovery).toMatchObject({
      issuer: fake.url,
      authorization_endpoint: `${fake.url}/authorize`,
      userinfo_endpoint: `${fake.url}/userinfo`,
    });
    const jwks = (await (await fetch(String(discovery['jwks_uri']))).json()) as { keys: { kty: string; d?: string }[] };
    expect(jwks.keys[0]?.kty).toBe('RSA');
    expect(jwks.keys[0]?.d).toBeUndefined();
  });
});
