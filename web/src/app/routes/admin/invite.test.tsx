import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { buildMe, buildPerson } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

function mockLists() {
  server.use(
    http.get('/api/admin/departments', () => HttpResponse.json({ departments: [] })),
    http.get('/api/admin/classes', () => HttpResponse.json({ classes: [] })),
  );
}

async function fillAndSend(user: ReturnType<typeof renderApp>['user']) {
  await user.type(await screen.findByLabelText('E-mail address'), 'rowan@brackenmoor.example');
  await user.type(screen.getByLabelText('Name'), 'Rowan Ashby');
  await user.click(screen.getByRole('checkbox', { name: 'Student' }));
  await user.click(screen.getByRole('button', { name: /Send invitation/ }));
}

describe('invite form', () => {
  it('shows the server’s field error next to that field', async () => {
    signInAs(buildMe(['admin']));
    mockLists();
    server.use(
      http.post('/api/admin/invitations', () =>
        apiError(400, 'validation_failed', 'The invitation has 1 problem.', [
          { path: 'email', message: 'That domain is not one of the school’s.' },
        ]),
      ),
    );
    const { user } = renderApp('/admin/people/invite');
    await fillAndSend(user);
    const message = await screen.findByText('That domain is not one of the school’s.');
    const input = screen.getByLabelText('E-mail address');
    expect(input).toHaveAttribute('aria-invalid', 'true');
    expect(input.getAttribute('aria-describedby')).toContain(message.parentElement?.id);
    // Placed on its field, so no banner repeats it.
    expect(screen.queryByText('The invitation was not sent')).not.toBeInTheDocument();
  });

  it('puts a 409 already_member next to the e-mail address', async () => {
    signInAs(buildMe(['admin']));
    mockLists();
    server.use(
      http.post('/api/admin/invitations', () =>
        apiError(409, 'already_member', 'rowan@brackenmoor.example is already a member of this school.'),
      ),
    );
    const { user } = renderApp('/admin/people/invite');
    await fillAndSend(user);
    expect(await screen.findByText('rowan@brackenmoor.example is already a member of this school.')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail address')).toHaveAttribute('aria-invalid', 'true');
  });

  it('checks roles with the shared schema before sending', async () => {
    signInAs(buildMe(['admin']));
    mockLists();
    const { user } = renderApp('/admin/people/invite');
    await user.type(await screen.findByLabelText('E-mail address'), 'rowan@brackenmoor.example');
    await user.type(screen.getByLabelText('Name'), 'Rowan Ashby');
    await user.click(screen.getByRole('button', { name: /Send invitation/ }));
    expect(await screen.findByText('Choose at least one role.')).toBeInTheDocument();
  });

  it('sends the invitation and confirms it', async () => {
    signInAs(buildMe(['admin']));
    mockLists();
    let body: unknown;
    server.use(
      http.post('/api/admin/invitations', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json(buildPerson({ name: 'Rowan Ashby', email: 'rowan@brackenmoor.example', status: 'invited' }), {
          status: 201,
        });
      }),
    );
    const { user } = renderApp('/admin/people/invite');
    await fillAndSend(user);
    expect(await screen.findByText('Invitation sent')).toBeInTheDocument();
    expect(body).toEqual({
      email: 'rowan@brackenmoor.example',
      name: 'Rowan Ashby',
      roles: ['student'],
      departmentId: null,
      classId: null,
    });
  });
});
