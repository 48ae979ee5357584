import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';

const TOKEN = 'aB3_dE5-fG7hJ9kL1mN2pQ4rS6tU8vW0xY';

function trackVerify(respond: () => Response) {
  const calls: unknown[] = [];
  server.use(
    http.post('/api/auth/email-link/verify', async ({ request }) => {
      calls.push(await request.json());
      return respond();
    }),
  );
  return calls;
}

describe('e-mail sign-in link page', () => {
  it('does not use the token when the page is merely opened', async () => {
    const calls = trackVerify(() => HttpResponse.json(buildMe(['student'])));
    const started: string[] = [];
    const record = ({ request }: { request: Request }) => void started.push(`${request.method} ${new URL(request.url).pathname}`);
    server.events.on('request:start', record);
    renderApp(`/signin/link?token=${TOKEN}`);
    expect(await screen.findByRole('button', { name: 'Sign in to Pinfield' })).toBeEnabled();
    // Give any effect a chance to fire its request (in-process, so a few milliseconds suffice); this is a settle, not a timing check.
    await new Promise((resolve) => setTimeout(resolve, 100));
    server.events.removeListener('request:start', record);
    expect(started.filter((entry) => entry.includes('/api/auth/email-link/verify'))).toEqual([]);
    expect(calls).toEqual([]);
  });

  it('uses the token when the button is pressed and opens the home of the signed-in role', async () => {
    const calls = trackVerify(() => HttpResponse.json(buildMe(['student'])));
    server.use(http.get('/api/student/classes', () => HttpResponse.json({ classes: [] })));
    const { user, router } = renderApp(`/signin/link?token=${TOKEN}`);
    await user.click(await screen.findByRole('button', { name: 'Sign in to Pinfield' }));
    expect(await screen.findByRole('heading', { name: 'Hello, Ada Quill' })).toBeInTheDocument();
    expect(calls).toEqual([{ token: TOKEN }]);
    expect(router.state.location.pathname).toBe('/student');
  });

  it('shows why a used or expired link was refused, and offers a new one', async () => {
    trackVerify(() => apiError(400, 'link_invalid', 'This sign-in link has expired or was already used. Request a new one.'));
    const { user } = renderApp(`/signin/link?token=${TOKEN}`);
    await user.click(await screen.findByRole('button', { name: 'Sign in to Pinfield' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('This sign-in link has expired or was already used. Request a new one.');
    expect(screen.getByRole('heading', { name: 'Request a new sign-in link' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: /Send a new link/ })).toBeInTheDocument();
    // The refused link cannot work again, so its button is gone.
    expect(screen.queryByRole('button', { name: 'Sign in to Pinfield' })).not.toBeInTheDocument();
  });

  it('explains a damaged link without calling the API', async () => {
    const calls = trackVerify(() => HttpResponse.json(buildMe()));
    renderApp('/signin/link?token=short');
    expect(await screen.findByRole('alert')).toHaveTextContent('The sign-in link is incomplete or damaged: request a new one.');
    expect(screen.queryByRole('button', { name: 'Sign in to Pinfield' })).not.toBeInTheDocument();
    expect(calls).toEqual([]);
  });
});
