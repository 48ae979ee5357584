import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AssignmentMovedDtoSchema, type Checkpoint, type CheckpointGradeDto } from '@core/contracts';
import { numeric, shortText } from '@core/lessons/fixtures.test-support';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildClass, buildDepartment, buildSchool, enrol } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { member, type Member } from '../lessons/lessons.test-support';
import {
  assign,
  assignmentBody,
  choose,
  FIXED_NEEDLE,
  publishedLesson,
  publishNext,
  SLIPPED_NEEDLE,
  storeValues,
  submitAnswer,
} from './assignments.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

// Version 1 as the teacher first published it, with two slips: the wrong option marked right, and 2x for "three rods".
const NEEDLE = SLIPPED_NEEDLE;
const RODS = numeric({
  atMs: 4_000,
  label: 'Three rods',
  prompt: 'A rod is {{x}} long. How long are three such rods laid end to end? Give it in cm.',
  expected: 'x*2',
  askedUnit: 'cm',
  variables: [{ name: 'x', min: 2, max: 6, step: 1, unit: 'cm', role: 'none' }],
  distractors: [],
});
const LAW = shortText({ atMs: 6_000, label: 'The law' });

// Version 2 corrects both; the drawn range changes too, so grading with fresh draws instead of the stored '4 cm' would show.
const NEEDLE_FIXED = FIXED_NEEDLE;
const RODS_FIXED: Checkpoint = {
  ...RODS,
  expected: 'x*3',
  variables: [{ name: 'x', min: 10, max: 20, step: 1, unit: 'cm', role: 'none' }],
};

interface Setting {
  teacher: Member;
  coordinator: Member;
  colleague: Member;
  students: Member[];
  published: Awaited<ReturnType<typeof publishedLesson>>;
  assignmentId: string;
}

async function setting(): Promise<Setting> {
  const school = await buildSchool(t.db);
  const physics = await buildDepartment(t.db, school.id);
  const teacher = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
  const coordinator = await member(t, ['coordinator'], { schoolId: school.id, departmentId: physics.id });
  const colleague = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
  const published = await publishedLesson(t, teacher, [NEEDLE, RODS, LAW]);
  const cls = await buildClass(t.db, { schoolId: school.id, teacherId: teacher.id, departmentId: physics.id, name: '10A Physics' });
  const students: Member[] = [];
  for (let i = 0; i < 4; i++) {
    const student = await member(t, ['student'], { schoolId: school.id });
    await enrol(t.db, cls.id, student.id);
    students.push(student);
  }
  const [assignment] = await assign(teacher.client, assignmentBody(published.lesson.id, [cls.id]));
  return { teacher, coordinator, colleague, students, published, assignmentId: assignment!.id };
}

/** Every grade of a student's responses at a checkpoint, oldest first, per attempt. */
async function gradesOf(assignmentId: string, studentId: string, key: string) {
  return t
    .db('grades as g')
    .join('responses as r', 'r.id', 'g.response_id')
    .where({ 'r.assignment_id': assignmentId, 'r.student_id': studentId, 'r.checkpoint_key': key })
    .orderBy(['r.attempt', 'g.id'])
    .select<
      {
        attempt: number;
        source: string;
        correct: boolean | null;
        score: number;
        graded_by: string | null;
        version_number: number;
        detail: CheckpointGradeDto;
      }[]
    >('r.attempt', 'g.source', 'g.correct', 'g.score', 'g.graded_by', 'g.version_number', 'g.detail');
}

const move = (client: Client, id: string, versionNumber: unknown) => client.send('post', `/api/assignments/${id}/move`, { versionNumber });

describe('POST /api/assignments/:id/move', () => {
  it('refuses signed-out callers (401), bad bodies (400), coordinators (403) and strangers (404)', async () => {
    const x = await setting();
    await publishNext(x.teacher, x.published, [NEEDLE_FIXED, RODS_FIXED, LAW]);
    expect((await move(new Client(t), x.assignmentId, 2)).status).toBe(401);
    const bad = await move(x.teacher.client, x.assignmentId, 'two');
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('versionNumber');
    const coordinator = await move(x.coordinator.client, x.assignmentId, 2);
    expect(coordinator.status).toBe(403);
    expect(coordinator.body.error.message).toMatch(/^This needs the teacher or admin role in Test School /);
    expect((await move(x.colleague.client, x.assignmentId, 2)).status).toBe(404);
    expect((await t.db('assignments').where({ id: x.assignmentId }).first('version_number')).version_number).toBe(1);
  });

  it('regrades the changed checkpoints from the stored answers, attempts and values, and keeps a teacher’s mark', async () => {
    const x = await setting();
    const [s1, s2, s3, s4] = x.students as [Member, Member, Member, Member];
    const id = x.assignmentId;
    // s1 and s4 were given x = 4 cm: three rods are 12 cm, not 8 cm (hand-computed).
    await storeValues(t.db, id, s1.id, RODS.key, { x: '4 cm' });
    await storeValues(t.db, id, s4.id, RODS.key, { x: '4 cm' });
    expect((await submitAnswer(s1.client, id, NEEDLE.key, choose(NEEDLE, 'Clockwise'))).grade.correct).toBe(true);
    expect((await submitAnswer(s1.client, id, RODS.key, { kind: 'numeric', text: '12 cm' })).grade.correct).toBe(false);
    for (let i = 0; i < 2; i++)
      expect((await submitAnswer(s2.client, id, NEEDLE.key, choose(NEEDLE, 'Anticlockwise'))).grade.correct).toBe(false);
    await submitAnswer(s2.client, id, LAW.key, { kind: 'short-text', text: 'Biot Savart law' });
    await submitAnswer(s3.client, id, NEEDLE.key, choose(NEEDLE, 'Anticlockwise'));
    // The teacher marked s3's answer right by hand: that judgement stands through the regrade.
    const s3Response = await t.db('responses').where({ assignment_id: id, student_id: s3.id }).first('id');
    await t.db('grades').insert({
      response_id: s3Response.id,
      assignment_id: id,
      checkpoint_key: NEEDLE.key,
      score: 1,
      correct: true,
      mistake: null,
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
      source: 'teacher',
      graded_by: x.teacher.id,
      version_number: 1,
    });
    // 31 cm is wrong against both 8 cm and 12 cm: regraded, unchanged, no new grade.
    await submitAnswer(s4.client, id, RODS.key, { kind: 'numeric', text: '31 cm' });

    await publishNext(x.teacher, x.published, [NEEDLE_FIXED, RODS_FIXED, LAW]);
    const res = await move(x.teacher.client, id, 2);
    expect(res.status).toBe(200);
    const moved = AssignmentMovedDtoSchema.parse(res.body);
    expect(moved).toMatchObject({
      fromVersion: 1,
      toVersion: 2,
      changedKeys: [NEEDLE.key, RODS.key],
      // s1 ×2, s2 ×2, s4 (s3's mark kept; s2's short text unchanged).
      responsesRegraded: 5,
      gradesChanged: 4,
      studentsAffected: 2,
      assignment: { id, versionNumber: 2, lesson: { latestVersion: 2 } },
    });

    const s1Needle = await gradesOf(id, s1.id, NEEDLE.key);
    expect(s1Needle.map((g) => [g.attempt, g.source, g.correct, g.version_number])).toEqual([
      [1, 'engine', true, 1],
      [1, 'regrade', false, 2],
    ]);
    expect(s1Needle[1]!.graded_by).toBe(x.teacher.id);
    // The stored answer at attempt 1 of 3: wrong, two attempts left, the first hint unlocked, nothing revealed.
    expect(s1Needle[1]!.detail).toMatchObject({ correct: false, score: 0, attemptsLeft: 2, hints: ['First hint'], reveal: null });
    expect((await gradesOf(id, s1.id, RODS.key)).map((g) => [g.source, g.correct, g.score])).toEqual([
      ['engine', false, 0],
      ['regrade', true, 1],
    ]);
    expect((await gradesOf(id, s2.id, NEEDLE.key)).map((g) => [g.attempt, g.source, g.correct])).toEqual([
      [1, 'engine', false],
      [1, 'regrade', true],
      [2, 'engine', false],
      [2, 'regrade', true],
    ]);
    expect((await gradesOf(id, s2.id, LAW.key)).map((g) => g.source)).toEqual(['engine']);
    expect((await gradesOf(id, s3.id, NEEDLE.key)).map((g) => g.source)).toEqual(['engine', 'teacher']);
    expect((await gradesOf(id, s4.id, RODS.key)).map((g) => g.source)).toEqual(['engine']);

    // The affected students see "grade updated"; the others do not.
    const progress = await t.db('student_progress').where({ assignment_id: id }).select('student_id', 'grade_updated_at');
    const updated = progress
      .filter((p) => p.grade_updated_at !== null)
      .map((p) => p.student_id)
      .sort();
    expect(updated).toEqual([s1.id, s2.id].sort());

    const [record] = await t.db('assignment_version_moves').where({ assignment_id: id });
    expect(record).toMatchObject({
      from_version: 1,
      to_version: 2,
      changed_keys: [NEEDLE.key, RODS.key],
      responses_regraded: 5,
      grades_changed: 4,
      moved_by: x.teacher.id,
    });
    const [event] = await t.db('audit_events').where({ action: 'assignment_moved' });
    expect(event.data).toMatchObject({ assignmentId: id, fromVersion: 1, toVersion: 2, gradesChanged: 4, studentsAffected: 2 });

    // New answers are graded against version 2.
    expect((await submitAnswer(s3.client, id, RODS.key, { kind: 'numeric', text: '1 cm' })).grade.correct).toBe(false);
    const v2Answer = await t
      .db('responses')
      .where({ assignment_id: id, student_id: s3.id, checkpoint_key: RODS.key })
      .first('version_number');
    expect(v2Answer.version_number).toBe(2);
  });

  it('refuses the same or an older version (409), a version that does not exist (400), and keeps everything', async () => {
    const x = await setting();
    await publishNext(x.teacher, x.published, [NEEDLE_FIXED, RODS_FIXED, LAW]);
    const same = await move(x.teacher.client, x.assignmentId, 1);
    expect(same.status).toBe(409);
    expect(same.body.error).toEqual({ code: 'already_on_version', message: 'This assignment is already on version 1.' });
    const missing = await move(x.teacher.client, x.assignmentId, 5);
    expect(missing.status).toBe(400);
    expect(missing.body.error).toMatchObject({
      code: 'version_not_found',
      message: '“Field of a flat coil” has no version 5; its newest is version 2.',
    });
    expect((await move(x.teacher.client, x.assignmentId, 2)).status).toBe(200);
    const older = await move(x.teacher.client, x.assignmentId, 1);
    expect(older.status).toBe(409);
    expect(older.body.error).toEqual({
      code: 'older_version',
      message: 'Version 1 is older than the assigned version 2: an assignment moves only to a newer, corrected version of its lesson.',
    });
  });

  it('refuses a version with other questions, or one that cannot read the recorded answers (409), and changes nothing', async () => {
    const x = await setting();
    const [, s2] = x.students as [Member, Member];
    await submitAnswer(s2.client, x.assignmentId, NEEDLE.key, choose(NEEDLE, 'Anticlockwise'));
    await submitAnswer(s2.client, x.assignmentId, NEEDLE.key, choose(NEEDLE, 'Anticlockwise'));
    const extra = shortText({ key: 'stkey00002', atMs: 8_000, label: 'A new question' });
    const v2 = await publishNext(x.teacher, x.published, [NEEDLE, RODS, LAW, extra]);
    const added = await move(x.teacher.client, x.assignmentId, 2);
    expect(added.status).toBe(409);
    expect(added.body.error).toMatchObject({
      code: 'versions_incompatible',
      message:
        'Version 2 cannot replace version 1 for this assignment: The new version adds the question “A new question” (stkey00002); students assigned the current version never saw it.',
      details: [
        {
          path: 'versionNumber',
          message: 'The new version adds the question “A new question” (stkey00002); students assigned the current version never saw it.',
        },
      ],
    });

    // Version 3: same questions, but the option s2 chose is gone (a new one in its place).
    const reworded: Checkpoint = {
      ...NEEDLE,
      options: [
        { id: 'a', text: 'Clockwise', correct: false, feedback: '' },
        { id: 'c', text: 'Anticlockwise', correct: true, feedback: '' },
      ],
    };
    await publishNext(x.teacher, v2, [reworded, RODS, LAW]);
    const unreadable = await move(x.teacher.client, x.assignmentId, 3);
    expect(unreadable.status).toBe(409);
    expect(unreadable.body.error).toMatchObject({
      code: 'answers_not_gradable',
      message:
        'Version 3 cannot grade the answers already recorded, so nothing was moved: 2 recorded answers to “Needle direction” cannot be graded by version 3 (for example “Anticlockwise”: There is no option "b" in this question)',
    });
    expect((await t.db('assignments').where({ id: x.assignmentId }).first('version_number')).version_number).toBe(1);
    expect(await t.db('grades').where({ assignment_id: x.assignmentId, source: 'regrade' })).toHaveLength(0);
    expect(await t.db('assignment_version_moves').where({ assignment_id: x.assignmentId })).toHaveLength(0);
  });
});
