import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import type { AuthConfigDto } from '@core/contracts';
import { buildMe } from '@/testing/mocks/data';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

const demo: AuthConfigDto = {
  demoMode: true,
  demoAccounts: [
    { email: 'ada.quill@brackenmoor.example', name: 'Ada Quill', label: 'Teacher' },
    { email: 'tobin.marsh@brackenmoor.example', name: 'Tobin Marsh', label: 'Student' },
  ],
};

describe('landing page', () => {
  it('states what Pinfield is for and offers both ways to sign in', async () => {
    renderApp('/');
    expect(await screen.findByRole('heading', { level: 1 })).toHaveTextContent(/Demonstrations that stop and ask/);
    const google = screen.getByRole('link', { name: /Continue with Google/ });
    // A plain link (full navigation), never a fetch: the API redirects to the provider.
    expect(google).toHaveAttribute('href', '/api/auth/google');
    expect(screen.getByRole('heading', { name: 'Sign in with an e-mail link' })).toBeInTheDocument();
    expect(screen.getByLabelText(/School e-mail address/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Join a class' })).toHaveAttribute('href', '/join');
  });

  it('lists the demo accounts with their role labels in demo mode', async () => {
    server.use(http.get('/api/auth/config', () => HttpResponse.json(demo)));
    renderApp('/');
    const panel = await screen.findByRole('region', { name: 'Demo accounts' });
    expect(panel).toHaveTextContent('Ada Quill');
    expect(panel).toHaveTextContent('ada.quill@brackenmoor.example');
    expect(panel).toHaveTextContent('Teacher');
    expect(panel).toHaveTextContent('Tobin Marsh');
    expect(panel).toHaveTextContent('Student');
    expect(panel).toHaveTextContent(/pick one there/);
  });

  it('shows no demo accounts outside demo mode', async () => {
    renderApp('/');
    await screen.findByRole('link', { name: /Continue with Google/ });
    expect(screen.queryByRole('region', { name: 'Demo accounts' })).not.toBeInTheDocument();
  });

  it('sends a signed-in visitor to their active role’s home', async () => {
    signInAs(buildMe(['coordinator', 'teacher']));
    server.use(http.get('/api/departments/overview', () => HttpResponse.json({ departments: [] })));
    const { router } = renderApp('/');
    expect(await screen.findByRole('heading', { name: 'Your department' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/coordinator');
  });

  it('shows the neutral notice after asking for an e-mail link', async () => {
    let body: unknown;
    server.use(
      http.post('/api/auth/email-link', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json(
          { message: 'If that address belongs to a Pinfield account, a sign-in link is on its way.' },
          { status: 202 },
        );
      }),
    );
    const { user } = renderApp('/');
    await user.type(await screen.findByLabelText(/School e-mail address/), '  Ada.Quill@Brackenmoor.example ');
    await user.click(screen.getByRole('button', { name: /E-mail me a sign-in link/ }));
    expect(await screen.findByText(/a sign-in link is on its way/)).toBeInTheDocument();
    expect(body).toEqual({ email: 'ada.quill@brackenmoor.example' });
  });

  it('shows the shared schema’s message for an invalid address without calling the API', async () => {
    const { user } = renderApp('/');
    await user.type(await screen.findByLabelText(/School e-mail address/), 'not-an-address');
    await user.click(screen.getByRole('button', { name: /E-mail me a sign-in link/ }));
    expect(await screen.findByText('Enter a valid e-mail address, like name@school.example.')).toBeInTheDocument();
    expect(screen.getByLabelText(/School e-mail address/)).toHaveAttribute('aria-invalid', 'true');
  });

  it('shows a rate limit as a banner', async () => {
    server.use(
      http.post('/api/auth/email-link', () =>
        HttpResponse.json(
          { error: { code: 'rate_limited', message: 'Too many sign-in requests for this address: wait 15 minutes.' } },
          { status: 429 },
        ),
      ),
    );
    const { user } = renderApp('/');
    await user.type(await screen.findByLabelText(/School e-mail address/), 'ada.quill@brackenmoor.example');
    await user.click(screen.getByRole('button', { name: /E-mail me a sign-in link/ }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Too many sign-in requests for this address: wait 15 minutes.');
  });
});
