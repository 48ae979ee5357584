import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import type { RecordingDto } from '@core/contracts';
import { buildLesson } from '@/features/lessons/testing/lesson-mocks';
import { renderLessonRoute } from '@/features/lessons/testing/render-lesson-route';
import { buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { buildRecording } from '@/testing/mocks/recordings';
import { server } from '@/testing/mocks/server';
import { signInAs } from '@/testing/test-utils';

beforeAll(async () => {
  await import('./lesson-new');
});

function mockCreate(recordings: RecordingDto[], answer: (body: unknown) => Response) {
  const bodies: unknown[] = [];
  server.use(
    http.get('/api/recordings', () => HttpResponse.json({ recordings })),
    http.post('/api/lessons', async ({ request }) => {
      const body = await request.json();
      bodies.push(body);
      return answer(body);
    }),
  );
  return bodies;
}

const coil = buildRecording({ title: 'Coil on a bench (test)', usedBy: [] });
const prism = buildRecording({ title: 'Prism (test)', usedBy: [] });

describe('new lesson', { timeout: 20_000 }, () => {
  it('creates the lesson on the recording from the link and opens the studio', async () => {
    signInAs(buildMe(['teacher']));
    const created = buildLesson({ title: 'Field of a flat coil (test)' });
    const bodies = mockCreate([prism, coil], () => HttpResponse.json(created, { status: 201 }));
    const { user, router } = renderLessonRoute(`/teacher/lessons/new?recording=${coil.id}`);
    expect(await screen.findByLabelText(/^Recording/)).toHaveValue(coil.id);
    await user.type(screen.getByLabelText(/^Title/), 'Field of a flat coil (test)');
    const tags = screen.getByLabelText(/^Topic tags/);
    await user.type(tags, 'Magnetism{Enter}fields,');
    const added = screen.getByRole('list', { name: 'Tags added' });
    expect(
      within(added)
        .getAllByRole('listitem')
        .map((item) => item.textContent),
    ).toEqual(['magnetism', 'fields']);
    await user.click(screen.getByRole('button', { name: 'Remove tag fields' }));
    await user.type(tags, 'induction');
    await user.type(screen.getByLabelText(/^Level/), 'Year 10');
    await user.click(screen.getByRole('button', { name: 'Create the lesson' }));
    expect(await screen.findByText(`Arrived at the studio of ${created.id}`)).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(`/teacher/lessons/${created.id}/studio`);
    // "induction" was still in the box: leaving it made it a tag rather than losing it.
    expect(bodies).toEqual([
      {
        recordingId: coil.id,
        title: 'Field of a flat coil (test)',
        tags: ['magnetism', 'induction'],
        level: 'Year 10',
        description: '',
        safetyNotes: '',
      },
    ]);
  });

  it('checks the form with the shared contract, then puts the server’s messages next to their fields', async () => {
    signInAs(buildMe(['teacher']));
    const bodies = mockCreate([coil], () =>
      apiError(400, 'validation_failed', 'Check the highlighted fields.', [
        { path: 'title', message: 'Another of your lessons is called this.' },
        { path: 'tags.1', message: 'A tag has at most 40 characters.' },
      ]),
    );
    const { user } = renderLessonRoute('/teacher/lessons/new');
    await user.click(await screen.findByRole('button', { name: 'Create the lesson' }));
    expect(await screen.findByText('Choose the recording the lesson is built on.')).toBeInTheDocument();
    expect(screen.getByText('Give the lesson a title.')).toBeInTheDocument();
    expect(bodies).toEqual([]);

    await user.selectOptions(screen.getByLabelText(/^Recording/), coil.id);
    await user.type(screen.getByLabelText(/^Title/), 'Helmholtz pair (test)');
    await user.type(screen.getByLabelText(/^Topic tags/), 'coils,fields,');
    await user.click(screen.getByRole('button', { name: 'Create the lesson' }));
    expect(await screen.findByText('Another of your lessons is called this.')).toBeInTheDocument();
    expect(screen.getByLabelText(/^Title/)).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('A tag has at most 40 characters.')).toBeInTheDocument();
    expect(screen.queryByText('Check the highlighted fields.')).not.toBeInTheDocument();
    expect(bodies).toHaveLength(1);
  });

  it('a recording that is not ready any more: the refusal lands on the recording', async () => {
    signInAs(buildMe(['teacher']));
    mockCreate([coil], () => apiError(400, 'recording_not_ready', 'This recording is being processed again; try when it is ready.'));
    const { user } = renderLessonRoute(`/teacher/lessons/new?recording=${coil.id}`);
    await user.type(await screen.findByLabelText(/^Title/), 'Helmholtz pair (test)');
    await user.click(screen.getByRole('button', { name: 'Create the lesson' }));
    expect(await screen.findByText('This recording is being processed again; try when it is ready.')).toBeInTheDocument();
    expect(screen.getByLabelText(/^Recording/)).toHaveAttribute('aria-invalid', 'true');
  });

  it('refuses a tag the contract does not allow, in words', async () => {
    signInAs(buildMe(['teacher']));
    mockCreate([coil], () => HttpResponse.json(buildLesson(), { status: 201 }));
    const { user } = renderLessonRoute('/teacher/lessons/new');
    const tags = await screen.findByLabelText(/^Topic tags/);
    await user.type(tags, `${'x'.repeat(41)}{Enter}`);
    expect(screen.getByText('A tag has at most 40 characters.')).toBeInTheDocument();
    expect(screen.queryByRole('list', { name: 'Tags added' })).not.toBeInTheDocument();
    await user.clear(tags);
    await user.type(tags, 'optics{Enter}Optics{Enter}');
    expect(screen.getByText('“optics” is already a tag.')).toBeInTheDocument();
  });

  it('suggests cautions when the lesson mentions a coil, and adds one to the safety notes', async () => {
    signInAs(buildMe(['teacher']));
    const bodies = mockCreate([coil], () => HttpResponse.json(buildLesson(), { status: 201 }));
    const { user } = renderLessonRoute(`/teacher/lessons/new?recording=${coil.id}`);
    await user.type(await screen.findByLabelText(/^Title/), 'Flat loop');
    expect(screen.queryByRole('region', { name: 'Suggested cautions' })).not.toBeInTheDocument();
    await user.type(screen.getByLabelText(/^Title/), ' and a coil');
    const suggestions = await screen.findByRole('region', { name: 'Suggested cautions' });
    expect(suggestions).toHaveTextContent('your school’s safety rules and local regulations come first');
    expect(within(suggestions).getByText('Cells, batteries and coils')).toBeInTheDocument();
    expect(within(suggestions).queryByText('Magnets')).not.toBeInTheDocument();

    const notes = screen.getByLabelText(/^Safety notes/);
    await user.type(notes, 'Goggles on.');
    await user.click(within(suggestions).getByRole('button', { name: 'Add to safety notes: Cells, batteries and coils' }));
    expect((notes as HTMLTextAreaElement).value).toMatch(/^Goggles on\.\n\nA cell or battery shorted through a coil/);
    expect(within(suggestions).getByText('In the safety notes')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Create the lesson' }));
    await waitFor(() => expect(bodies).toHaveLength(1));
    expect((bodies[0] as { safetyNotes: string }).safetyNotes).toContain('put a switch in the circuit');
  });

  it('says so when no recording is ready, and where to get one', async () => {
    signInAs(buildMe(['teacher']));
    mockCreate([], () => HttpResponse.json(buildLesson(), { status: 201 }));
    renderLessonRoute('/teacher/lessons/new?recording=00000000-0000-4000-8000-999999999999');
    expect(await screen.findByText('No ready recording yet')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Recordings page' })).toHaveAttribute('href', '/teacher/recordings');
  });

  it('explains a linked recording that cannot carry a lesson, and leaves the choice empty', async () => {
    signInAs(buildMe(['teacher']));
    mockCreate([coil], () => HttpResponse.json(buildLesson(), { status: 201 }));
    renderLessonRoute(`/teacher/lessons/new?recording=${prism.id}`);
    expect(await screen.findByText('That recording cannot carry a lesson yet')).toBeInTheDocument();
    expect(screen.getByLabelText(/^Recording/)).toHaveValue('');
  });
});
