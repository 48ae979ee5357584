import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { buildClass, buildSchool, enrol } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { member, type Member } from '../lessons/lessons.test-support';
import { assign, assignmentBody, choose, FIXED_NEEDLE, publishedLesson, publishNext, SLIPPED_NEEDLE } from './assignments.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

// Version 1 marks the wrong option right; version 2 corrects it.
const NEEDLE = SLIPPED_NEEDLE;
const FIXED = FIXED_NEEDLE;

describe('a move racing students’ answers', () => {
  it('never deadlocks, and every answer ends graded by the corrected version', async () => {
    const school = await buildSchool(t.db);
    const teacher = await member(t, ['teacher'], { schoolId: school.id });
    const published = await publishedLesson(t, teacher, [NEEDLE]);
    const cls = await buildClass(t.db, { schoolId: school.id, teacherId: teacher.id });
    const students: Member[] = [];
    for (let i = 0; i < 8; i++) {
      const student = await member(t, ['student'], { schoolId: school.id });
      await enrol(t.db, cls.id, student.id);
      students.push(student);
    }
    const [assignment] = await assign(teacher.client, assignmentBody(published.lesson.id, [cls.id]));
    await publishNext(teacher, published, [FIXED]);
    const id = assignment!.id;
    const answer = (student: Member, text: string) =>
      student.client.send('post', `/api/student/assignments/${id}/responses`, {
        idempotencyKey: randomUUID(),
        checkpointKey: NEEDLE.key,
        answer: choose(NEEDLE, text),
        answeredAt: new Date().toISOString(),
      });

    // One answer per student (a right one ends the checkpoint), half sent just before the move, half just after.
    const text = (i: number) => (i % 2 ? 'Clockwise' : 'Anticlockwise');
    const before = students.slice(0, 4).map((student, i) => answer(student, text(i)));
    const moved = teacher.client.send('post', `/api/assignments/${id}/move`, { versionNumber: 2 });
    const after = students.slice(4).map((student, i) => answer(student, text(i)));
    const replies = await Promise.all([...before, ...after]);
    expect(replies.map((r) => r.status)).toEqual(replies.map(() => 201));
    expect((await moved).status).toBe(200);

    // Whatever the order, the grade that counts for each answer is version 2's: Anticlockwise is right.
    const latest = await t.db.raw<{ rows: { raw_text: string; correct: boolean }[] }>(
      `SELECT r.raw_text, g.correct FROM responses r
       JOIN LATERAL (SELECT correct FROM grades WHERE response_id = r.id ORDER BY id DESC LIMIT 1) g ON true
       WHERE r.assignment_id = ?`,
      [id],
    );
    expect(latest.rows).toHaveLength(8);
    for (const row of latest.rows) expect(row.correct, JSON.stringify(row)).toBe(row.raw_text === 'Anticlockwise');
  });
});
