import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { StudentHomeDtoSchema, type StudentAssignmentDto } from '@core/contracts';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildClass, enrol } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { CANARY_KEYS, canaryContent } from './canary-lesson.test-support';
import { assignedLesson, assignTo, hoursFromNow, storeAnswer } from './watch.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const HOME = '/api/student/assignments';

async function homeOf(client: Client): Promise<StudentAssignmentDto[]> {
  const res = await client.get(HOME);
  expect(res.status).toBe(200);
  expect(res.headers['cache-control']).toBe('private, no-store');
  return StudentHomeDtoSchema.parse(res.body).assignments;
}

describe('GET /api/student/assignments', () => {
  it('401 signed out, 403 for a teacher', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    expect((await new Client(t).get(HOME)).status).toBe(401);
    expect((await assigned.teacher.client.get(HOME)).status).toBe(403);
  });

  it("lists the assignments of the student's own classes only, with their facts", async () => {
    const assigned = await assignedLesson(t, canaryContent());
    // Another class of the same school, and another school: neither is listed.
    const otherClass = await buildClass(t.db, { schoolId: assigned.teacher.schoolId, teacherId: assigned.teacher.id });
    await assignTo(t, { teacher: assigned.teacher, lessonId: assigned.lesson.id, versionNumber: 1, classId: otherClass.id });
    await assignedLesson(t, canaryContent());

    const [only, ...rest] = await homeOf(assigned.student.client);
    expect(rest).toEqual([]);
    expect(only).toEqual({
      id: assigned.assignmentId,
      lessonTitle: 'Field of a flat coil (canary test)',
      className: assigned.className,
      teacherName: assigned.teacher.name,
      opensAt: expect.any(String),
      dueAt: expect.any(String),
      lateUntil: null,
      timeZone: 'Europe/London',
      state: 'not-started',
      completion: { watchedShare: 0, watchShareNeeded: 0.9, requiredAnswered: 0, requiredTotal: 7, done: false, completedAt: null },
      isNew: true,
      gradeUpdated: false,
      posterUrl: expect.stringMatching(/^http:\/\/127\.0\.0\.1:\d+\/.+poster/),
    });
  });

  it('states: upcoming, not started, in progress, late, closed and done; new until opened', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const { teacher, lesson, classId } = assigned;
    const to = { teacher, lessonId: lesson.id, versionNumber: 1, classId };
    const upcoming = await assignTo(t, to, { opensAt: hoursFromNow(5), dueAt: hoursFromNow(50) });
    const late = await assignTo(t, to, { opensAt: hoursFromNow(-50), dueAt: hoursFromNow(-2), lateUntil: hoursFromNow(20) });
    const closed = await assignTo(t, to, { opensAt: hoursFromNow(-50), dueAt: hoursFromNow(-2) });
    const done = await assignTo(t, to);
    await t.db('student_progress').insert({
      assignment_id: done,
      student_id: assigned.student.id,
      school_id: teacher.schoolId,
      first_opened_at: new Date(),
      completed_at: new Date(),
      watched_seconds: 12,
    });

    const before = new Map((await homeOf(assigned.student.client)).map((a) => [a.id, a]));
    expect(before.get(assigned.assignmentId)).toMatchObject({ state: 'not-started', isNew: true });
    expect(before.get(upcoming)).toMatchObject({ state: 'upcoming', isNew: false });
    expect(before.get(late)).toMatchObject({ state: 'late', isNew: true });
    expect(before.get(closed)).toMatchObject({ state: 'closed', isNew: false });
    expect(before.get(done)).toMatchObject({ state: 'done', isNew: false, completion: { done: true } });

    expect((await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/watch`)).status).toBe(200);
    const after = (await homeOf(assigned.student.client)).find((a) => a.id === assigned.assignmentId);
    expect(after).toMatchObject({ state: 'in-progress', isNew: false });

    // What is still to do comes first, soonest due first (due 2 h ago, in 50 h, in 7 days); then done and closed, latest due first.
    const order = (await homeOf(assigned.student.client)).map((a) => a.id);
    expect(order).toEqual([late, upcoming, assigned.assignmentId, done, closed]);
  });

  it('counts required answers, and says "grade updated" until the results are seen', async () => {
    const assigned = await assignedLesson(t, canaryContent());
    await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/watch`);
    const responseId = await storeAnswer(t, assigned, assigned.student, {
      key: CANARY_KEYS.choice,
      answer: { kind: 'multiple-choice', optionIds: ['wrong'] },
      attempt: 1,
    });
    // Not required: answered, but not counted towards the rule.
    await storeAnswer(t, assigned, assigned.student, {
      key: CANARY_KEYS.predText,
      answer: { kind: 'prediction', optionId: null, text: 'It stays.', explanation: null },
      attempt: 1,
    });
    const [home] = await homeOf(assigned.student.client);
    expect(home?.completion).toMatchObject({ requiredAnswered: 1, requiredTotal: 7 });
    expect(home?.gradeUpdated).toBe(false);

    // A teacher's correction regrades the answer and marks the student's row.
    await t.db('grades').insert({
      response_id: responseId,
      assignment_id: assigned.assignmentId,
      checkpoint_key: CANARY_KEYS.choice,
      score: 1,
      correct: true,
      detail: JSON.stringify({
        correct: true,
        score: 1,
        feedback: 'Marked right.',
        mistake: null,
        invalid: false,
        attemptsLeft: 0,
        hints: [],
        reveal: null,
      }),
      source: 'regrade',
      version_number: 1,
    });
    await t
      .db('student_progress')
      .where({ assignment_id: assigned.assignmentId, student_id: assigned.student.id })
      .update({ grade_updated_at: new Date() });
    expect((await homeOf(assigned.student.client))[0]?.gradeUpdated).toBe(true);
    expect((await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/results`)).status).toBe(200);
    expect((await homeOf(assigned.student.client))[0]?.gradeUpdated).toBe(false);
  });

  it("leaves out archived classes and other schools' assignments for a student of two schools", async () => {
    const assigned = await assignedLesson(t, canaryContent());
    const archived = await buildClass(t.db, { schoolId: assigned.teacher.schoolId, teacherId: assigned.teacher.id });
    await enrol(t.db, archived.id, assigned.student.id);
    await assignTo(t, { teacher: assigned.teacher, lessonId: assigned.lesson.id, versionNumber: 1, classId: archived.id });
    await t.db('classes').where({ id: archived.id }).update({ archived_at: new Date() });

    // The same person is also a student of another school, with an assignment there.
    const elsewhere = await assignedLesson(t, canaryContent());
    await t
      .db('memberships')
      .insert({ user_id: assigned.student.id, school_id: elsewhere.teacher.schoolId, roles: ['student'], status: 'active' });
    await enrol(t.db, elsewhere.classId, assigned.student.id);

    const activate = async (schoolId: string) =>
      expect((await assigned.student.client.send('put', '/api/me/active', { schoolId, role: 'student' })).status).toBe(200);
    await activate(assigned.teacher.schoolId);
    expect((await homeOf(assigned.student.client)).map((a) => a.id)).toEqual([assigned.assignmentId]);
    await activate(elsewhere.teacher.schoolId);
    expect((await homeOf(assigned.student.client)).map((a) => a.id)).toEqual([elsewhere.assignmentId]);
    // The other school's assignment is not opened through this one either.
    expect((await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/watch`)).status).toBe(404);
  });
});
