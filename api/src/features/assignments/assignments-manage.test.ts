import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AssignmentDtoSchema, type AssignmentUpdate } from '@core/contracts';
import { chooseActive, type Actor } from '../../auth/actor';
import { findActorData } from '../../auth/actor.repository';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildClass, buildDepartment, buildMember, buildSchool, enrol } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { goodQuestion, member } from '../lessons/lessons.test-support';
import { createAssignmentsService } from './assignments.service';
import { assign, assignmentBody, choose, publishedLesson, publishNext, submitAnswer } from './assignments.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const policies = (overrides: Partial<AssignmentUpdate> = {}): AssignmentUpdate => ({
  opensAt: '2030-01-10T09:00',
  dueAt: '2030-01-17T17:00',
  lateUntil: null,
  feedback: 'immediately',
  reveal: 'after-last-attempt',
  completionWatchShare: 0.9,
  ...overrides,
});

/** A teacher's assignment to their class, a colleague, the department's coordinator and an admin. */
async function assignment() {
  const school = await buildSchool(t.db);
  const physics = await buildDepartment(t.db, school.id);
  const teacher = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
  const colleague = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
  const coordinator = await member(t, ['coordinator', 'teacher'], { schoolId: school.id, departmentId: physics.id });
  const admin = await member(t, ['admin'], { schoolId: school.id });
  const question = goodQuestion(2_000);
  const lesson = await publishedLesson(t, teacher, [question]);
  const cls = await buildClass(t.db, { schoolId: school.id, teacherId: teacher.id, departmentId: physics.id, name: '10A Physics' });
  // Open since yesterday, due in a week: students can answer.
  const [created] = await assign(teacher.client, assignmentBody(lesson.lesson.id, [cls.id]));
  return { school, physics, teacher, colleague, coordinator, admin, question, lesson, cls, assignment: created! };
}

async function actorFor(userId: string): Promise<Actor> {
  const data = await findActorData(t.db, userId);
  const active = chooseActive(data!.memberships, {});
  return { userId, email: data!.user.email, name: data!.user.name, memberships: data!.memberships, active: active! };
}

describe('PUT /api/assignments/:id', () => {
  it('refuses signed-out callers (401), bad bodies (400), students (403)', async () => {
    const x = await assignment();
    const path = `/api/assignments/${x.assignment.id}`;
    expect((await new Client(t).send('put', path, policies())).status).toBe(401);
    const bad = await x.teacher.client.send('put', path, policies({ dueAt: '2030-01-09T17:00' }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('dueAt: The due date is after the opening date.');
    const withVersion = await x.teacher.client.send('put', path, { ...policies(), completionWatchShare: -0.1 });
    expect(withVersion.body.error.message).toBe('completionWatchShare: The share to watch is at least 0 %.');
    const student = await member(t, ['student'], { schoolId: x.school.id });
    expect((await student.client.send('put', path, policies())).status).toBe(403);
  });

  it('lets only its maker, the class’s teacher and admins change it (403), and hides it from others (404)', async () => {
    const x = await assignment();
    const path = `/api/assignments/${x.assignment.id}`;
    const coordinator = await x.coordinator.client.send('put', path, policies({ feedback: 'never' }));
    expect(coordinator.status).toBe(403);
    expect(coordinator.body.error.message).toBe(
      'Only the teacher who assigned this lesson, the class’s teacher or an admin can change this assignment.',
    );
    expect((await x.colleague.client.send('put', path, policies())).status).toBe(404);
    const elsewhere = await member(t, ['admin']);
    expect((await elsewhere.client.send('put', path, policies())).status).toBe(404);
    expect((await t.db('assignments').where({ id: x.assignment.id }).first('feedback')).feedback).toBe('immediately');
  });

  it('changes dates and policies, reads them in school time, and logs what changed', async () => {
    const x = await assignment();
    const res = await x.admin.client.send(
      'put',
      `/api/assignments/${x.assignment.id}`,
      policies({
        dueAt: '2030-06-30T17:00',
        lateUntil: '2030-07-01T08:00',
        feedback: 'after-due',
        reveal: 'after-due',
        completionWatchShare: 0.5,
      }),
    );
    expect(res.status).toBe(200);
    // June in London is summer time, UTC+1 (hand-computed).
    expect(AssignmentDtoSchema.parse(res.body)).toMatchObject({
      id: x.assignment.id,
      opensAt: '2030-01-10T09:00:00.000Z',
      dueAt: '2030-06-30T16:00:00.000Z',
      lateUntil: '2030-07-01T07:00:00.000Z',
      feedback: 'after-due',
      reveal: 'after-due',
      completionWatchShare: 0.5,
      versionNumber: 1,
      createdBy: { id: x.teacher.id },
    });
    const [event] = await t
      .db('audit_events')
      .where({ action: 'assignment_updated' })
      .whereRaw("data->>'assignmentId' = ?", [x.assignment.id]);
    expect(event).toMatchObject({ actor_id: x.admin.id, school_id: x.school.id });
    expect(event.data).toMatchObject({ assignmentId: x.assignment.id, className: '10A Physics', title: 'Field of a flat coil' });
    expect(event.data.changes).toEqual({
      opensAt: { from: x.assignment.opensAt, to: '2030-01-10T09:00:00.000Z' },
      dueAt: { from: x.assignment.dueAt, to: '2030-06-30T16:00:00.000Z' },
      lateUntil: { from: null, to: '2030-07-01T07:00:00.000Z' },
      feedback: { from: 'immediately', to: 'after-due' },
      reveal: { from: 'after-last-attempt', to: 'after-due' },
      completionWatchShare: { from: 0.9, to: 0.5 },
    });
  });

  it('tells the student side’s cache after an update, a move and a delete', async () => {
    const x = await assignment();
    const forgotten: string[] = [];
    const service = createAssignmentsService({ db: t.db, contexts: { forget: (id) => forgotten.push(id) } });
    const actor = await actorFor(x.teacher.id);
    await service.update(actor, x.assignment.id, policies({ feedback: 'never' }));
    expect(forgotten).toEqual([x.assignment.id]);
    await publishNext(x.teacher, x.lesson, [{ ...goodQuestion(2_000, 'Which way does the needle swing?'), key: x.question.key }]);
    await service.move(actor, x.assignment.id, { versionNumber: 2 });
    expect(forgotten).toEqual([x.assignment.id, x.assignment.id]);
    await service.remove(actor, x.assignment.id);
    expect(forgotten).toEqual([x.assignment.id, x.assignment.id, x.assignment.id]);
  });
});

describe('DELETE /api/assignments/:id', () => {
  it('refuses signed-out callers (401), coordinators who did not make it (403) and strangers (404)', async () => {
    const x = await assignment();
    const path = `/api/assignments/${x.assignment.id}`;
    expect((await new Client(t).send('delete', path)).status).toBe(401);
    expect((await x.coordinator.client.send('delete', path)).status).toBe(403);
    expect((await x.colleague.client.send('delete', path)).status).toBe(404);
    expect(await t.db('assignments').where({ id: x.assignment.id })).toHaveLength(1);
  });

  it('keeps an assignment with answers and says how many (409), deletes one without (204)', async () => {
    const x = await assignment();
    for (const _ of [0, 1]) {
      const student = await member(t, ['student'], { schoolId: x.school.id });
      await enrol(t.db, x.cls.id, student.id);
      // Two attempts each (the question allows two).
      for (const _attempt of [1, 2])
        await submitAnswer(student.client, x.assignment.id, x.question.key, choose(x.question, 'Anticlockwise'));
    }
    const path = `/api/assignments/${x.assignment.id}`;
    const kept = await x.teacher.client.send('delete', path);
    expect(kept.status).toBe(409);
    expect(kept.body.error).toEqual({
      code: 'assignment_has_responses',
      message:
        '4 answers from 2 students are recorded for this assignment, so it cannot be deleted and nothing was removed. To stop further answers, change its due date instead.',
    });
    expect(await t.db('responses').where({ assignment_id: x.assignment.id })).toHaveLength(4);

    const fresh = await assignment();
    // Opened and watched, never answered: it may go.
    const viewer = await buildMember(t.db, { roles: ['student'], schoolId: fresh.school.id });
    await enrol(t.db, fresh.cls.id, viewer.id);
    await t.db('student_progress').insert({
      assignment_id: fresh.assignment.id,
      student_id: viewer.id,
      school_id: fresh.school.id,
      first_opened_at: t.db.fn.now(),
      watched_seconds: 4,
    });
    const gone = await fresh.teacher.client.send('delete', `/api/assignments/${fresh.assignment.id}`);
    expect(gone.status).toBe(204);
    expect(await t.db('assignments').where({ id: fresh.assignment.id })).toHaveLength(0);
    expect(await t.db('student_progress').where({ assignment_id: fresh.assignment.id })).toHaveLength(0);
    expect((await fresh.teacher.client.get(`/api/assignments/${fresh.assignment.id}`)).status).toBe(404);
    const [event] = await t
      .db('audit_events')
      .where({ action: 'assignment_deleted' })
      .whereRaw("data->>'assignmentId' = ?", [fresh.assignment.id]);
    expect(event).toMatchObject({ actor_id: fresh.teacher.id });
    expect(event.data).toMatchObject({ assignmentId: fresh.assignment.id, className: '10A Physics', version: 1 });
  });
});
