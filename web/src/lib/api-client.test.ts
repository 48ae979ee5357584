import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { api, ApiError, setCsrfToken } from './api-client';

const OkSchema = z.object({ ok: z.boolean() });

describe('api client', () => {
  it('sends no CSRF header on GET and same-origin credentials', async () => {
    let seen: { token: string | null; credentials: RequestCredentials } | undefined;
    server.use(
      http.get('/api/thing', ({ request }) => {
        seen = { token: request.headers.get('X-CSRF-Token'), credentials: request.credentials };
        return HttpResponse.json({ ok: true });
      }),
    );
    await expect(api.get('/api/thing', OkSchema)).resolves.toEqual({ ok: true });
    expect(seen).toEqual({ token: null, credentials: 'same-origin' });
  });

  it('fetches a CSRF token once and sends it on every state-changing request', async () => {
    let csrfFetches = 0;
    const tokens: (string | null)[] = [];
    server.use(
      http.get('/api/auth/csrf', () => {
        csrfFetches += 1;
        return HttpResponse.json({ csrfToken: 'token-a' });
      }),
      http.post('/api/thing', async ({ request }) => {
        tokens.push(request.headers.get('X-CSRF-Token'));
        expect(await request.json()).toEqual({ name: 'x' });
        return HttpResponse.json({ ok: true }, { status: 201 });
      }),
    );
    await api.post('/api/thing', { name: 'x' }, OkSchema);
    await api.post('/api/thing', { name: 'x' }, OkSchema);
    expect(tokens).toEqual(['token-a', 'token-a']);
    expect(csrfFetches).toBe(1);
  });

  it('uses the token handed out with MeDto without asking for another', async () => {
    setCsrfToken('from-me');
    let token: string | null = null;
    server.use(
      http.get('/api/auth/csrf', () => HttpResponse.json({ csrfToken: 'should-not-be-used' })),
      http.patch('/api/thing', ({ request }) => {
        token = request.headers.get('X-CSRF-Token');
        return HttpResponse.json({ ok: true });
      }),
    );
    await api.patch('/api/thing', {}, OkSchema);
    expect(token).toBe('from-me');
  });

  it('parses the error body into an ApiError with status, code, message and details', async () => {
    server.use(
      http.get('/api/thing', () =>
        apiError(400, 'validation_failed', 'The e-mail address is not valid.', [
          { path: 'email', message: 'Enter a valid e-mail address.' },
        ]),
      ),
    );
    const error = await api.get('/api/thing', OkSchema).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      code: 'validation_failed',
      message: 'The e-mail address is not valid.',
      details: [{ path: 'email', message: 'Enter a valid e-mail address.' }],
    });
  });

  it('fetches a new token and retries once when the API answers 403 csrf_invalid', async () => {
    setCsrfToken('stale');
    const tokens: (string | null)[] = [];
    server.use(
      http.get('/api/auth/csrf', () => HttpResponse.json({ csrfToken: 'fresh' })),
      http.post('/api/thing', ({ request }) => {
        const token = request.headers.get('X-CSRF-Token');
        tokens.push(token);
        return token === 'fresh' ? HttpResponse.json({ ok: true }) : apiError(403, 'csrf_invalid', 'The form expired: reload the page.');
      }),
    );
    await expect(api.post('/api/thing', {}, OkSchema)).resolves.toEqual({ ok: true });
    expect(tokens).toEqual(['stale', 'fresh']);
  });

  it('gives up after one retry when the fresh token is refused too', async () => {
    setCsrfToken('stale');
    let attempts = 0;
    server.use(
      http.post('/api/thing', () => {
        attempts += 1;
        return apiError(403, 'csrf_invalid', 'The form expired: reload the page.');
      }),
    );
    await expect(api.post('/api/thing', {}, OkSchema)).rejects.toMatchObject({ status: 403, code: 'csrf_invalid' });
    expect(attempts).toBe(2);
  });

  it('does not retry a 403 that is about the role', async () => {
    setCsrfToken('good');
    let attempts = 0;
    server.use(
      http.post('/api/thing', () => {
        attempts += 1;
        return apiError(403, 'forbidden', 'Only admins can do this.');
      }),
    );
    await expect(api.post('/api/thing', {}, OkSchema)).rejects.toMatchObject({ code: 'forbidden', message: 'Only admins can do this.' });
    expect(attempts).toBe(1);
  });

  it('reports a network failure as status 0 with a message saying so', async () => {
    server.use(http.get('/api/thing', () => HttpResponse.error()));
    await expect(api.get('/api/thing', OkSchema)).rejects.toMatchObject({
      status: 0,
      code: 'network_error',
      message: expect.stringMatching(/could not reach its server/),
    });
  });

  it('names the status when the error body is not the API’s JSON', async () => {
    server.use(
      http.get('/api/thing', () => new HttpResponse('<html>Bad gateway</html>', { status: 502, headers: { 'Content-Type': 'text/html' } })),
    );
    await expect(api.get('/api/thing', OkSchema)).rejects.toMatchObject({
      status: 502,
      code: 'unexpected_response',
      message: expect.stringContaining('502'),
    });
  });

  it('rejects a reply that does not match the contract, naming where', async () => {
    server.use(http.get('/api/thing', () => HttpResponse.json({ ok: 'yes' })));
    await expect(api.get('/api/thing', OkSchema)).rejects.toMatchObject({
      code: 'unexpected_response',
      message: expect.stringContaining('at ok'),
    });
  });

  it('returns nothing for 204 and drops empty query values', async () => {
    let url = '';
    setCsrfToken('t');
    server.use(
      http.get('/api/list', ({ request }) => {
        url = new URL(request.url).search;
        return HttpResponse.json({ ok: true });
      }),
      http.delete('/api/thing', () => new HttpResponse(null, { status: 204 })),
    );
    await api.get('/api/list', OkSchema, { q: 'ada', role: undefined, page: 2, empty: '' });
    expect(url).toBe('?q=ada&page=2');
    await expect(api.delete('/api/thing')).resolves.toBeUndefined();
  });
});
