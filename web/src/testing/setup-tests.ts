import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterAll, afterEach, beforeAll } from 'vitest';
import { setCsrfToken } from '@/lib/api-client';
import { server } from './mocks/server';

// Lazy routes load on first render; on a busy two-core CI machine that can take longer than the 1 s default.
configure({ asyncUtilTimeout: 5000 });

// Any request a test did not plan for fails the test, so no call goes unnoticed.
beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  server.resetHandlers();
  setCsrfToken(null);
});
afterAll(() => server.close());
