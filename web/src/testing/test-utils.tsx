import { QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { ReactElement } from 'react';
import { createMemoryRouter, MemoryRouter, RouterProvider } from 'react-router-dom';
import type { MeDto } from '@core/contracts';
import { AppProvider } from '@/app/provider';
import { routes } from '@/app/router';
import { server } from './mocks/server';

/** A QueryClient for one test: no retries (a failure shows at once), nothing shared with other tests. */
export function createTestQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity }, mutations: { retry: false } } });
}

/** Renders one component inside the app's providers and a MemoryRouter at `route`. */
export function renderWithProviders(ui: ReactElement, { route = '/' }: { route?: string } = {}) {
  const queryClient = createTestQueryClient();
  const user = userEvent.setup();
  const result = render(
    <AppProvider queryClient={queryClient}>
      <MemoryRouter initialEntries={[route]}>{ui}</MemoryRouter>
    </AppProvider>,
  );
  return { ...result, user, queryClient };
}

/** Renders the whole app's route tree at `url`, with the same routes, guards and lazy pages as the browser. */
export function renderApp(url: string) {
  const queryClient = createTestQueryClient();
  const router = createMemoryRouter(routes, { initialEntries: [url] });
  const user = userEvent.setup();
  const result = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...result, user, queryClient, router };
}

/** Makes GET /api/me answer with this person (signed in). */
export function signInAs(me: MeDto) {
  server.use(http.get('/api/me', () => HttpResponse.json(me)));
}
