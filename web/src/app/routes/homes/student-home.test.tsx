import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import type { StudentHomeDto } from '@core/contracts';
import { paths } from '@/config/paths';
import { buildCompletion, buildStudentAssignment, buildStudentHome } from '@/features/student-assignments/testing/student-assignment-mocks';
import { buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

// Dates are hand-computed in Europe/London, GMT in December (the instants read the same in UTC).

function serve(home: StudentHomeDto) {
  signInAs(buildMe(['student']));
  server.use(
    http.get('/api/student/classes', () => HttpResponse.json({ classes: [] })),
    http.get('/api/student/assignments', () => HttpResponse.json(home)),
  );
}

const card = async (title: string) => (await screen.findByRole('heading', { name: title })).closest('li') as HTMLElement;

describe('student home: your lessons', { timeout: 20_000 }, () => {
  it('groups lessons with their state in words and an icon, due dates in school time, progress and links', async () => {
    const carryOn = buildStudentAssignment({
      lessonTitle: 'Needle near a coil (test)',
      state: 'in-progress',
      completion: buildCompletion({ watchedShare: 0.45, requiredAnswered: 2, requiredTotal: 5 }),
      gradeUpdated: true,
    });
    const fresh = buildStudentAssignment({
      lessonTitle: 'Helmholtz pair (test)',
      state: 'not-started',
      isNew: true,
      dueAt: '2026-12-04T17:00:00.000Z',
    });
    const soon = buildStudentAssignment({
      lessonTitle: 'Solenoid on axis (test)',
      state: 'upcoming',
      opensAt: '2026-12-07T09:00:00.000Z',
      dueAt: '2026-12-10T17:00:00.000Z',
    });
    const over = buildStudentAssignment({ lessonTitle: 'Long straight wire (test)', state: 'closed', dueAt: '2026-11-20T16:00:00.000Z' });
    serve(buildStudentHome([over, soon, fresh, carryOn]));
    renderApp('/student');

    const groups = await screen.findAllByRole('heading', { level: 3 });
    expect(groups.map((heading) => heading.textContent)).toEqual([
      'To do (2)',
      'Coming up (1)',
      'Finished (1)',
      'You are not in a class yet',
    ]);

    const progress = await card('Needle near a coil (test)');
    const badge = within(progress).getByText('In progress');
    expect(badge.querySelector('svg')).not.toBeNull();
    expect(progress).toHaveTextContent('Due Thu 3 Dec, 17:00');
    expect(progress).toHaveTextContent('45 % watched (90 % needed) · 2 of 5 required questions answered');
    expect(within(progress).getByRole('progressbar', { name: 'Share of Needle near a coil (test) watched' })).toHaveAttribute(
      'value',
      '45',
    );
    expect(within(progress).getByText('Grade updated')).toBeInTheDocument();
    expect(within(progress).getByRole('link', { name: 'Carry on watching: Needle near a coil (test)' })).toHaveAttribute(
      'href',
      paths.student.watch(carryOn.id),
    );
    expect(within(progress).getByRole('link', { name: 'Your results: Needle near a coil (test)' })).toHaveAttribute(
      'href',
      paths.student.results(carryOn.id),
    );

    const newOne = await card('Helmholtz pair (test)');
    expect(within(newOne).getByText('Not started')).toBeInTheDocument();
    expect(within(newOne).getByText('New')).toBeInTheDocument();
    expect(newOne).toHaveTextContent('Due Fri 4 Dec, 17:00');
    expect(newOne).not.toHaveTextContent('% watched');
    expect(within(newOne).getByRole('link', { name: 'Start watching: Helmholtz pair (test)' })).toHaveAttribute(
      'href',
      paths.student.watch(fresh.id),
    );
    expect(within(newOne).queryByRole('link', { name: /Your results/ })).not.toBeInTheDocument();

    const upcoming = await card('Solenoid on axis (test)');
    expect(within(upcoming).getByText('Not open yet')).toBeInTheDocument();
    expect(upcoming).toHaveTextContent('Opens Mon 7 Dec, 09:00 · due Thu 10 Dec, 17:00');
    expect(within(upcoming).queryAllByRole('link')).toEqual([]);

    const closed = await card('Long straight wire (test)');
    expect(within(closed).getByText('Closed')).toBeInTheDocument();
    expect(closed).toHaveTextContent('Was due Fri 20 Nov, 16:00 · no late answers');
    expect(closed).toHaveTextContent('This lesson no longer takes answers.');
    expect(
      within(closed)
        .getAllByRole('link')
        .map((link) => link.textContent),
    ).toEqual(['Your results']);

    const news = screen.getByText('What is new').closest('div') as HTMLElement;
    expect(news).toHaveTextContent('1 new lesson you have not opened yet.');
    expect(news).toHaveTextContent('A grade changed in 1 lesson after your teacher corrected it.');
    expect(screen.getByText('Times are school time (Europe/London).')).toBeInTheDocument();
  });

  it('words a late lesson and a done one', async () => {
    const late = buildStudentAssignment({
      lessonTitle: 'Needle near a coil (test)',
      state: 'late',
      dueAt: '2026-11-30T17:00:00.000Z',
      lateUntil: '2026-12-02T17:00:00.000Z',
      completion: buildCompletion({ watchedShare: 0.2, requiredAnswered: 0, requiredTotal: 2 }),
    });
    const done = buildStudentAssignment({
      lessonTitle: 'Helmholtz pair (test)',
      state: 'done',
      completion: buildCompletion({
        watchedShare: 0.95,
        requiredAnswered: 3,
        requiredTotal: 3,
        done: true,
        completedAt: '2026-11-30T15:20:00.000Z',
      }),
    });
    serve(buildStudentHome([done, late]));
    renderApp('/student');

    const lateCard = await card('Needle near a coil (test)');
    expect(within(lateCard).getByText('Late')).toBeInTheDocument();
    expect(lateCard).toHaveTextContent('Was due Mon 30 Nov, 17:00 · late answers until Wed 2 Dec, 17:00');
    expect(lateCard).toHaveTextContent('answers given now are marked late');
    expect(within(lateCard).getByRole('link', { name: 'Watch and answer late: Needle near a coil (test)' })).toBeInTheDocument();

    const doneCard = await card('Helmholtz pair (test)');
    expect(within(doneCard).getByText('Done')).toBeInTheDocument();
    expect(doneCard).toHaveTextContent('You finished this lesson on Mon 30 Nov, 15:20.');
    expect(doneCard).toHaveTextContent('95 % watched (90 % needed) · 3 of 3 required questions answered');
    expect(
      within(doneCard)
        .getAllByRole('link')
        .map((link) => link.textContent),
    ).toEqual(['Watch again', 'Your results']);
    expect(screen.queryByText('What is new')).not.toBeInTheDocument();
  });

  it('says how lessons arrive when none is set', async () => {
    serve(buildStudentHome([]));
    renderApp('/student');
    expect(await screen.findByText('No lessons set yet')).toBeInTheDocument();
  });

  it('shows why the lessons could not be loaded', async () => {
    signInAs(buildMe(['student']));
    server.use(
      http.get('/api/student/classes', () => HttpResponse.json({ classes: [] })),
      http.get('/api/student/assignments', () => apiError(500, 'internal', 'The database did not answer in time. Try again in a minute.')),
    );
    renderApp('/student');
    expect(await screen.findByText('Your lessons could not be loaded')).toBeInTheDocument();
    expect(screen.getByText('The database did not answer in time. Try again in a minute.')).toBeInTheDocument();
  });
});
