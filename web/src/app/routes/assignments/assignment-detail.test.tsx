import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';
import type { AssignmentDto, AssignmentMovedDto, AssignmentUpdate, Checkpoint, LessonContent } from '@core/contracts';
import { newCheckpoint } from '@core/lessons/new-checkpoint';
import { buildAssignment } from '@/features/assignments/testing/assignment-mocks';
import { buildContent, buildVersion } from '@/features/lessons/testing/lesson-mocks';
import { buildClassDetail, buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

beforeAll(async () => {
  await import('./assignment-detail');
});

const setInput = (element: HTMLElement, value: string) => fireEvent.change(element, { target: { value } });

function mockAssignment(initial: AssignmentDto) {
  let current = initial;
  server.use(http.get(`/api/assignments/${initial.id}`, () => HttpResponse.json(current)));
  return { set: (next: AssignmentDto) => (current = next) };
}

async function openPage(assignment: AssignmentDto) {
  signInAs(buildMe(['teacher']));
  const mocked = mockAssignment(assignment);
  const view = renderApp(`/teacher/assignments/${assignment.id}`);
  await screen.findByRole('heading', { level: 1, name: assignment.lesson.title });
  return { ...view, ...mocked };
}

const numeric = {
  ...newCheckpoint('numeric', 12_500),
  label: 'Field at the centre',
  prompt: 'Find $B$.',
  expected: '6.3e-5 T',
} as Checkpoint;
const sign = { ...newCheckpoint('sign', 20_000), label: 'Which way does the needle turn?' } as Checkpoint;
const note = { ...newCheckpoint('note', 3_000), body: 'Watch the needle.' } as Checkpoint;

function mockVersions(lessonId: string, contents: Record<number, LessonContent>) {
  server.use(
    http.get(`/api/lessons/${lessonId}/versions/:number`, ({ params }) => {
      const number = Number(params.number);
      const content = contents[number];
      if (!content) return apiError(404, 'not_found', 'No such version.');
      return HttpResponse.json({ ...buildVersion({ number }), content });
    }),
  );
}

describe('an assignment page', { timeout: 20_000 }, () => {
  it('shows the facts in school time, the policies explained and the class’s progress', async () => {
    const assignment = buildAssignment({
      lesson: { id: '00000000-0000-4000-8000-0000000001e1', title: 'Needle near a coil (test)', latestVersion: 2 },
      versionNumber: 2,
      class: { id: '00000000-0000-4000-8000-0000000001c1', name: '10A Physics (test)' },
      opensAt: '2026-06-01T08:00:00.000Z',
      dueAt: '2026-12-03T17:00:00.000Z',
      lateUntil: '2026-12-05T17:00:00.000Z',
      feedback: 'after-due',
      reveal: 'never',
      completionWatchShare: 0.75,
      phase: 'open',
      counts: { students: 25, started: 10, done: 4 },
    });
    await openPage(assignment);
    expect(screen.getByText('Open')).toBeInTheDocument();
    const facts = screen.getByText('Opens', { selector: 'dt' }).closest('dl') as HTMLElement;
    expect(within(facts).getByRole('link', { name: 'Needle near a coil (test)' })).toHaveAttribute(
      'href',
      '/teacher/lessons/00000000-0000-4000-8000-0000000001e1',
    );
    expect(within(facts).getByRole('link', { name: '10A Physics (test)' })).toHaveAttribute(
      'href',
      '/teacher/classes/00000000-0000-4000-8000-0000000001c1',
    );
    expect(facts).toHaveTextContent('OpensMon, 1 Jun 2026, 09:00 BST');
    expect(facts).toHaveTextContent('DueThu, 3 Dec 2026, 17:00 GMT');
    expect(facts).toHaveTextContent('Late answersAccepted until Sat, 5 Dec 2026, 17:00 GMT');
    expect(facts).toHaveTextContent('Right or wrongAfter the due dateUntil the assignment closes');
    expect(facts).toHaveTextContent('Correct answersNeverStudents never see the correct answers or explanations.');
    expect(facts).toHaveTextContent('Every required checkpoint is answered and at least 75 % of the recording watched');
    expect(screen.getByText('Times are in the school’s time zone, Europe/London.')).toBeInTheDocument();
    const progress = screen.getByRole('list', { name: 'Progress of the class' });
    expect(
      within(progress)
        .getAllByRole('listitem')
        .map((item) => item.textContent),
    ).toEqual(['25Studentsin the class', '10Startedopened, watched or answered', '4Donemet the completion rule']);
    expect(screen.getByText(/This class has version 2, the newest published version/)).toBeInTheDocument();
    // The edit form starts from the saved values, as wall-clock times in the school's zone.
    expect(screen.getByLabelText('Opens (Europe/London time)')).toHaveValue('2026-06-01T09:00');
    expect(screen.getByLabelText('Accept late answers until (Europe/London time)')).toHaveValue('2026-12-05T17:00');
    expect(screen.getByRole('textbox', { name: 'Share of the recording to watch' })).toHaveValue('75');
  });

  it('saves changed dates and policies, and places the server’s refusal beside its field', async () => {
    const assignment = buildAssignment();
    const { user, set } = await openPage(assignment);
    const bodies: AssignmentUpdate[] = [];
    let refuse = true;
    server.use(
      http.put(`/api/assignments/${assignment.id}`, async ({ request }) => {
        const body = (await request.json()) as AssignmentUpdate;
        bodies.push(body);
        if (refuse)
          return apiError(400, 'validation_failed', 'Check the dates.', [{ path: 'dueAt', message: 'Pick a due time after now.' }]);
        const saved = { ...assignment, dueAt: '2026-12-04T16:00:00.000Z', feedback: body.feedback, lateUntil: null };
        set(saved);
        return HttpResponse.json(saved);
      }),
    );
    setInput(screen.getByLabelText('Due (Europe/London time)'), '2026-12-04T16:00');
    const feedback = screen.getByRole('group', { name: 'When students see right or wrong' });
    await user.click(within(feedback).getByRole('radio', { name: 'Never' }));
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText('Pick a due time after now.')).toBeInTheDocument();

    refuse = false;
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText('Saved')).toBeInTheDocument();
    expect(bodies.at(-1)).toEqual({
      opensAt: '2026-12-01T09:00',
      dueAt: '2026-12-04T16:00',
      lateUntil: null,
      feedback: 'never',
      reveal: 'after-last-attempt',
      completionWatchShare: 0.9,
    });
    const facts = screen.getByText('Due', { selector: 'dt' }).parentElement as HTMLElement;
    expect(facts).toHaveTextContent('Fri, 4 Dec 2026, 16:00 GMT');
  });

  it('shows which checkpoints a move regrades, moves after asking, and sums up what it did', async () => {
    const lessonId = '00000000-0000-4000-8000-0000000002e1';
    const assignment = buildAssignment({ lesson: { id: lessonId, title: 'Coil (test)', latestVersion: 3 }, versionNumber: 2 });
    const v2 = buildContent({}, { checkpoints: [note, numeric, sign] });
    const v3 = buildContent(
      {},
      {
        checkpoints: [
          { ...note, body: 'Watch the needle closely.' } as Checkpoint,
          { ...numeric, expected: '6.4e-5 T' } as Checkpoint,
          sign,
        ],
      },
    );
    mockVersions(lessonId, { 2: v2, 3: v3 });
    const { user, set } = await openPage(assignment);
    const moves: unknown[] = [];
    server.use(
      http.post(`/api/assignments/${assignment.id}/move`, async ({ request }) => {
        moves.push(await request.json());
        const moved = { ...assignment, versionNumber: 3, lesson: { ...assignment.lesson, latestVersion: 3 } };
        set(moved);
        return HttpResponse.json<AssignmentMovedDto>({
          assignment: moved,
          fromVersion: 2,
          toVersion: 3,
          changedKeys: [numeric.key],
          responsesRegraded: 14,
          gradesChanged: 3,
          studentsAffected: 2,
        });
      }),
    );
    const regraded = await screen.findByRole('list', { name: 'Checkpoints to regrade' });
    expect(
      within(regraded)
        .getAllByRole('listitem')
        .map((item) => item.textContent),
    ).toEqual(['Edited “Field at the centre”: expected answer.']);
    expect(screen.getByText('1 checkpoint to regrade (students whose grade changes see “Grade updated”):')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Move to version 3' }));
    const dialog = screen.getByRole('alertdialog', { name: 'Move Year 10 Physics (test) to version 3?' });
    await user.click(within(dialog).getByRole('button', { name: 'Move to version 3' }));
    expect(await screen.findByText('Moved from version 2 to version 3')).toBeInTheDocument();
    expect(moves).toEqual([{ versionNumber: 3 }]);
    const summary = screen.getByText('Moved from version 2 to version 3').parentElement as HTMLElement;
    expect(summary).toHaveTextContent('Regraded 14 answers at 1 changed checkpoint: “Field at the centre”.');
    expect(summary).toHaveTextContent('3 grades changed; 2 students see “Grade updated”.');
    expect(screen.queryByRole('button', { name: 'Move to version 3' })).not.toBeInTheDocument();
    expect(screen.getByText('Year 10 Physics (test)', { selector: 'span' }).parentElement).toHaveTextContent(
      'Assigned to Year 10 Physics (test) · version 3',
    );
  });

  it('says why a move is impossible and offers none', async () => {
    const lessonId = '00000000-0000-4000-8000-0000000003e1';
    const assignment = buildAssignment({ lesson: { id: lessonId, title: 'Coil (test)', latestVersion: 2 }, versionNumber: 1 });
    mockVersions(lessonId, { 1: buildContent({}, { checkpoints: [numeric, sign] }), 2: buildContent({}, { checkpoints: [numeric] }) });
    await openPage(assignment);
    const why = await screen.findByRole('list', { name: 'Why it cannot move' });
    expect(why).toHaveTextContent(`The question “Which way does the needle turn?” (${sign.key}) is not in the new version`);
    expect(screen.getByText('This assignment cannot move to version 2')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Move to version 2' })).not.toBeInTheDocument();
  });

  it('deletes after asking and returns to the class; a refusal stays in the dialog', async () => {
    const classId = '00000000-0000-4000-8000-0000000004c1';
    const assignment = buildAssignment({ class: { id: classId, name: '10A Physics (test)' } });
    const { user } = await openPage(assignment);
    let refuse = true;
    let deleted = false;
    server.use(
      http.delete(`/api/assignments/${assignment.id}`, () => {
        if (refuse) return apiError(409, 'assignment_has_responses', 'Students gave 12 answers to this assignment: it cannot be deleted.');
        deleted = true;
        return new HttpResponse(null, { status: 204 });
      }),
      http.get(`/api/classes/${classId}`, () => HttpResponse.json(buildClassDetail({ id: classId, name: '10A Physics (test)' }))),
      http.get('/api/assignments', () => HttpResponse.json({ assignments: [] })),
    );
    await user.click(screen.getByRole('button', { name: 'Delete the assignment' }));
    let dialog = screen.getByRole('alertdialog', { name: 'Delete “Field of a flat coil (test)” for 10A Physics (test)?' });
    await user.click(within(dialog).getByRole('button', { name: 'Delete the assignment' }));
    expect(await within(dialog).findByText('Students gave 12 answers to this assignment: it cannot be deleted.')).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));

    refuse = false;
    await user.click(screen.getByRole('button', { name: 'Delete the assignment' }));
    dialog = screen.getByRole('alertdialog');
    await user.click(within(dialog).getByRole('button', { name: 'Delete the assignment' }));
    expect(await screen.findByRole('heading', { level: 1, name: '10A Physics (test)' })).toBeInTheDocument();
    expect(deleted).toBe(true);
    await waitFor(() => expect(screen.getByText(/No lesson is assigned to this class yet/)).toBeInTheDocument());
  });

  it('is read-only for someone who may not manage it', async () => {
    await openPage(buildAssignment({ canManage: false, createdBy: { id: '00000000-0000-4000-8000-0000000005a1', name: 'Ivo Pellham' } }));
    expect(screen.getByText(/Ivo Pellham assigned this lesson/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save changes' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Delete the assignment' })).not.toBeInTheDocument();
  });

  it('says so when the assignment cannot be found', async () => {
    signInAs(buildMe(['teacher']));
    server.use(http.get('/api/assignments/:id', () => apiError(404, 'not_found', 'No assignment with this id in your school.')));
    renderApp('/teacher/assignments/00000000-0000-4000-8000-0000000006a1');
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This assignment could not be loaded');
    expect(alert).toHaveTextContent('No assignment with this id in your school.');
  });
});
