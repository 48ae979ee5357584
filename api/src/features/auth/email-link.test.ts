import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, createTestApp, lastLinkToken, type TestApp } from '../../../test/test-app';
import { buildMember } from '../../../test/factories';
import { SESSION_COOKIE } from '../../auth/session';
import { NEUTRAL_LINK_NOTICE } from './auth.service';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const sessionId = (cookies: string[] | string | undefined) =>
  ([] as string[])
    .concat(cookies ?? [])
    .find((c) => c.startsWith(`${SESSION_COOKIE}=`))
    ?.split(';')[0];

describe('POST /api/auth/email-link', () => {
  it('400: names the problem with the address', async () => {
    const res = await new Client(t).send('post', '/api/auth/email-link', { email: 'not-an-address' });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({
      code: 'validation_failed',
      message: 'email: Enter a valid e-mail address, like name@school.example.',
    });
  });

  it('403: refuses a request without the CSRF token', async () => {
    const res = await new Client(t).agent.post('/api/auth/email-link').send({ email: 'someone@test.example' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('answers the same for unknown and known addresses, and mails only the known one', async () => {
    const member = await buildMember(t.db, { roles: ['teacher'] });
    const before = t.sent.length;
    const unknown = await new Client(t).send('post', '/api/auth/email-link', { email: 'nobody@test.example' });
    const known = await new Client(t).send('post', '/api/auth/email-link', { email: member.email.toUpperCase() });
    expect(unknown.status).toBe(202);
    expect(known.status).toBe(202);
    expect(unknown.body).toEqual({ message: NEUTRAL_LINK_NOTICE });
    expect(known.body).toEqual(unknown.body);
    expect(t.sent.slice(before).map((m) => m.to)).toEqual([member.email]);
    const stored = await t.db('sign_in_tokens').where({ email: member.email }).first('token_hash');
    expect(stored.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored.token_hash).not.toBe(lastLinkToken(t.sent, member.email));
  });
});

describe('POST /api/auth/email-link/verify', () => {
  it('signs in once with a new session id; the same link is then refused', async () => {
    const member = await buildMember(t.db, { roles: ['student'], status: 'invited' });
    const client = new Client(t);
    const csrf = await client.send('post', '/api/auth/email-link', { email: member.email });
    const anonymousSession =
      sessionId(csrf.headers['set-cookie']) ?? sessionId((await client.agent.get('/api/auth/csrf')).headers['set-cookie']);
    const token = lastLinkToken(t.sent, member.email);

    const first = await client.send('post', '/api/auth/email-link/verify', { token });
    expect(first.status).toBe(200);
    expect(first.body.user.email).toBe(member.email);
    expect(first.body.active.role).toBe('student');
    const signedInSession = sessionId(first.headers['set-cookie']);
    expect(signedInSession).toBeDefined();
    expect(signedInSession).not.toBe(anonymousSession);
    expect((await t.db('memberships').where({ user_id: member.id }).first('status')).status).toBe('active');

    const me = await client.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.user.id).toBe(member.id);

    const again = await new Client(t).send('post', '/api/auth/email-link/verify', { token });
    expect(again.status).toBe(400);
    expect(again.body.error).toEqual({
      code: 'link_invalid',
      message: 'This sign-in link has expired or was already used. Ask for a new one below.',
    });
  });

  it('refuses an expired link', async () => {
    const member = await buildMember(t.db, { roles: ['teacher'] });
    await new Client(t).send('post', '/api/auth/email-link', { email: member.email });
    await t
      .db('sign_in_tokens')
      .where({ email: member.email })
      .update({ expires_at: t.db.raw("now() - interval '1 second'") });
    const res = await new Client(t).send('post', '/api/auth/email-link/verify', { token: lastLinkToken(t.sent, member.email) });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('link_invalid');
  });

  it('400: a damaged token is named as such', async () => {
    const res = await new Client(t).send('post', '/api/auth/email-link/verify', { token: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('token: The sign-in link is incomplete or damaged: request a new one.');
  });

  it('signing out ends the session', async () => {
    const member = await buildMember(t.db, { roles: ['teacher'] });
    const client = new Client(t);
    await client.signIn(member.email);
    expect((await client.send('post', '/api/auth/sign-out')).status).toBe(204);
    expect((await client.get('/api/me')).status).toBe(401);
  });
});
