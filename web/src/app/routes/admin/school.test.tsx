import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import type { SchoolDto } from '@core/contracts';
import { buildMe, SCHOOL_ID } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

const school: SchoolDto = {
  id: SCHOOL_ID,
  name: 'Brackenmoor School (test)',
  timeZone: 'Europe/London',
  locale: 'en-GB',
  emailDomains: ['brackenmoor.example'],
};

describe('school settings', () => {
  it('checks a domain with the shared rule before sending it', async () => {
    signInAs(buildMe(['admin']));
    server.use(http.get('/api/admin/school', () => HttpResponse.json(school)));
    const { user } = renderApp('/admin/school');
    await user.type(await screen.findByLabelText('Add a domain'), 'https://nope');
    await user.click(screen.getByRole('button', { name: /Add domain/ }));
    expect(await screen.findByText('Enter a domain like school.example, without @ or https://.')).toBeInTheDocument();
  });

  it('adds a domain by saving the whole list', async () => {
    signInAs(buildMe(['admin']));
    let current = school;
    let body: unknown;
    server.use(
      http.get('/api/admin/school', () => HttpResponse.json(current)),
      http.patch('/api/admin/school', async ({ request }) => {
        body = await request.json();
        current = { ...current, emailDomains: (body as { emailDomains: string[] }).emailDomains };
        return HttpResponse.json(current);
      }),
    );
    const { user } = renderApp('/admin/school');
    await user.type(await screen.findByLabelText('Add a domain'), 'Pupils.Brackenmoor.example');
    await user.click(screen.getByRole('button', { name: /Add domain/ }));
    expect(await screen.findByText('pupils.brackenmoor.example added.')).toBeInTheDocument();
    expect(body).toEqual({ emailDomains: ['brackenmoor.example', 'pupils.brackenmoor.example'] });
    expect(screen.getByRole('button', { name: 'Remove pupils.brackenmoor.example' })).toBeInTheDocument();
  });

  it('shows the server’s refusal of the new domain next to the input', async () => {
    signInAs(buildMe(['admin']));
    server.use(
      http.get('/api/admin/school', () => HttpResponse.json(school)),
      http.patch('/api/admin/school', () =>
        apiError(400, 'validation_failed', 'The school has 1 problem.', [
          { path: 'emailDomains.1', message: 'That domain belongs to another school.' },
        ]),
      ),
    );
    const { user } = renderApp('/admin/school');
    await user.type(await screen.findByLabelText('Add a domain'), 'taken.example');
    await user.click(screen.getByRole('button', { name: /Add domain/ }));
    expect(await screen.findByText('That domain belongs to another school.')).toBeInTheDocument();
    expect(screen.getByLabelText('Add a domain')).toHaveAttribute('aria-invalid', 'true');
  });
});
