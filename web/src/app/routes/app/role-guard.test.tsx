import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { buildMe, SCHOOL_ID } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

describe('role guard', () => {
  it('shows a student on an admin page that it is not available for their role', async () => {
    signInAs(buildMe(['student']));
    renderApp('/admin/people');
    expect(await screen.findByRole('heading', { name: 'Not available for your role' })).toBeInTheDocument();
    expect(screen.getByText(/You are signed in as/)).toHaveTextContent(
      'This page is for the Admin role. You are signed in as Student at Brackenmoor School (test).',
    );
    expect(screen.getByRole('link', { name: 'Go to your Student home' })).toHaveAttribute('href', '/student');
    expect(screen.queryByRole('button', { name: /Switch to/ })).not.toBeInTheDocument();
  });

  it('lets a teacher who also coordinates switch role in place', async () => {
    signInAs(buildMe(['teacher', 'coordinator']));
    let sent: unknown;
    server.use(
      http.put('/api/me/active', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(buildMe(['teacher', 'coordinator'], { active: { schoolId: SCHOOL_ID, role: 'coordinator' } }));
      }),
      http.get('/api/departments/overview', () => HttpResponse.json({ departments: [] })),
    );
    const { user } = renderApp('/coordinator');
    await user.click(await screen.findByRole('button', { name: 'Switch to Coordinator' }));
    expect(await screen.findByRole('heading', { name: 'Your department' })).toBeInTheDocument();
    expect(sent).toEqual({ schoolId: SCHOOL_ID, role: 'coordinator' });
  });

  it('sends a signed-out visitor to the sign-in page', async () => {
    const { router } = renderApp('/teacher');
    expect(await screen.findByRole('heading', { name: 'Sign in', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/signin');
  });

  it('shows the API’s 403 as a banner instead of a blank page', async () => {
    signInAs(buildMe(['teacher']));
    server.use(http.get('/api/teacher/classes', () => apiError(403, 'forbidden', 'Only teachers of this school can list their classes.')));
    renderApp('/teacher');
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Your classes could not be loaded');
    expect(alert).toHaveTextContent('Only teachers of this school can list their classes.');
  });

  it('says so when the server cannot be reached', async () => {
    server.use(http.get('/api/me', () => HttpResponse.error()));
    renderApp('/teacher');
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'Pinfield could not reach its server. Check your network connection and try again.',
    );
  });

  it('switches role from the header and opens that role’s home; sign-out opens the sign-in page', async () => {
    signInAs(buildMe(['teacher', 'coordinator']));
    server.use(
      http.get('/api/teacher/classes', () => HttpResponse.json({ classes: [] })),
      http.put('/api/me/active', () =>
        HttpResponse.json(buildMe(['teacher', 'coordinator'], { active: { schoolId: SCHOOL_ID, role: 'coordinator' } })),
      ),
      http.get('/api/departments/overview', () => HttpResponse.json({ departments: [] })),
    );
    const { user, router } = renderApp('/teacher');
    await user.selectOptions(await screen.findByLabelText('Acting as'), 'Coordinator');
    expect(await screen.findByRole('heading', { name: 'Your department' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/coordinator');

    server.use(
      http.post('/api/auth/sign-out', () => new HttpResponse(null, { status: 204 })),
      http.get('/api/me', () => apiError(401, 'unauthenticated', 'Sign in to continue.')),
    );
    await user.click(screen.getByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('heading', { name: 'Sign in', level: 1 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/signin');
  });
});
