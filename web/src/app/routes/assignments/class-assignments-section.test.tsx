import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { buildAssignment } from '@/features/assignments/testing/assignment-mocks';
import { buildClassDetail, buildMe, nextId } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

function mockClass(reply: () => Response) {
  const cls = buildClassDetail({ name: '10A Physics (test)' });
  const queries: string[] = [];
  server.use(
    http.get(`/api/classes/${cls.id}`, () => HttpResponse.json(cls)),
    http.get('/api/assignments', ({ request }) => {
      queries.push(new URL(request.url).searchParams.get('classId') ?? '');
      return reply();
    }),
  );
  return { cls, queries };
}

describe('the teacher class page’s assigned lessons', { timeout: 20_000 }, () => {
  it('lists the class’s assignments with version, due time in school time, state and how many are done', async () => {
    signInAs(buildMe(['teacher']));
    const coil = buildAssignment({
      lesson: { id: nextId(), title: 'Field of a flat coil (test)', latestVersion: 2 },
      versionNumber: 2,
      dueAt: '2026-12-03T17:00:00.000Z',
      phase: 'late',
      counts: { students: 6, started: 4, done: 3 },
    });
    const needle = buildAssignment({
      lesson: { id: nextId(), title: 'Needle near a coil (test)', latestVersion: 1 },
      dueAt: '2026-06-10T15:30:00.000Z',
      phase: 'upcoming',
      counts: { students: 6, started: 0, done: 0 },
    });
    const { cls, queries } = mockClass(() => HttpResponse.json({ assignments: [coil, needle] }));
    renderApp(`/teacher/classes/${cls.id}`);
    const table = await screen.findByRole('table', { name: 'Lessons assigned to 10A Physics (test)' });
    expect(queries).toEqual([cls.id]);
    const rows = within(table).getAllByRole('row').slice(1);
    expect(
      rows.map((row) =>
        within(row)
          .getAllByRole('cell')
          .map((cell) => cell.textContent),
      ),
    ).toEqual([
      ['Field of a flat coil (test)', 'v2', 'Thu, 3 Dec 2026, 17:00 GMT', 'Taking late answers', '3 of 6'],
      ['Needle near a coil (test)', 'v1', 'Wed, 10 Jun 2026, 16:30 BST', 'Not open yet', '0 of 6'],
    ]);
    expect(within(table).getByRole('link', { name: 'Field of a flat coil (test)' })).toHaveAttribute(
      'href',
      `/teacher/assignments/${coil.id}`,
    );
  });

  it('says how a lesson gets assigned when there is none yet', async () => {
    signInAs(buildMe(['teacher']));
    const { cls } = mockClass(() => HttpResponse.json({ assignments: [] }));
    renderApp(`/teacher/classes/${cls.id}`);
    const empty = await screen.findByText(/No lesson is assigned to this class yet/);
    expect(empty).toHaveTextContent(
      'No lesson is assigned to this class yet. Open a published lesson from Lessons and choose “Assign to classes”.',
    );
    expect(within(empty).getByRole('link', { name: 'Lessons' })).toHaveAttribute('href', '/teacher/lessons');
  });

  it('shows a failure to load the list without hiding the class', async () => {
    signInAs(buildMe(['teacher']));
    const { cls } = mockClass(() => apiError(500, 'internal', 'Pinfield could not read the assignments. Try again in a moment.'));
    renderApp(`/teacher/classes/${cls.id}`);
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The class’s assignments could not be loaded');
    expect(alert).toHaveTextContent('Pinfield could not read the assignments. Try again in a moment.');
    expect(screen.getByRole('heading', { level: 1, name: '10A Physics (test)' })).toBeInTheDocument();
  });
});
