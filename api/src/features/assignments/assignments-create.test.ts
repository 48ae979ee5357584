import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AssignmentCreatedDtoSchema } from '@core/contracts';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildClass, buildDepartment, buildSchool } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { goodNote, goodQuestion, member } from '../lessons/lessons.test-support';
import { assignmentBody, publishedLesson } from './assignments.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

/** A department with a teacher, their published lesson and two classes of theirs, and a colleague's class. */
async function department() {
  const school = await buildSchool(t.db);
  const physics = await buildDepartment(t.db, school.id);
  const teacher = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
  const colleague = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
  const published = await publishedLesson(t, teacher, [goodQuestion(2_000), goodNote(5_000)]);
  const mine = await buildClass(t.db, { schoolId: school.id, teacherId: teacher.id, departmentId: physics.id, name: '10A Physics' });
  const mine2 = await buildClass(t.db, { schoolId: school.id, teacherId: teacher.id, departmentId: physics.id, name: '10B Physics' });
  const theirs = await buildClass(t.db, { schoolId: school.id, teacherId: colleague.id, departmentId: physics.id, name: '11C Physics' });
  return { school, physics, teacher, colleague, published, mine, mine2, theirs };
}

describe('POST /api/assignments', () => {
  it('refuses a signed-out caller (401)', async () => {
    const res = await new Client(t).send('post', '/api/assignments', {});
    expect(res.status).toBe(401);
  });

  it('names what is wrong with the body (400)', async () => {
    const { teacher, published, mine } = await department();
    const cases: [Record<string, unknown>, string][] = [
      [{ classIds: [] }, 'classIds: Choose at least one class.'],
      [{ dueAt: '2030-01-10T09:00', opensAt: '2030-01-10T09:00' }, 'dueAt: The due date is after the opening date.'],
      [
        { lateUntil: '2030-01-01T09:00', opensAt: '2029-12-01T09:00', dueAt: '2030-01-02T09:00' },
        'lateUntil: Late answers close after the due date.',
      ],
      [{ opensAt: '2026-1-3 9:00', dueAt: '2030-01-10T09:00' }, 'opensAt: Expected a date and time like 2026-12-03T09:00.'],
      [{ feedback: 'sometimes' }, 'feedback: Choose when feedback is shown.'],
      [{ completionWatchShare: 1.5 }, 'completionWatchShare: The share to watch is at most 100 %.'],
      // In the test school's zone (Europe/London) 01:30 on 28 March 2027 falls in the hour the clocks skip: it
      // becomes 02:30 summer time (01:30 UTC), later than 02:00 summer time (01:00 UTC) — hand-computed.
      [
        { opensAt: '2027-03-28T01:30', dueAt: '2027-03-28T02:00' },
        'dueAt: In Europe/London, 2027-03-28T02:00 is no later than 2027-03-28T01:30 once the clocks change: choose a later due time.',
      ],
      [{ opensAt: '2030-02-30T09:00', dueAt: '2030-03-02T09:00' }, 'opensAt: There is no such date and time as 2030-02-30T09:00.'],
    ];
    for (const [overrides, message] of cases) {
      const res = await teacher.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [mine.id], overrides));
      expect(res.status, message).toBe(400);
      expect(res.body.error.message).toBe(message);
    }
    expect(await t.db('assignments').count<{ count: number }[]>('* as count')).toEqual([{ count: 0 }]);
  });

  it('is for teachers and admins only (403)', async () => {
    const { school, physics, published, mine } = await department();
    for (const roles of [['student'], ['coordinator'], ['substitute']] as const) {
      const person = await member(t, [...roles], { schoolId: school.id, departmentId: physics.id });
      const res = await person.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [mine.id]));
      expect(res.status).toBe(403);
      expect(res.body.error.message).toMatch(/^This needs the teacher or admin role in /);
    }
  });

  it('assigns only to the caller’s own classes, and says which are not (403)', async () => {
    const { teacher, published, mine, theirs } = await department();
    const res = await teacher.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [mine.id, theirs.id]));
    expect(res.status).toBe(403);
    expect(res.body.error.message).toBe(
      'You can assign lessons to your own classes only, and “11C Physics” is not yours. An admin can assign to any class.',
    );
    expect(await t.db('assignments').count<{ count: number }[]>('* as count')).toEqual([{ count: 0 }]);
  });

  it('hides lessons the caller cannot open, and other schools’ lessons (404)', async () => {
    const { teacher, colleague, published, theirs } = await department();
    // The colleague's department may not see an unshared lesson.
    const res = await colleague.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [theirs.id]));
    expect(res.status).toBe(404);
    expect(res.body.error).toEqual({ code: 'not_found', message: 'That lesson was not found.' });
    const stranger = await department();
    const across = await teacher.client.send('post', '/api/assignments', assignmentBody(stranger.published.lesson.id, [stranger.mine.id]));
    expect(across.status).toBe(404);
  });

  it('refuses a version that does not exist, classes of another school and a class chosen twice (400)', async () => {
    const { teacher, published, mine } = await department();
    const noVersion = await teacher.client.send(
      'post',
      '/api/assignments',
      assignmentBody(published.lesson.id, [mine.id], { versionNumber: 2 }),
    );
    expect(noVersion.status).toBe(400);
    expect(noVersion.body.error).toMatchObject({
      code: 'version_not_found',
      message: '“Field of a flat coil” has no version 2; its newest is version 1.',
      details: [{ path: 'versionNumber', message: '“Field of a flat coil” has no version 2; its newest is version 1.' }],
    });

    const other = await buildClass(t.db);
    const foreign = await teacher.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [mine.id, other.id]));
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.details).toEqual([
      { path: 'classIds.1', message: expect.stringMatching(/^This is not a class of Test School .+ \(or it is archived\)\.$/) },
    ]);

    await t.db('classes').where({ id: mine.id }).update({ archived_at: t.db.fn.now() });
    const archived = await teacher.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [mine.id]));
    expect(archived.status).toBe(400);
    expect(archived.body.error.details[0].path).toBe('classIds.0');

    const twice = await teacher.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [other.id, other.id]));
    expect(twice.status).toBe(400);
    expect(twice.body.error).toMatchObject({
      message: 'A class is chosen more than once: choose each class once.',
      details: [{ path: 'classIds.1', message: 'This class is already chosen.' }],
    });
  });

  it('refuses a lesson never published (400) and an archived lesson (409)', async () => {
    const { teacher, published, mine } = await department();
    await t.db('lessons').where({ id: published.lesson.id }).update({ latest_version: null });
    await t.db('lesson_versions').where({ lesson_id: published.lesson.id }).delete();
    const unpublished = await teacher.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [mine.id]));
    expect(unpublished.status).toBe(400);
    expect(unpublished.body.error.message).toBe('“Field of a flat coil” has no published version yet: publish it, then assign it.');

    const again = await department();
    await again.teacher.client.send('patch', `/api/lessons/${again.published.lesson.id}`, { archived: true });
    const archived = await again.teacher.client.send(
      'post',
      '/api/assignments',
      assignmentBody(again.published.lesson.id, [again.mine.id]),
    );
    expect(archived.status).toBe(409);
    expect(archived.body.error).toEqual({
      code: 'lesson_archived',
      message: '“Field of a flat coil” is archived: restore it before assigning it.',
    });
  });

  it('makes one assignment per class with the dates read in the school’s zone (201)', async () => {
    const { school, teacher, published, mine, mine2 } = await department();
    const body = assignmentBody(published.lesson.id, [mine2.id, mine.id], {
      // Winter: London is on UTC; summer: UTC+1 (hand-computed).
      opensAt: '2030-01-10T09:00',
      dueAt: '2030-07-01T17:00',
      lateUntil: '2030-07-08T17:30',
      feedback: 'after-due',
      reveal: 'never',
      completionWatchShare: 0.75,
    });
    const res = await teacher.client.send('post', '/api/assignments', body);
    expect(res.status).toBe(201);
    const { assignments } = AssignmentCreatedDtoSchema.parse(res.body);
    expect(assignments.map((a) => a.class.name)).toEqual(['10B Physics', '10A Physics']);
    for (const assignment of assignments) {
      expect(assignment).toMatchObject({
        lesson: { id: published.lesson.id, title: 'Field of a flat coil', latestVersion: 1 },
        versionNumber: 1,
        opensAt: '2030-01-10T09:00:00.000Z',
        dueAt: '2030-07-01T16:00:00.000Z',
        lateUntil: '2030-07-08T16:30:00.000Z',
        timeZone: 'Europe/London',
        feedback: 'after-due',
        reveal: 'never',
        completionWatchShare: 0.75,
        createdBy: { id: teacher.id, name: teacher.name },
        phase: 'upcoming',
        counts: { students: 0, started: 0, done: 0 },
        canManage: true,
      });
    }
    const rows = await t.db('assignments').orderBy('created_at').select('*');
    expect(rows).toHaveLength(2);
    const version = await t.db('lesson_versions').where({ lesson_id: published.lesson.id, number: 1 }).first('id');
    for (const row of rows)
      expect(row).toMatchObject({ school_id: school.id, lesson_version_id: version.id, version_number: 1, created_by: teacher.id });
    const audit = await t.db('audit_events').where({ action: 'assignment_created' }).orderBy('id');
    expect(audit.map((a) => [a.actor_id, a.data.assignmentId, a.data.className, a.data.version])).toEqual([
      [teacher.id, assignments[0]!.id, '10B Physics', 1],
      [teacher.id, assignments[1]!.id, '10A Physics', 1],
    ]);
  });

  it('lets an admin assign a lesson they can open to any class of the school', async () => {
    const { school, published, theirs } = await department();
    const admin = await member(t, ['admin'], { schoolId: school.id });
    const [created] = (await admin.client.send('post', '/api/assignments', assignmentBody(published.lesson.id, [theirs.id]))).body
      .assignments;
    expect(created).toMatchObject({ class: { id: theirs.id }, createdBy: { id: admin.id }, phase: 'open', canManage: true });
  });
});
