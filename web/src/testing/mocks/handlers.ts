import { http, HttpResponse } from 'msw';
import type { AuthConfigDto, CsrfDto } from '@core/contracts';

/** An API error body in the shape every API failure has. */
export function apiError(status: number, code: string, message: string, details?: { path: string; message: string }[]) {
  return HttpResponse.json({ error: { code, message, ...(details ? { details } : {}) } }, { status });
}

/** What every test starts with: nobody signed in, demo mode off. Tests add their own handlers with server.use(). */
export const handlers = [
  http.get('/api/auth/csrf', () => HttpResponse.json<CsrfDto>({ csrfToken: 'csrf-1' })),
  http.get('/api/auth/config', () => HttpResponse.json<AuthConfigDto>({ demoMode: false, demoAccounts: [] })),
  http.get('/api/me', () => apiError(401, 'unauthenticated', 'Sign in to continue.')),
];
