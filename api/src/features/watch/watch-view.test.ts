import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { WatchViewDtoSchema } from '@core/contracts';
import { formatSchoolTime } from '@core/assignments';
import { toStudentView } from '@core/lessons';
import type { VariableValues } from '@core/physics/units/types';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { member } from '../lessons/lessons.test-support';
import { CANARY_KEYS, canaryContent } from './canary-lesson.test-support';
import { addCaption, assignedLesson, classmate, hoursFromNow, storeAnswer } from './watch.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const watchPath = (id: string) => `/api/student/assignments/${id}/watch`;
const NOT_ASSIGNED = 'That assignment (it may not be assigned to your class) was not found.';

async function storedValues(assignmentId: string, studentId: string): Promise<Record<string, VariableValues>> {
  const rows = await t
    .db('student_variables')
    .where({ assignment_id: assignmentId, student_id: studentId })
    .select('checkpoint_key', 'values');
  return Object.fromEntries(rows.map((row: { checkpoint_key: string; values: VariableValues }) => [row.checkpoint_key, row.values]));
}

describe('GET /api/student/assignments/:assignmentId/watch', () => {
  it('401 signed out, 400 for a malformed id, 403 for a teacher', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    expect((await new Client(t).get(watchPath(assigned.assignmentId))).status).toBe(401);
    const malformed = await assigned.student.client.get(watchPath('not-an-id'));
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.code).toBe('validation_failed');
    expect(malformed.body.error.details[0].path).toBe('assignmentId');
    const forbidden = await assigned.teacher.client.get(watchPath(assigned.assignmentId));
    expect(forbidden.status).toBe(403);
    expect(forbidden.body.error.message).toMatch(/needs the student role/);
  });

  it('404, the same for a student of another class, of another school and for an unknown id', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const sameSchool = await member(t, ['student'], { schoolId: assigned.teacher.schoolId });
    const otherSchool = await assignedLesson(t, canaryContent());
    for (const [client, id] of [
      [sameSchool.client, assigned.assignmentId],
      [otherSchool.student.client, assigned.assignmentId],
      [assigned.student.client, '00000000-0000-4000-8000-000000000000'],
    ] as const) {
      const res = await client.get(watchPath(id));
      expect(res.status).toBe(404);
      expect(res.body.error).toEqual({ code: 'not_found', message: NOT_ASSIGNED });
    }
    // Nothing was drawn or opened for the stranger.
    expect(await t.db('student_progress').where({ student_id: sameSchool.id })).toEqual([]);
    expect(await t.db('student_variables').where({ student_id: sameSchool.id })).toEqual([]);
  });

  it('409 assignment_not_open before the opening, naming it in school time; nothing is drawn or opened', async () => {
    const opensAt = hoursFromNow(30);
    const assigned = await assignedLesson(t, canaryContent(), { opensAt, dueAt: hoursFromNow(60) });
    const res = await assigned.student.client.get(watchPath(assigned.assignmentId));
    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({
      code: 'assignment_not_open',
      message: `“Field of a flat coil (canary test)” opens on ${formatSchoolTime(opensAt, 'Europe/London', 'en-GB')}. You can watch it from then.`,
    });
    expect(await t.db('student_progress').where({ student_id: assigned.student.id })).toEqual([]);
    expect(await storedValues(assigned.assignmentId, assigned.student.id)).toEqual({});
  });

  it('409 assignment_closed after the close (late answers included), pointing to the results page', async () => {
    const dueAt = hoursFromNow(-30);
    const lateUntil = hoursFromNow(-2);
    const assigned = await assignedLesson(t, canaryContent(), { opensAt: hoursFromNow(-60), dueAt, lateUntil });
    const res = await assigned.student.client.get(watchPath(assigned.assignmentId));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('assignment_closed');
    expect(res.body.error.message).toBe(
      `“Field of a flat coil (canary test)” closed on ${formatSchoolTime(lateUntil, 'Europe/London', 'en-GB')}, so it cannot be watched any more. Your answers and results are on its results page.`,
    );
    expect((await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/results`)).status).toBe(200);
  });

  it("is the allow-listed view with this student's stored values, playback through the assignment's own tracks, and no store", async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const captionId = await addCaption(t, assigned.recordingId, 'en', 'English');
    const res = await assigned.student.client.get(watchPath(assigned.assignmentId));
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('private, no-store');
    const body = WatchViewDtoSchema.parse(res.body);

    // The numbers were drawn once and stored for the numeric checkpoint with variables only.
    const drawn = await storedValues(assigned.assignmentId, assigned.student.id);
    expect(Object.keys(drawn)).toEqual([CANARY_KEYS.numeric]);
    const seed = `${assigned.assignmentId}:${assigned.student.id}`;
    expect(body.view).toEqual(toStudentView(assigned.content, { seed, locale: 'en-GB', drawn }));
    const numeric = body.view.checkpoints.find((c) => c.key === CANARY_KEYS.numeric);
    expect(numeric).toMatchObject({ kind: 'numeric', dimension: 'magnetic-field', askedUnit: 'µT' });
    expect(numeric?.kind === 'numeric' && numeric.prompt).not.toContain('{{');

    expect(body.assignment).toEqual({
      id: assigned.assignmentId,
      className: assigned.className,
      dueAt: expect.any(String),
      lateUntil: null,
      timeZone: 'Europe/London',
      feedback: 'immediately',
      reveal: 'after-last-attempt',
      state: 'in-progress',
      accepting: true,
    });
    expect(body.playback.src.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\//);
    expect(body.playback.thumbnailsUrl).toBe(`/api/student/assignments/${assigned.assignmentId}/thumbnails.vtt`);
    expect(body.playback.captions.map((c) => c.url)).toEqual([
      `/api/student/assignments/${assigned.assignmentId}/captions/${captionId}.vtt`,
    ]);
    expect(body.book).toEqual({});
    expect(body.progress).toEqual({
      safetyAcknowledged: false,
      resumeMs: 0,
      completion: { watchedShare: 0, watchShareNeeded: 0.9, requiredAnswered: 0, requiredTotal: 7, done: false, completedAt: null },
    });
    expect(Math.abs(Date.parse(body.serverTime) - Date.now())).toBeLessThan(60_000);
  });

  it('shows the stored values, not fresh draws: values stored before the first view are the ones in the prompt', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    // As if an answer sent first (from another tab) had drawn and stored them.
    await t.db('student_variables').insert({
      assignment_id: assigned.assignmentId,
      student_id: assigned.student.id,
      checkpoint_key: CANARY_KEYS.numeric,
      values: JSON.stringify({ N: 13, a: '5.5 cm', I: '1.5 A' }),
    });
    const res = await assigned.student.client.get(watchPath(assigned.assignmentId));
    const numeric = WatchViewDtoSchema.parse(res.body).view.checkpoints.find((c) => c.key === CANARY_KEYS.numeric);
    expect(numeric).toMatchObject({
      // A drawn value keeps its unit on the same line (no-break space).
      prompt: 'A flat coil of 13 turns and radius 5.5\u00a0cm carries 1.5\u00a0A. What is the field at its centre?',
      values: { N: '13', a: '5.5\u00a0cm', I: '1.5\u00a0A' },
    });
  });

  it('records the first opening once; each student has their own draws', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    await assigned.student.client.get(watchPath(assigned.assignmentId));
    const first = await t.db('student_progress').where({ student_id: assigned.student.id }).first();
    expect(first.first_opened_at).toBeInstanceOf(Date);
    await assigned.student.client.get(watchPath(assigned.assignmentId));
    const again = await t.db('student_progress').where({ student_id: assigned.student.id }).first();
    expect(again.first_opened_at).toEqual(first.first_opened_at);

    const other = await classmate(t, assigned);
    await other.client.get(watchPath(assigned.assignmentId));
    const seeds = [assigned.student.id, other.id].map((id) => `${assigned.assignmentId}:${id}`);
    expect(seeds[0]).not.toBe(seeds[1]);
    expect(await t.db('student_variables').where({ assignment_id: assigned.assignmentId }).count('* as n').first()).toEqual({ n: 2 });
  });

  it('while late answers are taken: accepting and late', async () => {
    const assigned = await assignedLesson(t, canaryContent(), {
      opensAt: hoursFromNow(-48),
      dueAt: hoursFromNow(-1),
      lateUntil: hoursFromNow(24),
    });
    const body = WatchViewDtoSchema.parse((await assigned.student.client.get(watchPath(assigned.assignmentId))).body);
    expect(body.assignment).toMatchObject({ state: 'late', accepting: true });
  });

  it('the book holds the stored answers: attempts used, the last answer, its latest grade as the policies allow', async () => {
    const assigned = await assignedLesson(t, canaryContent(), { feedback: 'immediately', reveal: 'after-last-attempt' });
    await assigned.student.client.get(watchPath(assigned.assignmentId));
    const prediction = { kind: 'prediction', optionId: 'same', text: null, explanation: null } as const;
    await storeAnswer(t, assigned, assigned.student, {
      key: CANARY_KEYS.choice,
      answer: { kind: 'multiple-choice', optionIds: ['wrong'] },
      attempt: 1,
    });
    await storeAnswer(t, assigned, assigned.student, {
      key: CANARY_KEYS.choice,
      answer: { kind: 'multiple-choice', optionIds: ['right'] },
      attempt: 2,
    });
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.predChoices, answer: prediction, attempt: 1 });
    // The explanation sent at the reveal is recorded beside the prediction and uses no attempt.
    const explained = { ...prediction, explanation: 'The needle was already at its limit.' };
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.predChoices, answer: explained, attempt: 2, isExplanation: true });

    const { book } = WatchViewDtoSchema.parse((await assigned.student.client.get(watchPath(assigned.assignmentId))).body);
    expect(Object.keys(book).sort()).toEqual([CANARY_KEYS.choice, CANARY_KEYS.predChoices].sort());
    expect(book[CANARY_KEYS.choice]).toMatchObject({
      used: 2,
      answer: { kind: 'multiple-choice', optionIds: ['right'] },
      grade: { correct: true, score: 1, reveal: { answer: 'Clockwise' } },
    });
    expect(book[CANARY_KEYS.predChoices]).toMatchObject({ used: 1, answer: explained, grade: { correct: false } });
  });

  it('with feedback after the due date the book says only that answers are saved', async () => {
    const assigned = await assignedLesson(t, canaryContent(), { feedback: 'after-due', reveal: 'after-due' });
    await assigned.student.client.get(watchPath(assigned.assignmentId));
    await storeAnswer(t, assigned, assigned.student, {
      key: CANARY_KEYS.choice,
      answer: { kind: 'multiple-choice', optionIds: ['right'] },
      attempt: 1,
    });
    const { book } = WatchViewDtoSchema.parse((await assigned.student.client.get(watchPath(assigned.assignmentId))).body);
    expect(book[CANARY_KEYS.choice]).toEqual({
      used: 1,
      answer: { kind: 'multiple-choice', optionIds: ['right'] },
      grade: {
        correct: null,
        score: 0,
        feedback:
          'Your answer is saved. You will see whether it was right after the lesson closes. You may change it: a new answer replaces this one.',
        mistake: null,
        invalid: false,
        attemptsLeft: 2,
        hints: [],
        reveal: null,
      },
    });
  });
});

describe('POST /api/student/assignments/:assignmentId/safety', () => {
  const safetyPath = (id: string) => `/api/student/assignments/${id}/safety`;

  it('403 without the CSRF token, 404 for a student not assigned, 409 before the opening', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const noToken = await assigned.student.client.agent.post(safetyPath(assigned.assignmentId));
    expect(noToken.status).toBe(403);
    expect(noToken.body.error.code).toBe('csrf_invalid');
    const stranger = await member(t, ['student'], { schoolId: assigned.teacher.schoolId });
    expect((await stranger.client.send('post', safetyPath(assigned.assignmentId))).status).toBe(404);
    const later = await assignedLesson(t, canaryContent(), { opensAt: hoursFromNow(5), dueAt: hoursFromNow(50) });
    const early = await later.student.client.send('post', safetyPath(later.assignmentId));
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('assignment_not_open');
  });

  it('204, recorded once: a second acknowledgement keeps the first time', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const first = await assigned.student.client.send('post', safetyPath(assigned.assignmentId));
    expect(first.status).toBe(204);
    const row = await t.db('student_progress').where({ student_id: assigned.student.id }).first();
    expect(row.safety_acknowledged_at).toBeInstanceOf(Date);
    expect((await assigned.student.client.send('post', safetyPath(assigned.assignmentId))).status).toBe(204);
    const again = await t.db('student_progress').where({ student_id: assigned.student.id }).first();
    expect(again.safety_acknowledged_at).toEqual(row.safety_acknowledged_at);
    const view = WatchViewDtoSchema.parse((await assigned.student.client.get(watchPath(assigned.assignmentId))).body);
    expect(view.progress.safetyAcknowledged).toBe(true);
  });
});

describe('the tracks a student loads', () => {
  it('caption and thumbnail tracks of the assignment, only to its students and only while it is open', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const captionId = await addCaption(t, assigned.recordingId, 'en', 'English');
    const captionPath = `/api/student/assignments/${assigned.assignmentId}/captions/${captionId}.vtt`;
    const caption = await assigned.student.client.get(captionPath);
    expect(caption.status).toBe(200);
    expect(caption.headers['content-type']).toBe('text/vtt; charset=utf-8');
    expect(caption.text).toContain('(English) The switch closes.');
    const thumbnails = await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/thumbnails.vtt`);
    expect(thumbnails.status).toBe(200);
    expect(thumbnails.text).toMatch(/^WEBVTT\n\n00:00:00\.000 --> 00:00:04\.000\nhttp:\/\/127\.0\.0\.1:\d+\/.+#xywh=0,0,160,90/);

    // A caption of another recording is not reachable through this assignment.
    const other = await assignedLesson(t, canaryContent());
    const foreignCaption = await addCaption(t, other.recordingId, 'en', 'English');
    const foreign = await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/captions/${foreignCaption}.vtt`);
    expect(foreign.status).toBe(404);
    expect(foreign.body.error.message).toBe('That caption track was not found.');
    expect((await other.student.client.get(captionPath)).status).toBe(404);

    await t
      .db('assignments')
      .where({ id: assigned.assignmentId })
      .update({ opens_at: hoursFromNow(-50), due_at: hoursFromNow(-1) });
    // The assignment row may be cached for a moment by the contexts: the refusal comes once it is read again.
    await expect.poll(async () => (await assigned.student.client.get(captionPath)).status, { timeout: 5000 }).toBe(409);
  });
});
