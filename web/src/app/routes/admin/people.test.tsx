import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import type { PersonDto } from '@core/contracts';
import { buildMe, buildPerson } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

const admin = buildPerson({ name: 'Ada Quill', email: 'ada.quill@brackenmoor.example', roles: ['admin', 'teacher'] });
const invited = buildPerson({ name: 'Rowan Ashby', email: 'rowan@brackenmoor.example', status: 'invited', roles: ['student'] });
const locked = buildPerson({
  name: 'Lane Vireo',
  email: 'lane@brackenmoor.example',
  roles: ['teacher'],
  abilities: { changeRoles: false },
});

function mockPeople(people: PersonDto[]) {
  const queries: string[] = [];
  server.use(
    http.get('/api/admin/people', ({ request }) => {
      const url = new URL(request.url);
      queries.push(url.search);
      const q = url.searchParams.get('q')?.toLowerCase();
      const found = q ? people.filter((person) => person.name.toLowerCase().includes(q)) : people;
      return HttpResponse.json({ people: found, total: found.length, page: 1, pageSize: 25 });
    }),
  );
  return queries;
}

describe('admin people page', () => {
  it('lists people with their status and searches on the server', async () => {
    signInAs(buildMe(['admin']));
    const queries = mockPeople([admin, invited, locked]);
    const { user } = renderApp('/admin/people');
    const table = await screen.findByRole('table');
    expect(within(table).getByText('Rowan Ashby').closest('tr')).toHaveTextContent('Invited');
    expect(within(table).getByText('Ada Quill').closest('tr')).toHaveTextContent('Active');
    expect(screen.getByText('Showing 1–3 of 3.')).toBeInTheDocument();

    await user.type(screen.getByLabelText('Search'), 'rowan');
    expect(await screen.findByText('Showing 1–1 of 1.')).toBeInTheDocument();
    // Debounced: one request for the whole word, not one per key.
    expect(queries.filter((search) => search.includes('q='))).toEqual(['?q=rowan&page=1&pageSize=25']);
  });

  it('filters by role through the API', async () => {
    signInAs(buildMe(['admin']));
    const queries = mockPeople([admin]);
    const { user } = renderApp('/admin/people');
    await screen.findByRole('table');
    await user.selectOptions(screen.getByLabelText('Role'), 'coordinator');
    await screen.findByText('Showing 1–1 of 1.');
    expect(queries.at(-1)).toBe('?role=coordinator&page=1&pageSize=25');
  });

  it('saves role changes and shows the last-admin refusal inline', async () => {
    signInAs(buildMe(['admin']));
    mockPeople([admin, locked]);
    let body: unknown;
    server.use(
      http.patch(`/api/admin/people/${admin.userId}`, async ({ request }) => {
        body = await request.json();
        return apiError(409, 'last_admin', 'Ada Quill is the school’s last admin: give another person the Admin role first.');
      }),
    );
    const { user } = renderApp('/admin/people');
    await user.click(await screen.findByRole('button', { name: 'Change the roles of Ada Quill' }));
    const roles = screen.getByRole('group', { name: 'Roles of Ada Quill' });
    await user.click(within(roles).getByRole('checkbox', { name: 'Admin' }));
    await user.click(screen.getByRole('button', { name: 'Save roles' }));
    expect(await screen.findByText('Ada Quill is the school’s last admin: give another person the Admin role first.')).toBeInTheDocument();
    expect(body).toEqual({ roles: ['teacher'] });
    // The API said this person's roles may not be changed by this admin: no button.
    expect(screen.queryByRole('button', { name: 'Change the roles of Lane Vireo' })).not.toBeInTheDocument();
  });
});
