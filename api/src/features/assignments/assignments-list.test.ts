import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AssignmentDtoSchema, AssignmentListDtoSchema } from '@core/contracts';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildClass, buildDepartment, buildMember, buildSchool, enrol } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { goodQuestion, member, type Member } from '../lessons/lessons.test-support';
import { assign, assignmentBody, choose, publishedLesson, submitAnswer } from './assignments.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

/**
 * A school with two departments: physics (a teacher with two classes, a colleague with one, a
 * coordinator) and chemistry (a coordinator), an admin and a substitute; one assignment per class.
 */
async function school() {
  const s = await buildSchool(t.db);
  const physics = await buildDepartment(t.db, s.id, 'Physics');
  const chemistry = await buildDepartment(t.db, s.id, 'Chemistry');
  const teacher = await member(t, ['teacher'], { schoolId: s.id, departmentId: physics.id });
  const colleague = await member(t, ['teacher'], { schoolId: s.id, departmentId: physics.id });
  const coordinator = await member(t, ['coordinator'], { schoolId: s.id, departmentId: physics.id });
  const chemistryCoordinator = await member(t, ['coordinator'], { schoolId: s.id, departmentId: chemistry.id });
  const admin = await member(t, ['admin'], { schoolId: s.id });
  const substitute = await member(t, ['substitute'], { schoolId: s.id, departmentId: physics.id });
  const question = goodQuestion(2_000);
  const lesson = await publishedLesson(t, teacher, [question]);
  const other = await publishedLesson(t, teacher, [goodQuestion(3_000)], 'Solenoid on axis');
  const classA = await buildClass(t.db, { schoolId: s.id, teacherId: teacher.id, departmentId: physics.id, name: '10A Physics' });
  const classB = await buildClass(t.db, { schoolId: s.id, teacherId: teacher.id, departmentId: physics.id, name: '10B Physics' });
  const classC = await buildClass(t.db, { schoolId: s.id, teacherId: colleague.id, departmentId: physics.id, name: '11C Physics' });
  const [a] = await assign(
    teacher.client,
    assignmentBody(lesson.lesson.id, [classA.id], { dueAt: '2030-05-01T17:00', opensAt: '2030-04-01T09:00' }),
  );
  const [b] = await assign(
    teacher.client,
    assignmentBody(other.lesson.id, [classB.id], { dueAt: '2030-06-01T17:00', opensAt: '2030-04-01T09:00' }),
  );
  const [c] = await assign(
    admin.client,
    assignmentBody(lesson.lesson.id, [classC.id], { dueAt: '2030-07-01T17:00', opensAt: '2030-04-01T09:00' }),
  );
  return {
    s,
    physics,
    teacher,
    colleague,
    coordinator,
    chemistryCoordinator,
    admin,
    substitute,
    question,
    lesson,
    other,
    classA,
    classB,
    classC,
    a: a!,
    b: b!,
    c: c!,
  };
}

const ids = async (client: Client, query = '') => {
  const res = await client.get(`/api/assignments${query}`);
  expect(res.status).toBe(200);
  return AssignmentListDtoSchema.parse(res.body).assignments.map((x) => x.id);
};

describe('GET /api/assignments and /api/assignments/:id', () => {
  it('refuses signed-out callers (401), bad filters (400) and students (403)', async () => {
    expect((await new Client(t).get('/api/assignments')).status).toBe(401);
    const { s, teacher, a } = await school();
    const bad = await teacher.client.get('/api/assignments?classId=10A');
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('classId: Expected an id (a UUID).');
    const badId = await teacher.client.get('/api/assignments/not-an-id');
    expect(badId.status).toBe(400);
    const student = await member(t, ['student'], { schoolId: s.id });
    const res = await student.client.get(`/api/assignments/${a.id}`);
    expect(res.status).toBe(403);
    expect((await student.client.get('/api/assignments')).status).toBe(403);
  });

  it('lists what each role may see, newest due first (the policy as SQL)', async () => {
    const x = await school();
    // The teacher: their own classes' (a, b); the colleague: their class's, though an admin made it (c).
    expect(await ids(x.teacher.client)).toEqual([x.b.id, x.a.id]);
    expect(await ids(x.colleague.client)).toEqual([x.c.id]);
    expect(await ids(x.coordinator.client)).toEqual([x.c.id, x.b.id, x.a.id]);
    expect(await ids(x.chemistryCoordinator.client)).toEqual([]);
    expect(await ids(x.admin.client)).toEqual([x.c.id, x.b.id, x.a.id]);
    // Substitutes see none until cover plans give them theirs.
    expect(await ids(x.substitute.client)).toEqual([]);
    // Nothing of another school, whatever the role.
    const other = await school();
    expect(await ids(other.admin.client)).toEqual([other.c.id, other.b.id, other.a.id]);

    // The teacher who made an assignment keeps it when the class passes to a colleague.
    await t.db('classes').where({ id: x.classB.id }).update({ teacher_id: x.colleague.id });
    expect(await ids(x.teacher.client)).toEqual([x.b.id, x.a.id]);
    expect(await ids(x.colleague.client)).toEqual([x.c.id, x.b.id]);
  });

  it('filters by class and by lesson', async () => {
    const x = await school();
    expect(await ids(x.admin.client, `?classId=${x.classC.id}`)).toEqual([x.c.id]);
    expect(await ids(x.admin.client, `?lessonId=${x.lesson.lesson.id}`)).toEqual([x.c.id, x.a.id]);
    expect(await ids(x.admin.client, `?lessonId=${x.lesson.lesson.id}&classId=${x.classB.id}`)).toEqual([]);
  });

  it('opens one assignment for those who may see it, with counts of the class, and 404 for anyone else', async () => {
    const x = await school();
    const students = [];
    for (const _ of [0, 1, 2]) {
      const student = await member(t, ['student'], { schoolId: x.s.id });
      await enrol(t.db, x.classA.id, student.id);
      students.push(student);
    }
    const [first, second] = students as [Member, Member];
    // Open now, so students can answer; one student opened it, one answered and finished, the third has not started.
    const [open] = await assign(x.teacher.client, assignmentBody(x.lesson.lesson.id, [x.classA.id]));
    await t
      .db('student_progress')
      .insert({ assignment_id: open!.id, student_id: first.id, school_id: x.s.id, first_opened_at: t.db.fn.now() });
    await submitAnswer(second.client, open!.id, x.question.key, choose(x.question, 'Clockwise'));
    await t.db('student_progress').where({ assignment_id: open!.id, student_id: second.id }).update({ completed_at: t.db.fn.now() });
    // A student who left the class no longer counts.
    const left = await buildMember(t.db, { roles: ['student'], schoolId: x.s.id });
    await t.db('student_progress').insert({
      assignment_id: open!.id,
      student_id: left.id,
      school_id: x.s.id,
      first_opened_at: t.db.fn.now(),
      completed_at: t.db.fn.now(),
    });
    const detail = AssignmentDtoSchema.parse((await x.teacher.client.get(`/api/assignments/${open!.id}`)).body);
    expect(detail).toMatchObject({ counts: { students: 3, started: 2, done: 1 }, phase: 'open' });

    const res = await x.teacher.client.get(`/api/assignments/${x.a.id}`);
    expect(res.status).toBe(200);
    expect(AssignmentDtoSchema.parse(res.body)).toMatchObject({
      id: x.a.id,
      class: { id: x.classA.id, name: '10A Physics' },
      lesson: { id: x.lesson.lesson.id, title: 'Field of a flat coil', latestVersion: 1 },
      counts: { students: 3, started: 0, done: 0 },
      phase: 'upcoming',
      canManage: true,
    });
    // The coordinator reads it but may not manage it.
    expect((await x.coordinator.client.get(`/api/assignments/${x.a.id}`)).body.canManage).toBe(false);
    for (const stranger of [x.colleague, x.chemistryCoordinator, x.substitute]) {
      const hidden = await stranger.client.get(`/api/assignments/${x.a.id}`);
      expect(hidden.status).toBe(404);
      expect(hidden.body.error).toEqual({ code: 'not_found', message: 'That assignment was not found.' });
    }
    const other = await school();
    expect((await other.admin.client.get(`/api/assignments/${x.a.id}`)).status).toBe(404);
  });
});
