import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterAll, afterEach, beforeAll } from 'vitest';
import { setCsrfToken } from '@/lib/api-client';
import { server } from './mocks/server';

// Any request a test did not plan for fails the test, so no call goes unnoticed.
beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  server.resetHandlers();
  setCsrfToken(null);
});
afterAll(() => server.close());
