import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { StudentResultsDtoSchema, type CheckpointAnswer, type ResultCheckpointDto } from '@core/contracts';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { member } from '../lessons/lessons.test-support';
import { CANARY, CANARY_KEYS, canaryContent } from './canary-lesson.test-support';
import { assignedLesson, hoursFromNow, storeAnswer, type Assigned } from './watch.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const resultsPath = (id: string) => `/api/student/assignments/${id}/results`;
const CLOSED = { opensAt: hoursFromNow(-72), dueAt: hoursFromNow(-24) };

async function resultsOf(assigned: Assigned) {
  const res = await assigned.student.client.get(resultsPath(assigned.assignmentId));
  expect(res.status).toBe(200);
  expect(res.headers['cache-control']).toBe('private, no-store');
  const results = StudentResultsDtoSchema.parse(res.body);
  const at = (key: string): ResultCheckpointDto => results.checkpoints.find((c) => c.key === key)!;
  return { results, at };
}

const wrongChoice: CheckpointAnswer = { kind: 'multiple-choice', optionIds: ['wrong'] };

describe('GET /api/student/assignments/:assignmentId/results', () => {
  it('401 signed out, 403 for a teacher, 404 for a student not assigned', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    expect((await new Client(t).get(resultsPath(assigned.assignmentId))).status).toBe(401);
    expect((await assigned.teacher.client.get(resultsPath(assigned.assignmentId))).status).toBe(403);
    const stranger = await member(t, ['student'], { schoolId: assigned.teacher.schoolId });
    const res = await stranger.client.get(resultsPath(assigned.assignmentId));
    expect(res.status).toBe(404);
    expect(res.body.error.message).toBe('That assignment (it may not be assigned to your class) was not found.');
  });

  it('before any answer: every answerable checkpoint in time order, with its prompt as the student reads it, and nothing revealed', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const { results, at } = await resultsOf(assigned);
    expect(results.checkpoints.map((c) => c.key)).toEqual([
      CANARY_KEYS.choice,
      CANARY_KEYS.numeric,
      CANARY_KEYS.fixed,
      CANARY_KEYS.short,
      CANARY_KEYS.signSet,
      CANARY_KEYS.signGeo,
      CANARY_KEYS.predChoices,
      CANARY_KEYS.predText,
    ]);
    expect(at(CANARY_KEYS.choice)).toEqual({
      key: CANARY_KEYS.choice,
      // The timeline's label: the first words of the prompt.
      label: 'Which way does the needle turn when the…',
      kind: 'multiple-choice',
      atMs: 500,
      prompt: 'Which way does the needle turn when the switch closes?',
      required: true,
      points: 1,
      attempts: [],
      grade: null,
      reveal: null,
      gradeUpdated: false,
    });
    expect(at(CANARY_KEYS.numeric).prompt).toMatch(/^A flat coil of \d+ turns and radius [\d.]+\u00a0cm carries [\d.]+\u00a0A\./);
    // Seven scored checkpoints of one point; the text prediction is not scored.
    expect(results.score).toEqual({ earned: 0, possible: 7 });
    expect(results.assignment).toMatchObject({
      id: assigned.assignmentId,
      lessonTitle: 'Field of a flat coil (canary test)',
      state: 'not-started',
      accepting: true,
    });
    expect(results.completion).toMatchObject({ requiredAnswered: 0, requiredTotal: 7, done: false });
  });

  it('lists each attempt as the student gave it; the latest grade with feedback shown; the answer after the last attempt', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    for (const attempt of [1, 2, 3])
      await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.choice, answer: wrongChoice, attempt });
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.fixed, answer: { kind: 'numeric', text: '73.9 uT' }, attempt: 1 });
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.signSet, answer: { kind: 'sign', choice: 'out' }, attempt: 1 });
    const { results, at } = await resultsOf(assigned);

    expect(at(CANARY_KEYS.choice).attempts.map((a) => [a.attempt, a.answerText, a.late, a.sentAfterReconnecting])).toEqual([
      [1, 'Anticlockwise', false, false],
      [2, 'Anticlockwise', false, false],
      [3, 'Anticlockwise', false, false],
    ]);
    expect(at(CANARY_KEYS.choice).grade).toMatchObject({ correct: false, score: 0, source: 'engine' });
    expect(at(CANARY_KEYS.choice).grade?.feedback).toContain(CANARY.mcFeedbackWrong);
    expect(at(CANARY_KEYS.choice).reveal).toEqual({ answer: 'Clockwise', explanation: CANARY.mcExplanation });

    // Right on the first try (within the absolute tolerance): told right, and the answer shown with it.
    expect(at(CANARY_KEYS.fixed).attempts[0]?.answerText).toBe('73.9 uT');
    expect(at(CANARY_KEYS.fixed).grade).toMatchObject({ correct: true, score: 1 });
    expect(at(CANARY_KEYS.fixed).reveal?.explanation).toBe(CANARY.fixedExplanation);
    // One wrong try of two: attempts remain, so no answer yet.
    expect(at(CANARY_KEYS.signSet).attempts[0]?.answerText).toBe('Out of the page');
    expect(at(CANARY_KEYS.signSet).reveal).toBeNull();
    expect(results.score).toEqual({ earned: 1, possible: 7 });
  });

  it('feedback after the due date: no grade and no score before the close', async () => {
    const assigned = await assignedLesson(t, canaryContent(), { feedback: 'after-due', reveal: 'after-due' });
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.fixed, answer: { kind: 'numeric', text: '73.9 uT' }, attempt: 1 });
    const { results, at } = await resultsOf(assigned);
    expect(at(CANARY_KEYS.fixed)).toMatchObject({ grade: null, reveal: null, attempts: [{ answerText: '73.9 uT' }] });
    expect(results.score).toBeNull();
  });

  it('after the close: grades and answers under "after the due date", also for checkpoints left with attempts or unanswered', async () => {
    const assigned = await assignedLesson(t, canaryContent(), { ...CLOSED, feedback: 'after-due', reveal: 'after-due' });
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.choice, answer: wrongChoice, attempt: 1 });
    const { results, at } = await resultsOf(assigned);
    expect(results.assignment).toMatchObject({ state: 'closed', accepting: false });
    expect(at(CANARY_KEYS.choice).grade).toMatchObject({ correct: false, score: 0 });
    expect(at(CANARY_KEYS.choice).reveal).toEqual({ answer: 'Clockwise', explanation: CANARY.mcExplanation });
    // Never answered: the answer is stated from the checkpoint (with the student's own numbers).
    expect(at(CANARY_KEYS.short).reveal).toEqual({ answer: CANARY.shortAccepted1, explanation: CANARY.shortExplanation });
    expect(at(CANARY_KEYS.numeric).reveal?.answer).toMatch(/^[\d.]+ µT$/);
    expect(at(CANARY_KEYS.predChoices).reveal?.explanation).toContain(CANARY.predChoicesReveal);
    expect(results.score).toEqual({ earned: 0, possible: 7 });
  });

  it('answers "never": nothing revealed, even after the close and the last attempt', async () => {
    const assigned = await assignedLesson(t, canaryContent(), { ...CLOSED, feedback: 'immediately', reveal: 'never' });
    for (const attempt of [1, 2, 3])
      await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.choice, answer: wrongChoice, attempt });
    const { results } = await resultsOf(assigned);
    expect(results.checkpoints.map((c) => c.reveal)).toEqual(Array(8).fill(null));
    expect(results.checkpoints.find((c) => c.key === CANARY_KEYS.choice)?.grade).toMatchObject({ correct: false });
  });

  it('marks a regraded answer "grade updated" until the page is seen; keeps the latest grade', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const responseId = await storeAnswer(t, assigned, assigned.student, {
      key: CANARY_KEYS.short,
      answer: { kind: 'short-text', text: 'Right-hand grip rule' },
      attempt: 1,
    });
    expect((await resultsOf(assigned)).at(CANARY_KEYS.short)).toMatchObject({
      grade: { correct: false, source: 'engine' },
      gradeUpdated: false,
    });
    const seen = (await t.db('student_progress').where({ student_id: assigned.student.id }).first()).results_seen_at as Date;
    expect(seen).toBeInstanceOf(Date);

    await t.db('grades').insert({
      response_id: responseId,
      assignment_id: assigned.assignmentId,
      checkpoint_key: CANARY_KEYS.short,
      score: 1,
      correct: true,
      detail: JSON.stringify({
        correct: true,
        score: 1,
        feedback: 'Accepted by your teacher.',
        mistake: null,
        invalid: false,
        attemptsLeft: 1,
        hints: [],
        reveal: null,
      }),
      source: 'teacher',
      version_number: 1,
    });
    const { at } = await resultsOf(assigned);
    expect(at(CANARY_KEYS.short)).toMatchObject({
      grade: { correct: true, score: 1, feedback: 'Accepted by your teacher.', source: 'teacher' },
      gradeUpdated: true,
    });
    expect((await resultsOf(assigned)).at(CANARY_KEYS.short).gradeUpdated).toBe(false);
  });

  it('shows late and reconnected answers as such', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    await storeAnswer(t, assigned, assigned.student, {
      key: CANARY_KEYS.short,
      answer: { kind: 'short-text', text: 'grip rule' },
      attempt: 1,
    });
    await t.db('responses').where({ student_id: assigned.student.id }).update({ late: true, sent_after_reconnecting: true });
    expect((await resultsOf(assigned)).at(CANARY_KEYS.short).attempts).toMatchObject([{ late: true, sentAfterReconnecting: true }]);
  });
});
