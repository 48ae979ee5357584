import { fireEvent, screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import type { AssignmentCreate, AssignmentDto, ClassDto, LessonDto, VersionSummaryDto } from '@core/contracts';
import { buildAssignment } from '@/features/assignments/testing/assignment-mocks';
import { buildLesson, buildVersion } from '@/features/lessons/testing/lesson-mocks';
import { buildClass, buildMe, nextId } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

beforeAll(async () => {
  await import('./assign-lesson');
});

// The school (Europe/London) reads 08:15 GMT on Tuesday 1 December 2026 when each test starts.
beforeEach(() => {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(new Date('2026-12-01T08:15:30.000Z'));
});
afterEach(() => {
  vi.useRealTimers();
});

const setInput = (element: HTMLElement, value: string) => fireEvent.change(element, { target: { value } });

type Setup = { lesson?: LessonDto; versions?: VersionSummaryDto[]; classes?: ClassDto[]; existing?: AssignmentDto[] };

function mockPage({
  lesson = buildLesson({ title: 'Helmholtz pair (test)', state: 'published', publishedVersion: 2 }),
  ...rest
}: Setup = {}) {
  const versions = rest.versions ?? [
    buildVersion({ number: 2, note: 'Fixed the expected value.', publishedAt: '2026-11-20T10:00:00.000Z' }),
    buildVersion({ number: 1, note: '', publishedAt: '2026-11-02T10:00:00.000Z' }),
  ];
  const classes = rest.classes ?? [
    buildClass({ name: '10A Physics (test)', studentCount: 6 }),
    buildClass({ name: '10B Physics (test)', studentCount: 1 }),
  ];
  const listQueries: string[] = [];
  server.use(
    http.get(`/api/lessons/${lesson.id}`, () => HttpResponse.json(lesson)),
    http.get(`/api/lessons/${lesson.id}/versions`, () => HttpResponse.json({ versions })),
    http.get('/api/teacher/classes', () => HttpResponse.json({ classes })),
    http.get('/api/assignments', ({ request }) => {
      listQueries.push(new URL(request.url).search);
      return HttpResponse.json({ assignments: rest.existing ?? [] });
    }),
  );
  return { lesson, versions, classes, listQueries };
}

async function openForm(setup: Setup = {}) {
  signInAs(buildMe(['teacher']));
  const mocked = mockPage(setup);
  const view = renderApp(`/teacher/lessons/${mocked.lesson.id}/assign`);
  await screen.findByRole('heading', { level: 1, name: `Assign “${mocked.lesson.title}”` });
  return { ...view, ...mocked };
}

describe('assigning a lesson', { timeout: 20_000 }, () => {
  it('starts on the newest version, now to a week today at 17:00 in school time, feedback at once and 90 % to watch', async () => {
    const existing = [
      buildAssignment({ class: { id: nextId(), name: '11C Physics (test)' }, dueAt: '2026-11-27T17:00:00.000Z', phase: 'closed' }),
    ];
    const { listQueries } = await openForm({ existing });
    const version = await screen.findByRole('combobox', { name: 'Version' });
    expect(version).toHaveValue('2');
    expect(
      within(version)
        .getAllByRole('option')
        .map((option) => option.textContent),
    ).toEqual(['Version 2 (newest), published 20 Nov 2026 · Fixed the expected value.', 'Version 1, published 2 Nov 2026']);
    const classes = screen.getByRole('group', { name: 'Classes' });
    expect(within(classes).getByRole('checkbox', { name: '10A Physics (test) (6 students)' })).not.toBeChecked();
    expect(within(classes).getByRole('checkbox', { name: '10B Physics (test) (1 student)' })).not.toBeChecked();

    expect(screen.getByText(/wherever you are: it is now/)).toHaveTextContent(
      'In the school’s time zone, Europe/London, wherever you are: it is now Tue, 1 Dec 2026, 08:15 GMT at the school.',
    );
    expect(screen.getByLabelText('Opens (Europe/London time)')).toHaveValue('2026-12-01T08:15');
    expect(screen.getByLabelText('Due (Europe/London time)')).toHaveValue('2026-12-08T17:00');
    // Read back in the school's words, whatever order the browser shows the input's date in.
    expect(screen.getByText('Tue, 8 Dec 2026, 17:00 GMT')).toBeInTheDocument();
    expect(screen.getByRole('checkbox', { name: 'Accept late answers' })).not.toBeChecked();
    expect(screen.queryByLabelText(/Accept late answers until/)).not.toBeInTheDocument();

    const feedback = screen.getByRole('group', { name: 'When students see right or wrong' });
    expect(within(feedback).getByRole('radio', { name: 'Right after each answer' })).toBeChecked();
    expect(within(feedback).getByRole('radio', { name: 'Right after each answer' })).toHaveAccessibleDescription(
      'Students see right or wrong, your feedback and hints as soon as they answer, and can try again while attempts remain.',
    );
    const reveal = screen.getByRole('group', { name: 'When students see the correct answers' });
    expect(within(reveal).getByRole('radio', { name: "After the student's last attempt" })).toBeChecked();
    expect(screen.getByRole('textbox', { name: 'Share of the recording to watch' })).toHaveValue('90');

    const assigned = await screen.findByRole('table');
    expect(within(assigned).getByRole('link', { name: '11C Physics (test)' })).toHaveAttribute(
      'href',
      `/teacher/assignments/${existing[0]?.id}`,
    );
    expect(assigned).toHaveTextContent('Fri, 27 Nov 2026, 17:00 GMT');
    expect(assigned).toHaveTextContent('Closed');
    expect(listQueries[0]).toMatch(/^\?lessonId=/);
  });

  it('says beside each field what to fix, and sends nothing until it is fixed', async () => {
    const { user } = await openForm();
    const posts: unknown[] = [];
    server.use(http.post('/api/assignments', () => (posts.push(1), apiError(500, 'x', 'unexpected'))));
    await screen.findByRole('combobox', { name: 'Version' });

    setInput(screen.getByLabelText('Due (Europe/London time)'), '2026-12-01T08:00');
    await user.click(screen.getByRole('checkbox', { name: 'Accept late answers' }));
    // Ticking late answers suggests two days after the due time.
    const lateUntil = screen.getByLabelText('Accept late answers until (Europe/London time)');
    expect(lateUntil).toHaveValue('2026-12-03T08:00');
    setInput(lateUntil, '2026-11-30T17:00');
    await user.clear(screen.getByRole('textbox', { name: 'Share of the recording to watch' }));
    await user.type(screen.getByRole('textbox', { name: 'Share of the recording to watch' }), '120');
    await user.click(screen.getByRole('button', { name: 'Assign' }));

    expect(await screen.findByText('Choose at least one class.')).toBeInTheDocument();
    expect(screen.getByLabelText('Due (Europe/London time)')).toHaveAccessibleDescription(
      'Answers after this time are marked late. The due date is after the opening date.',
    );
    expect(lateUntil).toHaveAccessibleDescription('The assignment closes at this time. Late answers close after the due date.');
    expect(screen.getByRole('textbox', { name: 'Share of the recording to watch' })).toHaveAccessibleDescription(
      /The share to watch is at most 100 %\.$/,
    );
    expect(posts).toEqual([]);

    setInput(screen.getByLabelText('Opens (Europe/London time)'), '');
    await user.click(screen.getByRole('button', { name: 'Assign' }));
    expect(await screen.findByText('Choose the date and time the lesson opens.')).toBeInTheDocument();
    expect(posts).toEqual([]);
  });

  it('sends the contract’s body and links each new assignment', async () => {
    const { user, lesson, classes } = await openForm();
    const [tenA, tenB] = classes as [ClassDto, ClassDto];
    const bodies: AssignmentCreate[] = [];
    server.use(
      http.post('/api/assignments', async ({ request }) => {
        const body = (await request.json()) as AssignmentCreate;
        bodies.push(body);
        return HttpResponse.json(
          {
            assignments: body.classIds.map((classId, index) =>
              buildAssignment({
                id: `00000000-0000-4000-8000-0000000000a${index}`,
                lesson: { id: lesson.id, title: lesson.title, latestVersion: 2 },
                versionNumber: body.versionNumber,
                class: { id: classId, name: classId === tenA.id ? tenA.name : tenB.name },
                dueAt: '2026-12-10T16:30:00.000Z',
                counts: { students: classId === tenA.id ? 6 : 1, started: 0, done: 0 },
              }),
            ),
          },
          { status: 201 },
        );
      }),
    );
    await user.selectOptions(await screen.findByRole('combobox', { name: 'Version' }), '1');
    await user.click(screen.getByRole('checkbox', { name: /10A Physics/ }));
    await user.click(screen.getByRole('checkbox', { name: /10B Physics/ }));
    setInput(screen.getByLabelText('Opens (Europe/London time)'), '2026-12-02T09:00');
    setInput(screen.getByLabelText('Due (Europe/London time)'), '2026-12-10T16:30');
    await user.click(screen.getByRole('checkbox', { name: 'Accept late answers' }));
    setInput(screen.getByLabelText('Accept late answers until (Europe/London time)'), '2026-12-11T08:00');
    const feedback = screen.getByRole('group', { name: 'When students see right or wrong' });
    await user.click(within(feedback).getByRole('radio', { name: 'After the due date' }));
    const reveal = screen.getByRole('group', { name: 'When students see the correct answers' });
    await user.click(within(reveal).getByRole('radio', { name: 'Never' }));
    await user.clear(screen.getByRole('textbox', { name: 'Share of the recording to watch' }));
    await user.type(screen.getByRole('textbox', { name: 'Share of the recording to watch' }), '80 %');
    await user.click(screen.getByRole('button', { name: 'Assign to 2 classes' }));

    const summary = await screen.findByText('Assigned to 2 classes');
    expect(bodies).toEqual([
      {
        lessonId: lesson.id,
        versionNumber: 1,
        classIds: [tenA.id, tenB.id],
        opensAt: '2026-12-02T09:00',
        dueAt: '2026-12-10T16:30',
        lateUntil: '2026-12-11T08:00',
        feedback: 'after-due',
        reveal: 'never',
        completionWatchShare: 0.8,
      },
    ]);
    const banner = summary.closest('div')?.parentElement as HTMLElement;
    expect(banner).toHaveTextContent('Version 1 of “Helmholtz pair (test)”, due Thu, 10 Dec 2026, 16:30 GMT.');
    const created = within(banner).getByRole('list', { name: 'New assignments' });
    expect(within(created).getByRole('link', { name: '10A Physics (test)' })).toHaveAttribute(
      'href',
      '/teacher/assignments/00000000-0000-4000-8000-0000000000a0',
    );
    expect(within(created).getByRole('link', { name: '10B Physics (test)' })).toHaveAttribute(
      'href',
      '/teacher/assignments/00000000-0000-4000-8000-0000000000a1',
    );
    expect(screen.getByRole('link', { name: 'Back to the lesson' })).toHaveAttribute('href', `/teacher/lessons/${lesson.id}`);
  });

  it('puts the server’s field errors beside the fields and other refusals in a banner', async () => {
    const { user } = await openForm({ classes: [buildClass({ name: '10A Physics (test)' })] });
    let reply = apiError(400, 'validation_failed', 'Check the highlighted fields.', [
      { path: 'classIds.0', message: 'You teach no class with this id.' },
      { path: 'opensAt', message: 'There is no such date and time as 2026-02-30T09:00.' },
    ]);
    server.use(http.post('/api/assignments', () => reply));
    // With a single class, it is ticked already.
    expect(await screen.findByRole('checkbox', { name: /10A Physics/ })).toBeChecked();
    await user.click(screen.getByRole('button', { name: 'Assign' }));
    expect(await screen.findByText('You teach no class with this id.')).toBeInTheDocument();
    expect(screen.getByLabelText('Opens (Europe/London time)')).toHaveAccessibleDescription(
      'Students can start watching and answering from this time. There is no such date and time as 2026-02-30T09:00.',
    );

    reply = apiError(404, 'version_not_found', 'Version 2 of this lesson was not found: it may have been withdrawn.');
    await user.click(screen.getByRole('button', { name: 'Assign' }));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Not assigned');
    expect(alert).toHaveTextContent('Version 2 of this lesson was not found: it may have been withdrawn.');
  });

  it('explains a time that the clock change skips', async () => {
    await openForm();
    const opens = await screen.findByLabelText('Opens (Europe/London time)');
    setInput(opens, '2027-03-28T01:30');
    expect(
      await screen.findByText('01:30 does not exist on that day in Europe/London (the clocks go forward): it will be 02:30.'),
    ).toBeInTheDocument();
  });

  it('says what is missing when the lesson has no published version or the teacher no class', async () => {
    const view = await openForm({ versions: [] });
    expect(await screen.findByText('Nothing to assign yet')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Assign' })).not.toBeInTheDocument();
    view.unmount();

    await openForm({ classes: [] });
    expect(await screen.findByText('You have no classes yet')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Assign' })).not.toBeInTheDocument();
  });
});
