import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ResponseResultDtoSchema } from '@core/contracts';
import { formatSchoolTime } from '@core/assignments';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { member } from '../lessons/lessons.test-support';
import { assignedLesson, classmate, hoursFromNow } from '../watch/watch.test-support';
import { createAssignmentContexts } from './assignment-context';
import { createResponsesService } from './responses.service';
import { createSubmitRateLimit } from './submit-rate-limit';
import { KEYS, RIGHT_CHOICE, WRONG_CHOICE, answerBody, databaseUrl, responsesPath, submit, submitLesson } from './responses.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const NOT_ASSIGNED = 'That assignment (it may not be assigned to your class) was not found.';

async function rowsOf(assignmentId: string, studentId: string) {
  return t.db('responses').where({ assignment_id: assignmentId, student_id: studentId }).orderBy(['checkpoint_key', 'attempt']);
}

describe('POST /api/student/assignments/:assignmentId/responses: who and what', () => {
  it('401 signed out, 400 with the exact message for a bad body, 403 for a teacher', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const body = answerBody(KEYS.choice, RIGHT_CHOICE);
    expect((await new Client(t).send('post', responsesPath(assigned.assignmentId), body)).status).toBe(401);

    const noKey = await submit(assigned.student.client, assigned.assignmentId, { ...body, idempotencyKey: 'again' });
    expect(noKey.status).toBe(400);
    expect(noKey.body.error.message).toBe('idempotencyKey: Expected an idempotency key (a UUID).');
    const noTime = await submit(assigned.student.client, assigned.assignmentId, { ...body, answeredAt: 'yesterday' });
    expect(noTime.body.error.message).toBe('answeredAt: Expected the answer time as an ISO 8601 date-time.');

    const teacher = await submit(assigned.teacher.client, assigned.assignmentId, body);
    expect(teacher.status).toBe(403);
    expect(teacher.body.error.message).toMatch(/needs the student role/);
    expect(await t.db('responses').where({ assignment_id: assigned.assignmentId })).toEqual([]);
  });

  it('404 for a student of another class or school and an unknown id; 404 unknown_checkpoint for a key not in the version or a note', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const sameSchool = await member(t, ['student'], { schoolId: assigned.teacher.schoolId });
    const otherSchool = await assignedLesson(t, submitLesson());
    for (const [client, id] of [
      [sameSchool.client, assigned.assignmentId],
      [otherSchool.student.client, assigned.assignmentId],
      [assigned.student.client, '00000000-0000-4000-8000-000000000000'],
    ] as const) {
      const res = await submit(client, id, answerBody(KEYS.choice, RIGHT_CHOICE));
      expect(res.status).toBe(404);
      expect(res.body.error).toEqual({ code: 'not_found', message: NOT_ASSIGNED });
    }
    const unknown = await submit(assigned.student.client, assigned.assignmentId, answerBody('nosuchkey1', RIGHT_CHOICE));
    expect(unknown.status).toBe(404);
    expect(unknown.body.error).toEqual({
      code: 'unknown_checkpoint',
      message: 'There is no checkpoint “nosuchkey1” in version 1 of this lesson. Reload the page to get the lesson as assigned.',
    });
    const noteAnswer = await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.note, RIGHT_CHOICE));
    expect(noteAnswer.body.error).toEqual({ code: 'unknown_checkpoint', message: 'That checkpoint takes no answer.' });
    const wrongKind = await submit(
      assigned.student.client,
      assigned.assignmentId,
      answerBody(KEYS.choice, { kind: 'short-text', text: 'east' }),
    );
    expect(wrongKind.status).toBe(400);
    expect(wrongKind.body.error.code).toBe('answer_mismatch');
    expect(await t.db('responses').whereIn('student_id', [sameSchool.id, otherSchool.student.id, assigned.student.id])).toEqual([]);
  });

  it('a student removed from the class is refused at once, even right after an answer was accepted', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    expect((await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE))).status).toBe(201);
    await t.db('enrolments').where({ class_id: assigned.classId, student_id: assigned.student.id }).delete();
    const res = await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE));
    expect(res.status).toBe(404);
    expect(await rowsOf(assigned.assignmentId, assigned.student.id)).toHaveLength(1);
  });
});

describe('exactly once', () => {
  it('201 with the graded result and one stored row; a resend of the key gets 200 and the same result; another body 409', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const body = answerBody(KEYS.choice, WRONG_CHOICE);
    const first = await submit(assigned.student.client, assigned.assignmentId, body);
    expect(first.status).toBe(201);
    const result = ResponseResultDtoSchema.parse(first.body);
    expect(result).toMatchObject({ attempt: 1, late: false, sentAfterReconnecting: false, feedbackHidden: false });
    // Hand-checked against the fixture: option b is wrong with its own feedback; one wrong attempt unlocks the first hint.
    expect(result.grade).toEqual({
      correct: false,
      score: 0,
      feedback: 'SECRET-FEEDBACK-B',
      mistake: null,
      invalid: false,
      attemptsLeft: 2,
      hints: ['First hint'],
      reveal: null,
    });
    expect(first.headers['cache-control']).toBe('private, no-store');

    const again = await submit(assigned.student.client, assigned.assignmentId, body);
    expect(again.status).toBe(200);
    expect(again.body.responseId).toBe(result.responseId);
    expect(again.body.grade).toEqual(result.grade);
    expect(again.body.recordedAt).toBe(result.recordedAt);

    const other = await submit(assigned.student.client, assigned.assignmentId, { ...body, answer: RIGHT_CHOICE });
    expect(other.status).toBe(409);
    expect(other.body.error.code).toBe('idempotency_conflict');

    const rows = await rowsOf(assigned.assignmentId, assigned.student.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({
      id: result.responseId,
      checkpoint_key: KEYS.choice,
      version_number: 1,
      attempt: 1,
      idempotency_key: body.idempotencyKey,
      answer: WRONG_CHOICE,
      raw_text: 'Towards west',
      is_explanation: false,
      late: false,
    });
    const grades = await t.db('grades').where({ response_id: result.responseId });
    expect(grades).toHaveLength(1);
    expect(grades[0]).toMatchObject({ source: 'engine', score: 0, correct: false, version_number: 1 });
    expect(grades[0].detail.feedback).toBe('SECRET-FEEDBACK-B');
  });

  it('a double-clicked submit (the same body sent twice at once) stores one row', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const body = answerBody(KEYS.choice, WRONG_CHOICE);
    const replies = await Promise.all([0, 1].map(() => submit(assigned.student.client, assigned.assignmentId, body)));
    expect(replies.map((r) => r.status).sort()).toEqual([200, 201]);
    expect(replies[0]!.body.responseId).toBe(replies[1]!.body.responseId);
    expect(await rowsOf(assigned.assignmentId, assigned.student.id)).toHaveLength(1);
  });

  it('20 concurrent submissions with mixed keys, from two API processes: the right rows, attempts 1..n, never past the limit', async () => {
    const assigned = await assignedLesson(t, submitLesson({ choiceAttempts: 5 }));
    // A second API process on the same database: its own pool, contexts, caches and group commit.
    const elsewherePool = new pg.Pool({ connectionString: databaseUrl(t), max: 3 });
    const elsewhere = createResponsesService({
      db: t.db,
      pool: elsewherePool,
      contexts: createAssignmentContexts({ db: t.db }),
      rateLimit: createSubmitRateLimit(1000),
    });
    const actor = {
      userId: assigned.student.id,
      email: assigned.student.email,
      name: assigned.student.name,
      memberships: [],
      active: {
        schoolId: assigned.teacher.schoolId,
        schoolName: 'Test',
        timeZone: 'Europe/London',
        locale: 'en-GB',
        roles: ['student' as const],
        departmentId: null,
        role: 'student' as const,
      },
    };
    // 12 distinct answers (keys), 8 of them sent twice: 20 requests, alternating between the processes.
    const bodies = Array.from({ length: 12 }, () => answerBody(KEYS.choice, WRONG_CHOICE));
    const sends = [...bodies, ...bodies.slice(0, 8)];
    const replies = await Promise.all(
      sends.map(async (body, index) => {
        if (index % 2 === 0) {
          const res = await submit(assigned.student.client, assigned.assignmentId, body);
          return {
            key: body.idempotencyKey,
            status: res.status,
            id: res.body.responseId as string | undefined,
            code: res.body.error?.code,
          };
        }
        try {
          const { status, result } = await elsewhere.submit(actor, assigned.assignmentId, body);
          return { key: body.idempotencyKey, status, id: result.responseId ?? undefined, code: undefined };
        } catch (error) {
          return {
            key: body.idempotencyKey,
            status: (error as { status: number }).status,
            id: undefined,
            code: (error as { code: string }).code,
          };
        }
      }),
    );

    const rows = await rowsOf(assigned.assignmentId, assigned.student.id);
    expect(rows.map((r) => r.attempt)).toEqual([1, 2, 3, 4, 5]);
    const recordedKeys = new Set(rows.map((r) => r.idempotency_key as string));
    expect(recordedKeys.size).toBe(5);
    expect(replies.filter((r) => r.status === 201)).toHaveLength(5);
    for (const reply of replies) {
      if (recordedKeys.has(reply.key)) {
        // Every send of a recorded key got that one row, as 201 the first time and 200 after.
        expect([200, 201]).toContain(reply.status);
        expect(reply.id).toBe(rows.find((r) => r.idempotency_key === reply.key)!.id);
      } else {
        expect(reply).toMatchObject({ status: 409, code: 'no_attempts_left' });
      }
    }
    expect(
      await t.db('grades').whereIn(
        'response_id',
        rows.map((r) => r.id),
      ),
    ).toHaveLength(5);
    await elsewherePool.end();
  });
});

describe('refusals', () => {
  it('beyond the attempts allowed: 409 no_attempts_left naming the question; after a right answer with feedback shown too', async () => {
    const assigned = await assignedLesson(t, submitLesson({ choiceAttempts: 2 }));
    const { client } = assigned.student;
    expect((await submit(client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE))).status).toBe(201);
    const last = await submit(client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE));
    expect(last.status).toBe(201);
    // The last attempt reveals (feedback immediately, reveal after the last attempt).
    expect(last.body.grade.reveal).toEqual({ answer: 'Towards east', explanation: 'Because of the right-hand rule.' });
    const over = await submit(client, assigned.assignmentId, answerBody(KEYS.choice, RIGHT_CHOICE));
    expect(over.status).toBe(409);
    expect(over.body.error).toEqual({
      code: 'no_attempts_left',
      message: 'You have used all 2 attempts at “Which way does the needle turn?”, so this answer was not saved.',
    });

    const right = await classmate(t, assigned);
    expect((await submit(right.client, assigned.assignmentId, answerBody(KEYS.choice, RIGHT_CHOICE))).status).toBe(201);
    const afterRight = await submit(right.client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE));
    expect(afterRight.status).toBe(409);
    expect(afterRight.body.error.message).toBe(
      'You already answered “Which way does the needle turn?” correctly, so there is nothing more to send.',
    );
    expect(await rowsOf(assigned.assignmentId, right.id)).toHaveLength(1);
  });

  it('before the opening 409 assignment_not_open and after the due date 409 assignment_closed, both in school time', async () => {
    const early = await assignedLesson(t, submitLesson(), { opensAt: hoursFromNow(2), dueAt: hoursFromNow(30) });
    const notOpen = await submit(early.student.client, early.assignmentId, answerBody(KEYS.choice, RIGHT_CHOICE));
    expect(notOpen.status).toBe(409);
    const opensAt = (await t.db('assignments').where({ id: early.assignmentId }).first('opens_at')).opens_at as Date;
    expect(notOpen.body.error).toEqual({
      code: 'assignment_not_open',
      message: `This lesson opens for answers on ${formatSchoolTime(opensAt, 'Europe/London', 'en-GB')}.`,
    });

    const past = await assignedLesson(t, submitLesson(), { opensAt: hoursFromNow(-48), dueAt: hoursFromNow(-1), lateUntil: null });
    const closed = await submit(past.student.client, past.assignmentId, answerBody(KEYS.choice, RIGHT_CHOICE));
    expect(closed.status).toBe(409);
    expect(closed.body.error.code).toBe('assignment_closed');
    expect(closed.body.error.message).toMatch(/^This lesson was due on .+ and takes no late answers\./);
    expect(await t.db('responses').whereIn('assignment_id', [early.assignmentId, past.assignmentId])).toEqual([]);
  });

  it('late answers are taken until lateUntil and marked late', async () => {
    const assigned = await assignedLesson(t, submitLesson(), {
      opensAt: hoursFromNow(-48),
      dueAt: hoursFromNow(-1),
      lateUntil: hoursFromNow(5),
    });
    const res = await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.choice, RIGHT_CHOICE));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ late: true, sentAfterReconnecting: false });
    expect((await rowsOf(assigned.assignmentId, assigned.student.id))[0]).toMatchObject({ late: true, sent_after_reconnecting: false });
  });

  it('an answer queued before the due time and arriving within 24 h is taken as on time and marked; older than a day it is not trusted', async () => {
    const assigned = await assignedLesson(t, submitLesson(), { opensAt: hoursFromNow(-48), dueAt: hoursFromNow(-1), lateUntil: null });
    const answeredAt = hoursFromNow(-3);
    const res = await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.choice, RIGHT_CHOICE, { answeredAt }));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ late: false, sentAfterReconnecting: true });
    const [row] = await rowsOf(assigned.assignmentId, assigned.student.id);
    expect(row).toMatchObject({ late: false, sent_after_reconnecting: true });
    expect((row.answered_at as Date).toISOString()).toBe(answeredAt.toISOString());

    const stale = await submit(
      assigned.student.client,
      assigned.assignmentId,
      answerBody(KEYS.numeric, { kind: 'numeric', text: '60 uT' }, { answeredAt: hoursFromNow(-30) }),
    );
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('assignment_closed');
  });

  it('an answer kept offline over the close is refused once the student has opened their results after the close', async () => {
    const assigned = await assignedLesson(t, submitLesson(), { opensAt: hoursFromNow(-48), dueAt: hoursFromNow(-1), lateUntil: null });
    // The results page is the one place that may show answers after the close.
    expect((await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/results`)).status).toBe(200);
    const res = await submit(
      assigned.student.client,
      assigned.assignmentId,
      answerBody(KEYS.choice, RIGHT_CHOICE, { answeredAt: hoursFromNow(-3) }),
    );
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'assignment_closed', message: expect.stringContaining('after you opened your results') });
    expect(await rowsOf(assigned.assignmentId, assigned.student.id)).toHaveLength(0);
  });

  it('the per-student rate limit refuses with 429 and Retry-After, saving nothing', async () => {
    const limited = await createTestApp({ SUBMIT_RATE_PER_MINUTE: '2' });
    try {
      const assigned = await assignedLesson(limited, submitLesson({ choiceAttempts: 5 }));
      const send = () => submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE));
      expect((await send()).status).toBe(201);
      expect((await send()).status).toBe(201);
      const third = await send();
      expect(third.status).toBe(429);
      expect(third.body.error.message).toMatch(
        /^Too many answers in one minute \(at most 2\); this one was not saved\. Send it again in \d+ s\.$/,
      );
      expect(Number(third.headers['retry-after'])).toBeGreaterThan(0);
      expect(await limited.db('responses').where({ student_id: assigned.student.id })).toHaveLength(2);
    } finally {
      await deleteSchoolObjects(limited);
      await limited.close();
    }
  });
});

describe('grading with the stored values, invalid answers, predictions', () => {
  it('grades a numeric answer with the values stored for the student and records them with the parsed SI value', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    // The student's stored numbers win over any fresh draw: a = 5 cm, N = 20 turns, I = 1 A.
    // Hand-computed: B = μ0 N I / (2a) = 4π×10⁻⁷ × 20 × 1 / 0.10 = 2.513×10⁻⁴ T = 251.3 µT.
    await t.db('student_variables').insert({
      assignment_id: assigned.assignmentId,
      student_id: assigned.student.id,
      checkpoint_key: KEYS.numeric,
      values: JSON.stringify({ a: '5 cm', N: 20, I: '1 A' }),
    });
    const res = await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.numeric, { kind: 'numeric', text: '251 uT' }));
    expect(res.status).toBe(201);
    expect(res.body.grade.correct).toBe(true);
    const [row] = await rowsOf(assigned.assignmentId, assigned.student.id);
    expect(row.variables).toEqual({ a: '5 cm', N: 20, I: '1 A' });
    expect(row.parsed_si).toBeCloseTo(2.51e-4, 8);
    expect(row.raw_text).toBe('251 uT');
  });

  it('a variable missing from the stored values (a corrected version added it) is drawn and added; stored ones stay', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const where = { assignment_id: assigned.assignmentId, student_id: assigned.student.id, checkpoint_key: KEYS.numeric };
    await t.db('student_variables').insert({ ...where, values: JSON.stringify({ a: '5 cm' }) });
    const res = await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.numeric, { kind: 'numeric', text: '1 T' }));
    expect(res.status).toBe(201);
    const stored = (await t.db('student_variables').where(where).first()).values as Record<string, unknown>;
    expect(stored.a).toBe('5 cm');
    expect(Object.keys(stored).sort()).toEqual(['I', 'N', 'a']);
    expect((await rowsOf(assigned.assignmentId, assigned.student.id))[0].variables).toEqual(stored);
  });

  it('an answer the engine cannot read is graded and returned (invalid, attempt null) but not recorded and uses no attempt', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const res = await submit(
      assigned.student.client,
      assigned.assignmentId,
      answerBody(KEYS.numeric, { kind: 'numeric', text: '63 parsecs per fortnight' }),
    );
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ responseId: null, attempt: null, recordedAt: null });
    expect(res.body.grade).toMatchObject({ invalid: true, attemptsLeft: 3, hints: [], reveal: null });
    expect(await rowsOf(assigned.assignmentId, assigned.student.id)).toEqual([]);
    // Values were drawn on this first answer all the same.
    expect(await t.db('student_variables').where({ assignment_id: assigned.assignmentId, student_id: assigned.student.id })).toHaveLength(
      1,
    );
  });

  it('a prediction sent again at its reveal with an explanation is recorded as an explanation and uses no attempt', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const { client } = assigned.student;
    const predicted = { kind: 'prediction' as const, optionId: 'p1', text: null, explanation: null };
    expect((await submit(client, assigned.assignmentId, answerBody(KEYS.prediction, predicted))).status).toBe(201);
    const explained = await submit(
      client,
      assigned.assignmentId,
      answerBody(KEYS.prediction, { ...predicted, explanation: 'More current, more field.' }),
    );
    expect(explained.status).toBe(201);
    expect(explained.body.attempt).toBe(2);
    // A different prediction is a new attempt, and the one attempt is used.
    const changed = await submit(client, assigned.assignmentId, answerBody(KEYS.prediction, { ...predicted, optionId: 'p2' }));
    expect(changed.status).toBe(409);
    const rows = await rowsOf(assigned.assignmentId, assigned.student.id);
    expect(rows.map((r) => [r.attempt, r.is_explanation, r.raw_text])).toEqual([
      [1, false, 'Turn further'],
      [2, true, 'Turn further — because More current, more field.'],
    ]);
  });
});

describe('feedback and reveal policies in the reply', () => {
  it('feedback never: right and wrong look the same, no hints or reveal, and a right answer can still be changed', async () => {
    const assigned = await assignedLesson(t, submitLesson(), { feedback: 'never', reveal: 'never' });
    const { client } = assigned.student;
    const wrong = await submit(client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE));
    const right = await submit(client, assigned.assignmentId, answerBody(KEYS.choice, RIGHT_CHOICE));
    for (const reply of [wrong, right]) {
      expect(reply.status).toBe(201);
      expect(reply.body.feedbackHidden).toBe(true);
      expect(reply.body.grade).toMatchObject({ correct: null, score: 0, mistake: null, hints: [], reveal: null });
      expect(reply.body.grade.feedback).toMatch(/^Your answer is saved\. Your teacher has chosen not to show whether answers are right\./);
    }
    expect(right.body.grade.attemptsLeft).toBe(1);
    // The engine's grade is stored whole for later.
    const grades = await t.db('grades').where({ assignment_id: assigned.assignmentId }).orderBy('id');
    expect(grades.map((g) => g.correct)).toEqual([false, true]);
    expect((await submit(client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE))).status).toBe(201);
  });

  it('feedback after the due date with reveal after it: the last attempt reveals nothing while the lesson is open', async () => {
    const assigned = await assignedLesson(t, submitLesson({ choiceAttempts: 1 }), { feedback: 'after-due', reveal: 'after-due' });
    const res = await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE));
    expect(res.status).toBe(201);
    expect(res.body.feedbackHidden).toBe(true);
    expect(res.body.grade.reveal).toBeNull();
    expect(res.body.grade.feedback).toMatch(/after the lesson closes/);
  });

  it('feedback immediately with reveal never: right/wrong and hints, never the answer', async () => {
    const assigned = await assignedLesson(t, submitLesson({ choiceAttempts: 1 }), { reveal: 'never' });
    const res = await submit(assigned.student.client, assigned.assignmentId, answerBody(KEYS.choice, WRONG_CHOICE));
    expect(res.body.feedbackHidden).toBe(false);
    expect(res.body.grade).toMatchObject({ correct: false, attemptsLeft: 0, reveal: null });
  });
});

describe('completion', () => {
  it('is set once, when every required checkpoint has an answer and enough was watched', async () => {
    const assigned = await assignedLesson(t, submitLesson(), { completionWatchShare: 0.5 });
    const { client } = assigned.student;
    await submit(client, assigned.assignmentId, answerBody(KEYS.choice, RIGHT_CHOICE));
    await submit(
      client,
      assigned.assignmentId,
      answerBody(KEYS.prediction, { kind: 'prediction', optionId: 'p1', text: null, explanation: null }),
    );
    // The viewing API keeps watched_seconds; 6 of the 12 seconds are the half asked for.
    await t
      .db('student_progress')
      .where({ assignment_id: assigned.assignmentId, student_id: assigned.student.id })
      .update({ watched_seconds: 6 });
    const last = await submit(client, assigned.assignmentId, answerBody(KEYS.numeric, { kind: 'numeric', text: '1 T' }));
    expect(last.status).toBe(201);
    expect(last.body.completion).toMatchObject({ requiredAnswered: 3, requiredTotal: 3, watchedShare: 0.5, done: true });
    const progress = await t
      .db('student_progress')
      .where({ assignment_id: assigned.assignmentId, student_id: assigned.student.id })
      .first();
    expect(progress.completed_at).toBeInstanceOf(Date);
    expect(last.body.completion.completedAt).toBe(progress.completed_at.toISOString());
    const later = await submit(client, assigned.assignmentId, answerBody(KEYS.text, { kind: 'short-text', text: 'Biot Savart law' }));
    expect(later.body.completion.completedAt).toBe(progress.completed_at.toISOString());
  });

  it('the reply carries the server time', async () => {
    const assigned = await assignedLesson(t, submitLesson());
    const before = Date.now();
    const res = await submit(
      assigned.student.client,
      assigned.assignmentId,
      answerBody(KEYS.choice, RIGHT_CHOICE, { idempotencyKey: randomUUID() }),
    );
    expect(Date.parse(res.body.serverTime)).toBeGreaterThanOrEqual(before);
  });
});
