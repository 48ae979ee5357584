import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { DraftSave, DraftSavedDto, VersionSummaryDto } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { buildContent, buildStudioLesson, mockDraftSaves, renderStudio } from './studio.test-support';

afterEach(() => vi.restoreAllMocks());

describe('studio: saving', { timeout: 40_000 }, () => {
  it('autosaves after typing, shows the state, and undoes a typing burst as one step', async () => {
    // Undo steps coalesce by the clock: a fixed clock makes the burst one step however slowly the machine types.
    vi.spyOn(Date, 'now').mockReturnValue(Date.parse('2026-01-05T14:01:00.000Z'));
    const lesson = buildStudioLesson(buildContent());
    const saves = mockDraftSaves(lesson);
    const { user } = renderStudio(lesson);
    expect(await screen.findByText('Saved · 14:00')).toBeInTheDocument();
    const title = screen.getByRole('textbox', { name: 'Title' });
    await user.type(title, ' again');
    expect(screen.getByRole('heading', { level: 1, name: 'Coil on its axis (test) again' })).toBeInTheDocument();
    expect(await screen.findByText('Saved · 14:02')).toBeInTheDocument();
    expect(saves.at(-1)?.content.settings.title).toBe('Coil on its axis (test) again');

    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(title).toHaveValue('Coil on its axis (test)');
    expect(screen.getByRole('button', { name: 'Undo' })).toBeDisabled();
    await user.click(screen.getByRole('button', { name: 'Redo' }));
    expect(title).toHaveValue('Coil on its axis (test) again');
  });

  it('keeps content that breaks a hard limit here, says why next to the field, and sends nothing', async () => {
    const lesson = buildStudioLesson(buildContent());
    const saves = mockDraftSaves(lesson);
    const { user } = renderStudio(lesson);
    await user.clear(await screen.findByRole('textbox', { name: 'Title' }));
    expect(await screen.findByText('Not saved — see the problem below')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Title' })).toHaveAccessibleDescription('Give the lesson a title.');
    expect(saves).toHaveLength(0);
    await user.type(screen.getByRole('textbox', { name: 'Title' }), 'Helmholtz pair');
    expect(await screen.findByText('Saved · 14:02')).toBeInTheDocument();
    expect(saves.at(-1)?.content.settings.title).toBe('Helmholtz pair');
  });

  it('shows publish problems from the save next to the field and selects the checkpoint from the list', async () => {
    const question = newCheckpoint('multiple-choice', 5000);
    const lesson = buildStudioLesson(buildContent({ checkpoints: [question] }));
    mockDraftSaves(lesson, (content) =>
      content.checkpoints[0]?.kind === 'multiple-choice' ? [{ path: 'checkpoints.0.prompt', message: 'Write the question.' }] : [],
    );
    const { user } = renderStudio(lesson);
    await user.type(await screen.findByRole('textbox', { name: 'Level' }), ' (set 2)');
    const list = await screen.findByRole('region', { name: '1 problem to fix before publishing' });
    await user.click(within(list).getByRole('button', { name: /Write the question/ }));
    expect(screen.getByRole('button', { name: /^Multiple choice, at 0:05.000, has problems to fix/ })).toHaveAttribute(
      'aria-pressed',
      'true',
    );
    expect(within(screen.getByRole('list', { name: 'Form problems' })).getByText('prompt: Write the question.')).toBeInTheDocument();
  });

  it('retries a failed save and saves on "Retry now"', async () => {
    const lesson = buildStudioLesson(buildContent());
    let calls = 0;
    server.use(
      http.put(`/api/lessons/${lesson.id}/draft`, () => {
        calls += 1;
        if (calls === 1) return apiError(503, 'unavailable', 'The server is restarting.');
        return HttpResponse.json<DraftSavedDto>({
          revision: 4,
          savedAt: '2026-01-05T14:03:00.000Z',
          problems: [],
          unpublishedChanges: true,
        });
      }),
    );
    const { user } = renderStudio(lesson);
    await user.type(await screen.findByRole('textbox', { name: 'Level' }), '!');
    expect(await screen.findByText('Not saved — retrying in 5 s')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry now' }));
    expect(await screen.findByText('Saved · 14:03')).toBeInTheDocument();
    expect(calls).toBe(2);
  });

  it('stops on an edit conflict and overwrites only when asked, with the newer revision', async () => {
    const lesson = buildStudioLesson(buildContent());
    const bodies: DraftSave[] = [];
    server.use(
      http.put(`/api/lessons/${lesson.id}/draft`, async ({ request }) => {
        const body = (await request.json()) as DraftSave;
        bodies.push(body);
        if (body.revision === 3) {
          // The API's shape: details is an object (EditConflictDetailsSchema), not a field list.
          return HttpResponse.json(
            {
              error: {
                code: 'edit_conflict',
                message: 'Saved elsewhere.',
                details: { revision: 7, savedAt: '2026-01-05T14:05:00.000Z', savedBy: 'Ines Marlow (demo)' },
              },
            },
            { status: 409 },
          );
        }
        return HttpResponse.json<DraftSavedDto>({
          revision: body.revision + 1,
          savedAt: '2026-01-05T14:06:00.000Z',
          problems: [],
          unpublishedChanges: true,
        });
      }),
      http.get(`/api/lessons/${lesson.id}`, () =>
        HttpResponse.json({
          ...lesson,
          revision: 7,
          savedAt: '2026-01-05T14:05:00.000Z',
          savedBy: { id: lesson.owner!.id, name: 'Ines Marlow (demo)' },
        }),
      ),
    );
    const { user } = renderStudio(lesson);
    await user.type(await screen.findByRole('textbox', { name: 'Level' }), ' mine');
    expect(
      await screen.findByText('This lesson was saved in another tab or by Ines Marlow (demo) at 14:05. Your latest edits are kept here.'),
    ).toBeInTheDocument();
    expect(screen.getByText('Not saved — saved elsewhere meanwhile')).toBeInTheDocument();
    // Editing on keeps the edits here and sends nothing until the teacher chooses.
    await user.type(screen.getByRole('textbox', { name: 'Level' }), '!');
    expect(bodies).toHaveLength(1);
    await user.click(screen.getByRole('button', { name: 'Keep mine and overwrite' }));
    expect(await screen.findByText('Saved · 14:06')).toBeInTheDocument();
    expect(bodies[1]).toMatchObject({ revision: 7, content: { settings: { level: 'Year 11 mine!' } } });
  });

  it('loads the newer version when the teacher chooses it', async () => {
    const lesson = buildStudioLesson(buildContent());
    const newer = {
      ...lesson,
      revision: 8,
      savedAt: '2026-01-05T14:07:00.000Z',
      draft: buildContent({ settings: { ...lesson.draft.settings, title: 'Their title' } }),
    };
    server.use(
      http.put(`/api/lessons/${lesson.id}/draft`, () => apiError(409, 'edit_conflict', 'Saved elsewhere.')),
      http.get(`/api/lessons/${lesson.id}`, () => HttpResponse.json(newer)),
    );
    const { user } = renderStudio(lesson);
    await user.type(await screen.findByRole('textbox', { name: 'Title' }), ' mine');
    await user.click(await screen.findByRole('button', { name: 'Load the newer version' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Their title' })).toBeInTheDocument();
    expect(screen.getByText('Saved · 14:07')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Undo' })).toBeDisabled();
  });

  it('publishing is refused with the problems, and publishes the saved revision once they are fixed', async () => {
    const lesson = buildStudioLesson(buildContent(), {
      problems: [{ path: 'settings.safetyNotes', message: 'Add the safety notes for the coil.' }],
    });
    const saves = mockDraftSaves(lesson);
    const published: { revision: number; note: string }[] = [];
    let ready = false;
    server.use(
      http.post(`/api/lessons/${lesson.id}/publish`, async ({ request }) => {
        const body = (await request.json()) as { revision: number; note: string };
        published.push(body);
        if (!ready)
          return apiError(400, 'lesson_not_ready', 'Fix the problems first.', [
            { path: 'checkpoints', message: 'Pin at least one checkpoint.' },
          ]);
        return HttpResponse.json<VersionSummaryDto>(
          {
            id: lesson.recording.id,
            number: 1,
            note: body.note,
            publishedAt: '2026-01-05T14:10:00.000Z',
            publishedBy: null,
            checkpointCount: 0,
            changes: { added: [], removed: [], edited: [], chaptersChanged: false, settings: [] },
          },
          { status: 201 },
        );
      }),
      http.get(`/api/lessons/${lesson.id}`, () => HttpResponse.json(lesson)),
      http.get('/api/lessons', () => HttpResponse.json({ lessons: [], tags: [], owners: [] })),
    );
    const { user } = renderStudio(lesson);
    await user.click(await screen.findByRole('button', { name: 'Publish…' }));
    let dialog = screen.getByRole('dialog', { name: 'Publish version 1' });
    expect(within(dialog).getByText('Add the safety notes for the coil.')).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Publish version 1' })).toBeDisabled();
    await user.click(within(dialog).getByRole('button', { name: 'Not now' }));

    // Fixing the notes: the save answers with no problems, and the server now refuses for another reason.
    await user.type(screen.getByRole('textbox', { name: /Safety notes/ }), 'Keep the coil current below 2 A.');
    expect(await screen.findByText('No problems: this draft is ready to publish.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Publish…' }));
    dialog = screen.getByRole('dialog', { name: 'Publish version 1' });
    await user.type(within(dialog).getByRole('textbox', { name: /Note for this version/ }), 'First version');
    await user.click(within(dialog).getByRole('button', { name: 'Publish version 1' }));
    expect(await within(dialog).findByText('Pin at least one checkpoint.')).toBeInTheDocument();
    expect(within(dialog).getByText('Not published: fix these first')).toBeInTheDocument();

    ready = true;
    await user.click(within(dialog).getByRole('button', { name: 'Not now' }));
    await user.click(screen.getByRole('button', { name: 'Publish…' }));
    dialog = screen.getByRole('dialog', { name: 'Publish version 1' });
    await user.click(within(dialog).getByRole('button', { name: 'Publish version 1' }));
    expect(await screen.findByText(/Published version 1\./)).toBeInTheDocument();
    expect(screen.getByText('Version 1 published · draft matches it')).toBeInTheDocument();
    // The note typed before the refusal is kept; the revision is the one the last save answered with.
    await waitFor(() => expect(published.at(-1)).toEqual({ revision: lesson.revision + saves.length, note: 'First version' }));
  });
});
