import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import type { LessonDto, VersionSummaryDto } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { buildContent, buildLesson, buildLessonList, buildVersion } from '@/features/lessons/testing/lesson-mocks';
import { renderLessonRoute } from '@/features/lessons/testing/render-lesson-route';
import { buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { signInAs } from '@/testing/test-utils';

beforeAll(async () => {
  await import('./lesson-overview');
});

function mockLesson(lesson: () => LessonDto, versions: () => VersionSummaryDto[] = () => []) {
  server.use(
    http.get(`/api/lessons/${lesson().id}`, () => HttpResponse.json(lesson())),
    http.get(`/api/lessons/${lesson().id}/versions`, () => HttpResponse.json({ versions: versions() })),
  );
}

const numeric = { ...newCheckpoint('numeric', 12_500), label: 'Field at the centre', prompt: 'Find $B$.' };
const note = { ...newCheckpoint('note', 3_000), body: 'Watch the needle.' };

describe('lesson overview', { timeout: 20_000 }, () => {
  it('shows the lesson, its safety notes rendered, checkpoints by kind, and what each version changed', async () => {
    signInAs(buildMe(['teacher']));
    const lesson = buildLesson({
      title: 'Helmholtz pair (test)',
      state: 'published',
      publishedVersion: 2,
      unpublishedChanges: false,
      draft: buildContent({ title: 'Helmholtz pair (test)', safetyNotes: 'Keep the current **low**.' }, { checkpoints: [numeric, note] }),
    });
    mockLesson(
      () => lesson,
      () => [
        buildVersion({
          number: 2,
          note: 'Fixed the expected value.',
          publishedBy: { id: lesson.owner?.id ?? '', name: 'Ada Quill' },
          changes: {
            added: [{ key: note.key, label: 'Watch the needle' }],
            removed: [{ key: 'oldkey1', label: 'Old question' }],
            edited: [{ key: numeric.key, label: 'Field at the centre', fields: ['atMs', 'expected'] }],
            chaptersChanged: true,
            settings: ['title', 'safetyNotes'],
          },
        }),
        buildVersion({
          number: 1,
          changes: {
            added: [{ key: numeric.key, label: 'Field at the centre' }],
            removed: [],
            edited: [],
            chaptersChanged: false,
            settings: [],
          },
        }),
      ],
    );
    renderLessonRoute(`/teacher/lessons/${lesson.id}`);
    expect(await screen.findByRole('heading', { level: 1, name: 'Helmholtz pair (test)' })).toBeInTheDocument();
    expect(screen.getByText('v2')).toBeInTheDocument();
    const safety = screen.getByRole('region', { name: 'Safety notes' });
    expect(within(safety).getByText('low').tagName).toBe('STRONG');
    const kinds = screen.getByRole('list', { name: 'Checkpoints by kind' });
    expect(
      within(kinds)
        .getAllByRole('listitem')
        .map((item) => item.textContent),
    ).toEqual(['Numeric answer1', 'Note1']);

    const changes = await screen.findByRole('list', { name: 'What changed in version 2' });
    expect(
      within(changes)
        .getAllByRole('listitem')
        .map((item) => item.textContent),
    ).toEqual([
      'Added “Watch the needle”.',
      'Removed “Old question”.',
      'Edited “Field at the centre”: time and expected answer.',
      'Changed the chapters.',
      'Changed the lesson’s title and safety notes.',
    ]);
    const versions = screen.getByRole('list', { name: 'Versions' });
    expect(versions).toHaveTextContent('Fixed the expected value.');
    expect(versions).toHaveTextContent('Published 5 Mar 2025, 14:30 by Ada Quill');
    expect(versions).toHaveTextContent('The first published version.');
    expect(within(versions).getByRole('link', { name: 'Lesson file of version 1' })).toHaveAttribute(
      'href',
      `/api/lessons/${lesson.id}/export?version=1`,
    );
    expect(screen.getByRole('link', { name: 'Export lesson file' })).toHaveAttribute('href', `/api/lessons/${lesson.id}/export`);
    expect(screen.getByRole('link', { name: 'Chapters track' })).toHaveAttribute('href', `/api/lessons/${lesson.id}/chapters.vtt`);
    expect(screen.getByRole('link', { name: 'Checkpoint times track' })).toHaveAttribute(
      'href',
      `/api/lessons/${lesson.id}/checkpoints.vtt`,
    );
    expect(screen.getByRole('link', { name: 'Open studio' })).toHaveAttribute('href', `/teacher/lessons/${lesson.id}/studio`);
  });

  it('a refused publish lists the problems with links into the studio; a publish sends the revision and note', async () => {
    signInAs(buildMe(['teacher']));
    let lesson = buildLesson({ title: 'Helmholtz pair (test)', revision: 7, draft: buildContent({}, { checkpoints: [note, numeric] }) });
    let versions: VersionSummaryDto[] = [];
    const bodies: unknown[] = [];
    mockLesson(
      () => lesson,
      () => versions,
    );
    server.use(
      http.post(`/api/lessons/${lesson.id}/publish`, async ({ request }) => {
        bodies.push(await request.json());
        if (bodies.length === 1) {
          return apiError(400, 'lesson_not_ready', 'Fix 1 problem before publishing.', [
            { path: 'checkpoints.1.expected', message: 'The formula does not evaluate: unknown name “mu”.' },
          ]);
        }
        const version = buildVersion({ number: 1, note: 'First run.' });
        versions = [version];
        lesson = { ...lesson, state: 'published', publishedVersion: 1, unpublishedChanges: false };
        return HttpResponse.json(version, { status: 201 });
      }),
    );
    const { user } = renderLessonRoute(`/teacher/lessons/${lesson.id}`);
    await user.click(await screen.findByRole('button', { name: 'Publish version 1' }));
    const problems = await screen.findByRole('list', { name: 'Problems to fix before publishing' });
    expect(problems).toHaveTextContent('Checkpoint 2, “Field at the centre” (0:12.5): The formula does not evaluate: unknown name “mu”.');
    expect(within(problems).getByRole('link', { name: 'Checkpoint 2, “Field at the centre” (0:12.5)' })).toHaveAttribute(
      'href',
      `/teacher/lessons/${lesson.id}/studio?problem=checkpoints.1.expected`,
    );
    expect(screen.getByText('Not published: fix these first')).toBeInTheDocument();

    await user.type(screen.getByLabelText(/^Note for this version/), 'First run.');
    await user.click(screen.getByRole('button', { name: 'Publish version 1' }));
    expect(await screen.findByText('Version 1 published')).toBeInTheDocument();
    expect(bodies).toEqual([
      { revision: 7, note: '' },
      { revision: 7, note: 'First run.' },
    ]);
    await waitFor(() => expect(screen.getByRole('list', { name: 'Versions' })).toHaveTextContent('First run.'));
  });

  it('shares, archives, and deletes a never-published lesson only after the confirmation', async () => {
    signInAs(buildMe(['teacher']));
    let lesson = buildLesson({ title: 'Prism (test)' });
    const patches: unknown[] = [];
    let deleted = false;
    mockLesson(() => lesson);
    server.use(
      http.patch(`/api/lessons/${lesson.id}`, async ({ request }) => {
        const body = (await request.json()) as { shared?: boolean; archived?: boolean };
        patches.push(body);
        lesson = {
          ...lesson,
          shared: body.shared ?? lesson.shared,
          state: body.archived === undefined ? lesson.state : body.archived ? 'archived' : 'draft',
        };
        return HttpResponse.json(lesson);
      }),
      http.delete(`/api/lessons/${lesson.id}`, () => {
        deleted = true;
        return new HttpResponse(null, { status: 204 });
      }),
      http.get('/api/lessons', () => HttpResponse.json(buildLessonList([]))),
    );
    const { user, router } = renderLessonRoute(`/teacher/lessons/${lesson.id}`);
    await user.click(await screen.findByLabelText('Share with the department (read-only)'));
    expect(await screen.findByText('Shared with the department.')).toBeInTheDocument();
    expect(screen.getByLabelText('Share with the department (read-only)')).toBeChecked();
    await user.click(screen.getByRole('button', { name: 'Archive' }));
    expect(await screen.findByRole('button', { name: 'Restore from the archive' })).toBeInTheDocument();
    expect(patches).toEqual([{ shared: true }, { archived: true }]);

    await user.click(screen.getByRole('button', { name: 'Delete the lesson' }));
    const dialog = screen.getByRole('alertdialog', { name: 'Delete “Prism (test)”?' });
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(deleted).toBe(false);
    await user.click(screen.getByRole('button', { name: 'Delete the lesson' }));
    await user.click(within(screen.getByRole('alertdialog')).getByRole('button', { name: 'Delete the lesson' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/teacher/lessons'));
    expect(deleted).toBe(true);
  });

  it('a published lesson cannot be deleted, only archived', async () => {
    signInAs(buildMe(['teacher']));
    const lesson = buildLesson({ state: 'published', publishedVersion: 1, unpublishedChanges: true });
    mockLesson(() => lesson);
    renderLessonRoute(`/teacher/lessons/${lesson.id}`);
    expect(await screen.findByRole('button', { name: 'Archive' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Delete the lesson' })).not.toBeInTheDocument();
    expect(screen.getByText('v1 · unpublished changes')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Publish version 2' })).toBeInTheDocument();
  });

  it('offers no publishing while the newest version is up to date', async () => {
    signInAs(buildMe(['teacher']));
    const lesson = buildLesson({ state: 'published', publishedVersion: 1, unpublishedChanges: false });
    mockLesson(() => lesson);
    renderLessonRoute(`/teacher/lessons/${lesson.id}`);
    expect(await screen.findByText(/Version 1 is up to date/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Publish version/ })).not.toBeInTheDocument();
  });

  it('a viewer gets preview, duplicate and export, and nothing that changes the lesson', async () => {
    signInAs(buildMe(['substitute']));
    const lesson = buildLesson({
      title: 'Helmholtz pair (test)',
      canEdit: false,
      shared: true,
      owner: { id: '00000000-0000-4000-8000-0000000000aa', name: 'Tobin Marsh' },
    });
    mockLesson(() => lesson);
    renderLessonRoute(`/substitute/lessons/${lesson.id}`);
    expect(await screen.findByRole('heading', { level: 1, name: 'Helmholtz pair (test)' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Preview as student' })).toHaveAttribute('href', `/substitute/lessons/${lesson.id}/preview`);
    expect(screen.getByRole('button', { name: 'Duplicate Helmholtz pair (test)' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Export lesson file' })).toBeInTheDocument();
    expect(screen.getByText(/Tobin Marsh shared this lesson/)).toBeInTheDocument();
    for (const name of ['Open studio', /Publish/, 'Archive', 'Delete the lesson']) {
      expect(screen.queryByRole('button', { name })).not.toBeInTheDocument();
      expect(screen.queryByRole('link', { name })).not.toBeInTheDocument();
    }
    expect(screen.queryByLabelText('Share with the department (read-only)')).not.toBeInTheDocument();
  });

  it('a lesson the caller may not see shows the server’s reason', async () => {
    signInAs(buildMe(['teacher']));
    server.use(http.get('/api/lessons/:id', () => apiError(404, 'not_found', 'No lesson with this id in your school.')));
    renderLessonRoute('/teacher/lessons/00000000-0000-4000-8000-0000000000bb');
    expect(await screen.findByText('No lesson with this id in your school.')).toBeInTheDocument();
  });
});
