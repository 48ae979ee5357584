import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import type { LessonListDto } from '@core/contracts';
import { buildLesson, buildLessonList, buildLessonSummary } from '@/features/lessons/testing/lesson-mocks';
import { renderLessonRoute } from '@/features/lessons/testing/render-lesson-route';
import { buildMe, nextId } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { buildRecording } from '@/testing/mocks/recordings';
import { server } from '@/testing/mocks/server';
import { signInAs } from '@/testing/test-utils';

beforeAll(async () => {
  await import('./lessons');
});

function mockList(list: () => LessonListDto) {
  const queries: string[] = [];
  server.use(
    http.get('/api/lessons', ({ request }) => {
      queries.push(new URL(request.url).search);
      return HttpResponse.json(list());
    }),
  );
  return queries;
}

describe('lessons list', { timeout: 20_000 }, () => {
  it('shows state in words, version, checkpoints, tags, owner, sharing and the updated date', async () => {
    const me = buildMe(['teacher']);
    signInAs(me);
    const colleague = { id: nextId(), name: 'Tobin Marsh' };
    mockList(() =>
      buildLessonList([
        buildLessonSummary({
          title: 'Helmholtz pair (test)',
          state: 'published',
          publishedVersion: 3,
          unpublishedChanges: true,
          checkpointCount: 7,
          shared: true,
          owner: { id: me.user.id, name: me.user.name },
        }),
        buildLessonSummary({
          title: 'Falling magnet (test)',
          tags: ['induction'],
          owner: colleague,
          publishedVersion: null,
          checkpointCount: 1,
        }),
      ]),
    );
    renderLessonRoute('/teacher/lessons');
    const list = await screen.findByRole('list', { name: 'Lessons' });
    const mine = within(list).getByRole('listitem', { name: 'Helmholtz pair (test)' });
    expect(mine).toHaveTextContent('Published');
    expect(mine).toHaveTextContent('v3 · unpublished changes');
    expect(mine).toHaveTextContent('7 checkpoints');
    expect(mine).toHaveTextContent('Shared with the department');
    expect(mine).toHaveTextContent('Made by you');
    expect(mine).toHaveTextContent('Updated 4 Mar 2025');
    expect(within(mine).getByRole('link', { name: 'Open Helmholtz pair (test) in the studio' })).toHaveAttribute(
      'href',
      expect.stringMatching(/^\/teacher\/lessons\/[0-9a-f-]+\/studio$/),
    );
    const theirs = within(list).getByRole('listitem', { name: 'Falling magnet (test)' });
    expect(theirs).toHaveTextContent('Draft');
    expect(theirs).toHaveTextContent('Never published');
    expect(theirs).toHaveTextContent('1 checkpoint');
    expect(theirs).toHaveTextContent('Made by Tobin Marsh');
    expect(within(theirs).getByRole('list', { name: 'Topic tags' })).toHaveTextContent('induction');
    expect(within(theirs).queryByRole('link', { name: /in the studio/ })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'New lesson' })).toHaveAttribute('href', '/teacher/lessons/new');
    // The people filter offers colleagues by name, not the caller (they have "Only me").
    const owner = screen.getByLabelText('Made by');
    expect(within(owner).getByRole('option', { name: 'Tobin Marsh' })).toBeInTheDocument();
    expect(within(owner).queryByRole('option', { name: me.user.name })).not.toBeInTheDocument();
  });

  it('keeps search, tag, owner, state and order in the URL and in the request', async () => {
    signInAs(buildMe(['teacher']));
    const queries = mockList(() => buildLessonList([buildLessonSummary({ tags: ['coils', 'magnetism'] })]));
    const { user, router } = renderLessonRoute('/teacher/lessons?tag=coils&state=draft&sort=nonsense');
    await screen.findByText('1 lesson');
    expect(queries[0]).toBe('?tag=coils&state=draft&sort=updated');
    expect(screen.getByLabelText('Topic tag')).toHaveValue('coils');
    expect(screen.getByLabelText('State')).toHaveValue('draft');

    await user.selectOptions(screen.getByLabelText('Made by'), 'me');
    expect(router.state.location.search).toBe('?tag=coils&owner=me&state=draft');
    await user.selectOptions(screen.getByLabelText('Order'), 'title');
    await user.selectOptions(screen.getByLabelText('State'), 'archived');
    expect(router.state.location.search).toBe('?tag=coils&owner=me&state=archived&sort=title');
    await user.type(screen.getByLabelText('Search'), 'helmholtz');
    await waitFor(() => expect(router.state.location.search).toBe('?q=helmholtz&tag=coils&owner=me&state=archived&sort=title'));
    await waitFor(() => expect(queries.at(-1)).toBe('?q=helmholtz&tag=coils&owner=me&state=archived&sort=title'));

    await user.selectOptions(screen.getByLabelText('Topic tag'), '');
    expect(router.state.location.search).toBe('?q=helmholtz&owner=me&state=archived&sort=title');
  });

  it('says what to do when there are no lessons, and how to undo filters that match nothing', async () => {
    signInAs(buildMe(['teacher']));
    const queries = mockList(() => buildLessonList([]));
    const { user, router } = renderLessonRoute('/teacher/lessons');
    expect(await screen.findByText('No lessons yet')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Recordings page' })).toHaveAttribute('href', '/teacher/recordings');

    await user.selectOptions(screen.getByLabelText('State'), 'published');
    expect(await screen.findByText('No lesson matches these filters')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'clear the filters' }));
    expect(router.state.location.search).toBe('');
    expect(await screen.findByText('No lessons yet')).toBeInTheDocument();
    expect(queries).toContain('?state=published&sort=updated');
  });

  it('a substitute sees shared lessons read-only: preview and duplicate, and duplicating opens the copy', async () => {
    signInAs(buildMe(['substitute']));
    const shared = buildLessonSummary({ title: 'Helmholtz pair (test)', shared: true, state: 'published', publishedVersion: 1 });
    mockList(() => buildLessonList([shared]));
    const copy = buildLesson({ title: 'Copy of Helmholtz pair (test)' });
    let duplicated = 0;
    server.use(
      http.post(`/api/lessons/${shared.id}/duplicate`, () => {
        duplicated += 1;
        return HttpResponse.json(copy, { status: 201 });
      }),
      http.get(`/api/lessons/${copy.id}`, () => HttpResponse.json(copy)),
      http.get(`/api/lessons/${copy.id}/versions`, () => HttpResponse.json({ versions: [] })),
    );
    const { user, router } = renderLessonRoute('/substitute/lessons');
    const card = await screen.findByRole('listitem', { name: 'Helmholtz pair (test)' });
    expect(screen.queryByRole('link', { name: 'New lesson' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Import lesson file' })).not.toBeInTheDocument();
    expect(within(card).getByRole('link', { name: 'Open Helmholtz pair (test)' })).toHaveAttribute(
      'href',
      `/substitute/lessons/${shared.id}`,
    );
    expect(within(card).getByRole('link', { name: 'Preview Helmholtz pair (test) as a student' })).toHaveAttribute(
      'href',
      `/substitute/lessons/${shared.id}/preview`,
    );
    await user.click(within(card).getByRole('button', { name: 'Duplicate Helmholtz pair (test)' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/substitute/lessons/${copy.id}`));
    expect(await screen.findByRole('heading', { level: 1, name: 'Copy of Helmholtz pair (test)' })).toBeInTheDocument();
    expect(duplicated).toBe(1);
  });

  it('a refused duplicate says why beside the button', async () => {
    signInAs(buildMe(['teacher']));
    const lesson = buildLessonSummary({ title: 'Prism (test)' });
    mockList(() => buildLessonList([lesson]));
    server.use(
      http.post(`/api/lessons/${lesson.id}/duplicate`, () => apiError(404, 'not_found', 'This lesson is no longer shared with you.')),
    );
    const { user } = renderLessonRoute('/teacher/lessons');
    await user.click(await screen.findByRole('button', { name: 'Duplicate Prism (test)' }));
    expect(await screen.findByText('Not duplicated: This lesson is no longer shared with you.')).toBeInTheDocument();
  });

  it('a coordinator who does not teach sees no duplicate button', async () => {
    signInAs(buildMe(['coordinator']));
    mockList(() => buildLessonList([buildLessonSummary({ title: 'Prism (test)', shared: true })]));
    renderLessonRoute('/coordinator/lessons');
    const card = await screen.findByRole('listitem', { name: 'Prism (test)' });
    expect(within(card).queryByRole('button', { name: /Duplicate/ })).not.toBeInTheDocument();
    expect(screen.getByText(/Lessons colleagues shared with you/)).toBeInTheDocument();
  });
});

describe('importing a lesson file', { timeout: 20_000 }, () => {
  function mockImport(answer: (body: unknown) => Response) {
    const recording = buildRecording({ title: 'Coil on a bench (test)', usedBy: [] });
    const bodies: unknown[] = [];
    const recordingQueries: string[] = [];
    mockList(() => buildLessonList([]));
    server.use(
      http.get('/api/recordings', ({ request }) => {
        recordingQueries.push(new URL(request.url).search);
        return HttpResponse.json({ recordings: [recording] });
      }),
      http.post('/api/lessons/import', async ({ request }) => {
        const body = await request.json();
        bodies.push(body);
        return answer(body);
      }),
    );
    return { recording, bodies, recordingQueries };
  }

  const lessonFile = (text: string) => new File([text], 'helmholtz.pinfield-lesson.json', { type: 'application/json' });

  it('lists the problems of a malformed file by line and imports nothing', async () => {
    signInAs(buildMe(['teacher']));
    const { recording, bodies, recordingQueries } = mockImport(() =>
      apiError(400, 'lesson_file_invalid', 'The lesson file has 2 problems.', [
        { path: 'line 12', message: 'A checkpoint needs a prompt.' },
        { path: 'line 30', message: 'Unknown checkpoint kind “quiz”.' },
      ]),
    );
    const { user } = renderLessonRoute('/teacher/lessons');
    await user.click(await screen.findByRole('button', { name: 'Import lesson file' }));
    const panel = await screen.findByRole('region', { name: 'Import a lesson file' });
    await user.click(within(panel).getByRole('button', { name: 'Import lesson' }));
    expect(await within(panel).findByText('Choose the recording the lesson goes on.')).toBeInTheDocument();
    expect(within(panel).getByText('Choose a lesson file.')).toBeInTheDocument();
    expect(bodies).toEqual([]);

    await user.selectOptions(within(panel).getByLabelText(/^Recording/), recording.id);
    await user.upload(within(panel).getByLabelText('Lesson file'), lessonFile('{ "format": "broken" }'));
    await user.click(within(panel).getByRole('button', { name: 'Import lesson' }));
    const problems = await within(panel).findByRole('list', { name: 'Problems in the lesson file' });
    expect(
      within(problems)
        .getAllByRole('listitem')
        .map((item) => item.textContent),
    ).toEqual(['line 12: A checkpoint needs a prompt.', 'line 30: Unknown checkpoint kind “quiz”.']);
    expect(bodies).toEqual([{ recordingId: recording.id, fileName: 'helmholtz.pinfield-lesson.json', text: '{ "format": "broken" }' }]);
    expect(recordingQueries[0]).toBe('?state=ready&owner=school&sort=title');
  });

  it('opens the imported draft in the studio', async () => {
    signInAs(buildMe(['teacher']));
    const imported = buildLesson({ title: 'Helmholtz pair (test)' });
    const { recording } = mockImport(() => HttpResponse.json(imported, { status: 201 }));
    const { user, router } = renderLessonRoute('/teacher/lessons');
    await user.click(await screen.findByRole('button', { name: 'Import lesson file' }));
    const panel = await screen.findByRole('region', { name: 'Import a lesson file' });
    await user.selectOptions(await within(panel).findByLabelText(/^Recording/), recording.id);
    await user.upload(within(panel).getByLabelText('Lesson file'), lessonFile('{}'));
    await user.click(within(panel).getByRole('button', { name: 'Import lesson' }));
    expect(await screen.findByText(`Arrived at the studio of ${imported.id}`)).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(`/teacher/lessons/${imported.id}/studio`);
  });
});
