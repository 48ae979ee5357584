import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { ACCESS_RULE } from './middleware/access';
import { Client, createTestApp, type TestApp } from '../test/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ BODY_LIMIT: '2kb' });
});
afterAll(() => t.close());

interface Layer {
  route?: { path: string; methods: Record<string, boolean>; stack: { handle: Record<symbol, unknown> }[] };
  handle: { stack?: Layer[] };
}

/** Every route of the app, with whether one of its handlers is an access rule. */
function routes(app: Express): { route: string; rule: unknown }[] {
  const found: { route: string; rule: unknown }[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route) {
        const rule = layer.route.stack.map((s) => s.handle[ACCESS_RULE]).find(Boolean);
        found.push({ route: `${Object.keys(layer.route.methods).join(',')} ${layer.route.path}`, rule });
      } else if (layer.handle.stack) walk(layer.handle.stack);
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack);
  return found;
}

describe('the API surface', () => {
  it('every route states which roles may call it', () => {
    const all = routes(t.app).filter((r) => !r.route.includes('*path'));
    expect(all.length).toBeGreaterThan(20);
    expect(all.filter((r) => !r.rule).map((r) => r.route)).toEqual([]);
  });

  it('answers unknown API routes with JSON 404', async () => {
    const res = await new Client(t).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'route_not_found', message: 'There is no API route GET /api/no-such-thing.' } });
  });

  it('answers malformed JSON with 400, never a stack trace', async () => {
    const client = new Client(t);
    const token = await client.refreshCsrf();
    const res = await client.agent
      .post('/api/auth/email-link')
      .set('X-CSRF-Token', token)
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } });
  });

  it('answers a body over the limit with 413', async () => {
    const res = await new Client(t).send('post', '/api/auth/email-link', { email: `${'a'.repeat(4000)}@test.example` });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
    expect(res.body.error.message).toBe('The request body is larger than the limit of 2048 bytes.');
  });

  it('answers a signed-out caller with 401', async () => {
    const res = await new Client(t).get('/api/teacher/classes');
    expect(res.status).toBe(401);
    expect(res.body.error).toEqual({ code: 'unauthenticated', message: 'Sign in to continue.' });
  });

  it('reports health', async () => {
    expect((await new Client(t).get('/api/health')).body).toEqual({ ok: true });
  });
});
