import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import type { RosterPreviewDto } from '@core/contracts';
import { buildMe } from '@/testing/mocks/data';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

const BAD_CSV = 'email,name,roles,class\nrowan@brackenmoor.example,Rowan Ashby,student,Year 10\nnot-an-email,Mira Okafor,wizard,';
const GOOD_CSV = 'email,name,roles,class\nrowan@brackenmoor.example,Rowan Ashby,student,Year 10';

const invalidPreview: RosterPreviewDto = {
  valid: false,
  errors: [],
  rows: [
    {
      line: 2,
      email: 'rowan@brackenmoor.example',
      name: 'Rowan Ashby',
      roles: ['student'],
      className: 'Year 10',
      errors: [],
      existing: false,
    },
    {
      line: 3,
      email: 'not-an-email',
      name: 'Mira Okafor',
      roles: ['wizard'],
      className: null,
      errors: ['Enter a valid e-mail address.', 'Unknown role “wizard”.'],
      existing: false,
    },
  ],
};
const validPreview: RosterPreviewDto = { valid: true, errors: [], rows: [invalidPreview.rows[0]!] };

function mockRoster() {
  const imports: unknown[] = [];
  server.use(
    http.post('/api/admin/roster/preview', async ({ request }) => {
      const body = (await request.json()) as { csv: string };
      return HttpResponse.json(body.csv === GOOD_CSV ? validPreview : invalidPreview);
    }),
    http.post('/api/admin/roster/import', async ({ request }) => {
      imports.push(await request.json());
      return HttpResponse.json({ invited: 1, enrolled: 1 }, { status: 201 });
    }),
  );
  return imports;
}

describe('roster import page', () => {
  it('shows each row’s problems in that row and keeps Import disabled while any row is invalid', async () => {
    signInAs(buildMe(['admin']));
    const imports = mockRoster();
    const { user } = renderApp('/admin/roster');
    const importButton = await screen.findByRole('button', { name: 'Import roster' });
    expect(importButton).toBeDisabled();

    await user.click(screen.getByLabelText('Or paste it here'));
    await user.paste(BAD_CSV);
    await user.click(screen.getByRole('button', { name: /Check the roster/ }));

    const table = await screen.findByRole('table');
    const rows = within(table).getAllByRole('row');
    // Header, line 2, line 3.
    expect(rows).toHaveLength(3);
    expect(rows[1]).toHaveTextContent('Ready');
    expect(rows[2]).toHaveTextContent('Enter a valid e-mail address.');
    expect(rows[2]).toHaveTextContent('Unknown role “wizard”.');
    expect(rows[2]).toHaveClass('bg-danger-soft');
    expect(rows[1]).not.toHaveClass('bg-danger-soft');
    expect(screen.getByText(/1 row has problems/)).toBeInTheDocument();
    expect(importButton).toBeDisabled();
    expect(imports).toEqual([]);
  });

  it('enables Import once the checked roster is valid, and reports the result', async () => {
    signInAs(buildMe(['admin']));
    const imports = mockRoster();
    const { user } = renderApp('/admin/roster');
    await user.click(await screen.findByLabelText('Or paste it here'));
    await user.paste(GOOD_CSV);
    await user.click(screen.getByRole('button', { name: /Check the roster/ }));
    expect(await screen.findByText('Every row is ready')).toBeInTheDocument();

    // Editing the text after the check asks for a new check before importing.
    await user.type(screen.getByLabelText('Or paste it here'), ' ');
    expect(screen.getByRole('button', { name: 'Import roster' })).toBeDisabled();
    await user.type(screen.getByLabelText('Or paste it here'), '{Backspace}');

    await user.click(screen.getByRole('button', { name: 'Import roster' }));
    expect(await screen.findByText('Roster imported')).toBeInTheDocument();
    expect(screen.getByText('1 person invited, 1 enrolment made.')).toBeInTheDocument();
    expect(imports).toEqual([{ csv: GOOD_CSV }]);
  });

  it('says the file is empty without asking the server', async () => {
    signInAs(buildMe(['admin']));
    mockRoster();
    const { user } = renderApp('/admin/roster');
    await user.click(await screen.findByRole('button', { name: /Check the roster/ }));
    expect(await screen.findByText('The CSV file is empty.')).toBeInTheDocument();
  });
});
