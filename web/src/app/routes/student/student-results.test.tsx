import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { StudentResultsDto } from '@core/contracts';
import { paths } from '@/config/paths';
import { buildStudentAssignment, buildStudentHome } from '@/features/student-assignments/testing/student-assignment-mocks';
import { buildResultCheckpoint, buildStudentResults } from '@/features/student-results/testing/student-results-mocks';
import { buildMe } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

// Dates are hand-computed in Europe/London (GMT in December). Only Date is faked: the page leaves out
// the current year, and 2026 must be the current one here.
beforeEach(() => {
  vi.useFakeTimers({ toFake: ['Date'], now: new Date('2026-12-01T10:00:00.000Z') });
});
afterEach(() => {
  vi.useRealTimers();
});

function serve(results: StudentResultsDto) {
  signInAs(buildMe(['student']));
  server.use(http.get(`/api/student/assignments/${results.assignment.id}/results`, () => HttpResponse.json(results)));
  return paths.student.results(results.assignment.id);
}

const checkpointCard = async (label: string) => (await screen.findByRole('heading', { name: label })).closest('li') as HTMLElement;

describe('student results page', { timeout: 20_000 }, () => {
  it('shows each question with the attempts, the mark, the answer once revealed, and the completion', async () => {
    const results = buildStudentResults({
      score: { earned: 2.5, possible: 4 },
      checkpoints: [
        buildResultCheckpoint({
          key: 'needle01',
          label: 'Which way does the needle turn?',
          kind: 'multiple-choice',
          atMs: 40_000,
          points: 1,
          attempts: [],
        }),
        buildResultCheckpoint({
          key: 'field001',
          label: 'Field at the centre',
          atMs: 12_000,
          points: 2,
          attempts: [
            { attempt: 1, answerText: '6.3 mT', recordedAt: '2026-11-30T10:02:00.000Z', late: false, sentAfterReconnecting: true },
            { attempt: 2, answerText: '63 uT', recordedAt: '2026-11-30T10:04:00.000Z', late: false, sentAfterReconnecting: false },
          ],
          grade: { correct: true, score: 1, feedback: 'Right: the field of *N* turns.', source: 'regrade' },
          reveal: { answer: '63 µT', explanation: 'B = μ₀NI / 2R with the values given.' },
          gradeUpdated: true,
        }),
        buildResultCheckpoint({
          key: 'sign0001',
          label: 'Sign of the field',
          kind: 'sign',
          atMs: 25_000,
          points: 1,
          required: false,
          attempts: [
            { attempt: 1, answerText: 'Into the page', recordedAt: '2026-11-30T10:06:00.000Z', late: false, sentAfterReconnecting: false },
          ],
          grade: { correct: false, score: 0, feedback: 'Use the right-hand grip rule.', source: 'engine' },
          reveal: null,
        }),
      ],
    });
    renderApp(serve(results));

    expect(await screen.findByRole('heading', { level: 1, name: 'Your results: Field of a flat coil (test)' })).toBeInTheDocument();
    expect(screen.getByText('In progress')).toBeInTheDocument();
    expect(screen.getByText(/^Due Thu 3 Dec, 17:00/)).toHaveTextContent('Due Thu 3 Dec, 17:00 (school time, Europe/London)');
    expect(screen.getByRole('link', { name: 'Back to the lesson' })).toHaveAttribute('href', paths.student.watch(results.assignment.id));
    expect(screen.getByRole('link', { name: 'Your lessons' })).toHaveAttribute('href', paths.student.home);

    const completion = screen.getByRole('heading', { name: 'Not done yet' }).closest('section') as HTMLElement;
    expect(completion).toHaveTextContent('To finish, watch at least 90 % of the recording and answer every required question.');
    expect(completion).toHaveTextContent('Still to watch: 50 % watched (90 % needed)');
    expect(completion).toHaveTextContent('Still to answer: 1 of 2 required questions answered');

    expect(screen.getByRole('heading', { name: 'Your score' }).closest('section')).toHaveTextContent('2.5 of 4 points');
    // In recording order, whatever order the reply had.
    const order = within(screen.getByRole('region', { name: 'Question by question' })).getAllByRole('heading', { level: 3 });
    expect(order.map((heading) => heading.textContent)).toEqual([
      'Field at the centre',
      'Sign of the field',
      'Which way does the needle turn?',
    ]);

    const field = await checkpointCard('Field at the centre');
    expect(field).toHaveTextContent('Numeric answer · at 0:12.0 in the recording · required · worth 2 points');
    expect(field).toHaveTextContent('Attempt 1:6.3 mTMon 30 Nov, 10:02 · sent after reconnecting');
    expect(field).toHaveTextContent('Attempt 2:63 uTMon 30 Nov, 10:04');
    expect(within(field).getByText('Grade updated')).toBeInTheDocument();
    const mark = field.querySelector('[data-verdict]') as HTMLElement;
    expect(mark).toHaveAttribute('data-verdict', 'right');
    expect(mark).toHaveTextContent('Right· 2 of 2 points');
    expect(mark.querySelector('svg')).not.toBeNull();
    expect(mark).toHaveTextContent('Marked again after your teacher corrected the lesson.');
    expect(within(field).getByText('The answer')).toBeInTheDocument();
    expect(field).toHaveTextContent('B = μ₀NI / 2R with the values given.');

    const sign = await checkpointCard('Sign of the field');
    expect(sign).toHaveTextContent('optional · worth 1 point');
    expect(sign.querySelector('[data-verdict]')).toHaveTextContent('Not right· 0 of 1 point');
    expect(sign).toHaveTextContent('The answer appears here once you can no longer answer this question.');
    expect(within(sign).queryByText('The answer')).not.toBeInTheDocument();

    const later = await checkpointCard('Which way does the needle turn?');
    expect(later).toHaveTextContent('Not answered yet. You need to answer this one to finish the lesson.');
    expect(later.querySelector('[data-verdict]')).toBeNull();
  });

  it('holds marks and answers back until the close time when the policies say so', async () => {
    const results = buildStudentResults({
      assignment: {
        ...buildStudentResults().assignment,
        feedback: 'after-due',
        reveal: 'after-due',
        lateUntil: '2026-12-04T17:00:00.000Z',
      },
      checkpoints: [
        buildResultCheckpoint({
          label: 'Field at the centre',
          attempts: [{ attempt: 1, answerText: '63 uT', recordedAt: '2026-12-03T18:30:00.000Z', late: true, sentAfterReconnecting: false }],
        }),
      ],
    });
    renderApp(serve(results));
    const score = (await screen.findByRole('heading', { name: 'Your score' })).closest('section') as HTMLElement;
    expect(score).toHaveTextContent('Not shown yet.');
    expect(score).toHaveTextContent('Right or wrong, and your marks, are shown here after Fri 4 Dec, 17:00. Your answers are saved.');
    expect(score).toHaveTextContent('Answers and explanations are shown here after Fri 4 Dec, 17:00.');
    const field = await checkpointCard('Field at the centre');
    expect(field).toHaveTextContent('Thu 3 Dec, 18:30 · marked late');
    expect(field).toHaveTextContent('Your answer is saved.');
    expect(field).toHaveTextContent('The answer appears here after Fri 4 Dec, 17:00.');
    expect(field.querySelector('[data-verdict]')).toBeNull();
  });

  it('after the close: no way back to the lesson, unanswered questions said so, and policies that never show', async () => {
    const results = buildStudentResults({
      assignment: { ...buildStudentResults().assignment, state: 'closed', accepting: false, feedback: 'never', reveal: 'never' },
      checkpoints: [buildResultCheckpoint({ label: 'Field at the centre' })],
    });
    renderApp(serve(results));
    expect(await screen.findByText('Closed')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Back to the lesson' })).not.toBeInTheDocument();
    expect(screen.getByText(/^Was due Thu 3 Dec, 17:00 · no late answers/)).toBeInTheDocument();
    const score = screen.getByRole('heading', { name: 'Your score' }).closest('section') as HTMLElement;
    expect(score).toHaveTextContent('Not shown for this lesson.');
    expect(score).toHaveTextContent('Your teacher chose not to show right or wrong for this lesson.');
    expect(score).toHaveTextContent('Your teacher chose not to show the answers for this lesson.');
    expect(await checkpointCard('Field at the centre')).toHaveTextContent('You did not answer this question.');
  });

  it('a done lesson says when it was finished; a lesson with nothing to answer says so', async () => {
    const results = buildStudentResults({
      assignment: { ...buildStudentResults().assignment, state: 'done' },
      completion: {
        watchedShare: 1,
        watchShareNeeded: 0.9,
        requiredAnswered: 0,
        requiredTotal: 0,
        done: true,
        completedAt: '2026-11-30T15:20:00.000Z',
      },
      checkpoints: [],
    });
    renderApp(serve(results));
    const completion = (await screen.findByRole('heading', { name: 'Done' })).closest('section') as HTMLElement;
    expect(completion).toHaveTextContent('You finished this lesson on Mon 30 Nov, 15:20.');
    expect(completion).toHaveTextContent('Watched enough: 100 % watched (90 % needed)');
    expect(completion).toHaveTextContent('Answered: No questions you must answer');
    expect(screen.getByText('No questions in this lesson')).toBeInTheDocument();
  });

  it('explains a lesson that is not the student’s', async () => {
    signInAs(buildMe(['student']));
    server.use(
      http.get('/api/student/assignments/:id/results', () =>
        apiError(404, 'not_found', 'This lesson is not assigned to any of your classes.'),
      ),
    );
    renderApp(paths.student.results('00000000-0000-4000-8000-00000000dead'));
    expect(await screen.findByText('Your results could not be loaded')).toBeInTheDocument();
    expect(screen.getByText('This lesson is not assigned to any of your classes.')).toBeInTheDocument();
  });

  it('reading the results clears “Grade updated” on the home', async () => {
    const assignment = buildStudentAssignment({ lessonTitle: 'Field of a flat coil (test)', state: 'in-progress' });
    let seen = false;
    let homeRequests = 0;
    signInAs(buildMe(['student']));
    const results = buildStudentResults({ assignment: { ...buildStudentResults().assignment, id: assignment.id } });
    server.use(
      http.get('/api/student/classes', () => HttpResponse.json({ classes: [] })),
      http.get('/api/student/assignments', () => {
        homeRequests += 1;
        return HttpResponse.json(buildStudentHome([{ ...assignment, gradeUpdated: !seen }]));
      }),
      http.get(`/api/student/assignments/${assignment.id}/results`, () => {
        seen = true;
        return HttpResponse.json(results);
      }),
    );
    const { user } = renderApp(paths.student.home);
    expect(await screen.findByText('Grade updated')).toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: 'Your results: Field of a flat coil (test)' }));
    expect(await screen.findByRole('heading', { name: 'Your score' })).toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: 'Your lessons' }));
    expect(await screen.findByRole('heading', { name: 'Field of a flat coil (test)' })).toBeInTheDocument();
    await vi.waitFor(() => expect(homeRequests).toBe(2));
    await vi.waitFor(() => expect(screen.queryByText('Grade updated')).not.toBeInTheDocument());
  });
});
