import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startOidcFake } from '../../../../fake-services/oidc';
import type { RunningFake } from '../../../../fake-services/server-lifecycle';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildMember } from '../../../test/factories';

let fake: RunningFake;
let t: TestApp;

beforeAll(async () => {
  fake = await startOidcFake({ port: 0, clientId: 'api-test', clientSecret: 'api-test-secret', accounts: [] });
  t = await createTestApp({
    GOOGLE_CLIENT_ID: 'api-test',
    GOOGLE_CLIENT_SECRET: 'api-test-secret',
    GOOGLE_AUTHORIZATION_URL: `${fake.url}/authorize`,
    GOOGLE_TOKEN_URL: `${fake.url}/token`,
    GOOGLE_USERINFO_URL: `${fake.url}/userinfo`,
  });
});
afterAll(async () => {
  await t.close();
  await fake.close();
});

const decode = (value: string) =>
  value
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');

/** Goes through the provider's picker typing an address, and returns where the app's callback sends the browser. */
async function signInWithProvider(client: Client, email: string, options: { unverified?: boolean } = {}): Promise<string> {
  const start = await client.get('/api/auth/google');
  expect(start.status).toBe(302);
  const picker = await fetch(start.headers.location!);
  const html = await picker.text();
  const form = html.slice(html.indexOf('<form'), html.indexOf('</form>'));
  const fields = new URLSearchParams();
  for (const match of form.matchAll(/<input type="hidden" name="([^"]+)" value="([^"]*)">/g))
    fields.set(decode(match[1]!), decode(match[2]!));
  fields.set('email', email);
  if (options.unverified) fields.set('unverified', 'yes');
  const picked = await fetch(`${fake.url}/authorize`, { method: 'POST', body: fields, redirect: 'manual' });
  const ticket = await fetch(new URL(picked.headers.get('location')!, fake.url), { redirect: 'manual' });
  const callback = new URL(ticket.headers.get('location')!);
  const done = await client.get(`${callback.pathname}${callback.search}`);
  expect(done.status).toBe(302);
  return done.headers.location!;
}

describe('sign-in with the OpenID Connect provider', () => {
  it('links a verified account to an invited person on first use, then by its subject', async () => {
    const member = await buildMember(t.db, { roles: ['teacher'], status: 'invited' });
    const client = new Client(t);
    expect(await signInWithProvider(client, member.email)).toBe('/');
    expect((await client.get('/api/me')).body.user.id).toBe(member.id);
    const identity = await t.db('identities').where({ user_id: member.id }).first('provider', 'subject');
    expect(identity.provider).toBe('google');
    expect((await t.db('memberships').where({ user_id: member.id }).first('status')).status).toBe('active');

    // Change the address the school knows: the provider's subject still finds the person.
    await t
      .db('users')
      .where({ id: member.id })
      .update({ email: `moved-${member.email}` });
    const again = new Client(t);
    expect(await signInWithProvider(again, member.email)).toBe('/');
    expect((await again.get('/api/me')).body.user.id).toBe(member.id);
  });

  it('refuses to link an unverified address', async () => {
    const member = await buildMember(t.db, { roles: ['teacher'] });
    const client = new Client(t);
    expect(await signInWithProvider(client, member.email, { unverified: true })).toBe('/signin?error=unverified_email');
    expect((await client.get('/api/me')).status).toBe(401);
    expect(await t.db('identities').where({ user_id: member.id }).first()).toBeUndefined();
  });

  it('sends an unknown account back with a neutral message code', async () => {
    const client = new Client(t);
    expect(await signInWithProvider(client, 'stranger@nowhere.example')).toBe('/signin?error=unknown_account');
    const audit = await t.db('audit_events').where({ action: 'sign_in_refused' }).orderBy('id', 'desc').first('data');
    expect(audit.data).toEqual({ reason: 'unknown_account', email: 'stranger@nowhere.example' });
  });

  it('treats a cancelled sign-in as such', async () => {
    const res = await new Client(t).get('/api/auth/google/callback?error=access_denied&state=x');
    expect(res.headers.location).toBe('/signin?error=cancelled');
  });
});
