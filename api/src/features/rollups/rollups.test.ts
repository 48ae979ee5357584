import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { createLogger } from '../../logger';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { assignedLesson, classmate, type Assigned } from '../watch/watch.test-support';
import type { Member } from '../lessons/lessons.test-support';
import { KEYS, RIGHT_CHOICE, WRONG_CHOICE, answerBody, submit, submitLesson } from '../responses/responses.test-support';
import { createRollups, startRollupLoop } from './rollup-loop';
import { MARK_NAME } from './rollups.repository';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const STAYS_STILL = { kind: 'multiple-choice' as const, optionIds: ['c'] };
const numericAnswer = (text: string) => ({ kind: 'numeric' as const, text });

async function answer(assigned: Assigned, student: Member, key: string, given: Parameters<typeof answerBody>[1]) {
  const res = await submit(student.client, assigned.assignmentId, answerBody(key, given));
  if (res.status !== 201) throw new Error(`answer refused: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.responseId as string;
}

const rollupOf = (assignmentId: string, key: string) =>
  t.db('checkpoint_rollups').where({ assignment_id: assignmentId, checkpoint_key: key }).first();

/** Bits of seconds for a 12-second recording (two bytes), as the coverage column stores them. */
function coverage(seconds: number[]): Buffer {
  const bytes = Buffer.alloc(2);
  for (const s of seconds) bytes[Math.floor(s / 8)]! |= 1 << (7 - (s % 8));
  return bytes;
}

describe('the rollup pass', () => {
  it('keeps per checkpoint attempts, students, first-attempt and latest right, mistakes and the answer spread; per second the audience', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const [s1, s2, s3] = [assigned.student, await classmate(t, assigned), await classmate(t, assigned)];
    // s1's stored numbers give B = 251.3 µT (see responses.test.ts); 25.1 µT is out by ten, 80 µT is the straight-wire formula.
    // Stored before s1's first answer, which would draw them otherwise.
    await t.db('student_variables').insert({
      assignment_id: assigned.assignmentId,
      student_id: s1.id,
      checkpoint_key: KEYS.numeric,
      values: JSON.stringify({ a: '5 cm', N: 20, I: '1 A' }),
    });
    // s1 right at once; s2 wrong then right; s3 wrong twice.
    await answer(assigned, s1, KEYS.choice, RIGHT_CHOICE);
    await answer(assigned, s2, KEYS.choice, WRONG_CHOICE);
    await answer(assigned, s2, KEYS.choice, RIGHT_CHOICE);
    await answer(assigned, s3, KEYS.choice, WRONG_CHOICE);
    await answer(assigned, s3, KEYS.choice, STAYS_STILL);
    await answer(assigned, s1, KEYS.numeric, numericAnswer('25.1 uT'));
    await answer(assigned, s1, KEYS.numeric, numericAnswer('80 uT'));
    // Hand-set coverage: s1 watched seconds 0–3, s2 seconds 2–5 and 8–11; s3 nothing.
    const progress = (student: Member) => t.db('student_progress').where({ assignment_id: assigned.assignmentId, student_id: student.id });
    await progress(s1).update({ coverage: coverage([0, 1, 2, 3]), watched_seconds: 4, viewing_updated_at: new Date() });
    await progress(s2).update({ coverage: coverage([2, 3, 4, 5, 8, 9, 10, 11]), watched_seconds: 8, viewing_updated_at: new Date() });

    const pass = await createRollups({ db: t.db }).runOnce();
    expect(pass.skipped).toBe(false);

    expect(await rollupOf(assigned.assignmentId, KEYS.choice)).toMatchObject({
      attempts: 5,
      students: 3,
      first_attempt_correct: 1,
      correct_students: 2,
      mistakes: {},
      distribution: { 'Towards east': 2, 'It stays still': 1 },
    });
    expect(await rollupOf(assigned.assignmentId, KEYS.numeric)).toMatchObject({
      attempts: 2,
      students: 1,
      first_attempt_correct: 0,
      correct_students: 0,
      mistakes: { 'power-of-ten': 1, 'distractor:d1': 1 },
      distribution: { '80 uT': 1 },
    });
    expect(await rollupOf(assigned.assignmentId, KEYS.text)).toBeUndefined();
    const viewing = await t.db('viewing_rollups').where({ assignment_id: assigned.assignmentId }).first();
    expect(viewing).toMatchObject({ students: 2, audience: [1, 1, 2, 2, 1, 1, 0, 0, 1, 1, 1, 1] });
  });

  it('a later grade (a teacher marking by hand) counts as the latest; a pass with nothing new changes nothing', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const rollups = createRollups({ db: t.db });
    const wrong = await answer(assigned, assigned.student, KEYS.choice, WRONG_CHOICE);
    await rollups.runOnce();
    const before = await rollupOf(assigned.assignmentId, KEYS.choice);
    expect(before).toMatchObject({ correct_students: 0, first_attempt_correct: 0 });

    await rollups.runOnce();
    expect((await rollupOf(assigned.assignmentId, KEYS.choice)).computed_at).toEqual(before.computed_at);

    await t.db('grades').insert({
      response_id: wrong,
      assignment_id: assigned.assignmentId,
      checkpoint_key: KEYS.choice,
      score: 1,
      correct: true,
      mistake: null,
      detail: JSON.stringify({
        correct: true,
        score: 1,
        feedback: 'Marked right by your teacher.',
        mistake: null,
        invalid: false,
        attemptsLeft: 2,
        hints: [],
        reveal: null,
      }),
      source: 'teacher',
      graded_by: assigned.teacher.id,
      version_number: 1,
    });
    await rollups.runOnce();
    expect(await rollupOf(assigned.assignmentId, KEYS.choice)).toMatchObject({
      attempts: 1,
      correct_students: 1,
      first_attempt_correct: 1,
    });
  });

  it('never moves past a grade whose transaction is still open, and counts it once it commits', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const rollups = createRollups({ db: t.db });
    const first = await answer(assigned, assigned.student, KEYS.choice, WRONG_CHOICE);
    await rollups.runOnce();

    // A slow transaction draws a grade id and has not committed yet…
    const slow = await t.db.transaction();
    await slow('grades').insert({
      response_id: first,
      assignment_id: assigned.assignmentId,
      checkpoint_key: KEYS.choice,
      score: 1,
      correct: true,
      mistake: null,
      detail: JSON.stringify({
        correct: true,
        score: 1,
        feedback: 'Marked right.',
        mistake: null,
        invalid: false,
        attemptsLeft: 2,
        hints: [],
        reveal: null,
      }),
      source: 'teacher',
      version_number: 1,
    });
    // …while a later answer (a higher grade id) commits at once.
    await answer(assigned, assigned.student, KEYS.choice, STAYS_STILL);
    const markBefore = (await t.db('rollup_marks').where({ name: MARK_NAME }).first()).last_grade_id;
    await rollups.runOnce();
    expect((await t.db('rollup_marks').where({ name: MARK_NAME }).first()).last_grade_id).toBe(markBefore);

    await slow.commit();
    await rollups.runOnce();
    // The teacher's grade made attempt 1 right: first-attempt right, and the latest answer (c) is wrong.
    expect(await rollupOf(assigned.assignmentId, KEYS.choice)).toMatchObject({
      attempts: 2,
      first_attempt_correct: 1,
      correct_students: 0,
    });
  });

  it('skips the pass while another worker holds the mark', async () => {
    await createRollups({ db: t.db }).runOnce();
    const other = await t.db.transaction();
    try {
      await other('rollup_marks').where({ name: MARK_NAME }).forUpdate();
      expect(await createRollups({ db: t.db }).runOnce()).toEqual({ skipped: true, checkpoints: 0, assignmentsViewed: 0 });
    } finally {
      await other.rollback();
    }
  });
});

describe('the rollup loop of the worker', () => {
  it('brings rollups up to date by itself and stops cleanly', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const loop = startRollupLoop({ db: t.db, logger: createLogger('silent'), intervalMs: 50 });
    try {
      await answer(assigned, assigned.student, KEYS.choice, RIGHT_CHOICE);
      let row;
      for (let i = 0; i < 100 && !row; i += 1) {
        await new Promise((resolve) => setTimeout(resolve, 50));
        row = await rollupOf(assigned.assignmentId, KEYS.choice);
      }
      expect(row).toMatchObject({ attempts: 1, students: 1, correct_students: 1 });
    } finally {
      await loop.stop();
    }
  });
});
