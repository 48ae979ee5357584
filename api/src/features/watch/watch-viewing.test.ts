import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ViewingResultDtoSchema, WatchViewDtoSchema, type LessonContent, type ViewingReport } from '@core/contracts';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { goodQuestion, type Member } from '../lessons/lessons.test-support';
import { assignedLesson, hoursFromNow, storeAnswer, type Assigned } from './watch.test-support';

const PUBLIC_URL = 'http://pinfield.test:8080';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ PUBLIC_URL });
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const QUESTION_KEY = 'viewquestion';

/** One required question on the 12-second test recording. */
function oneQuestion(): LessonContent {
  return {
    settings: { title: 'Needle near a coil (test)', description: '', tags: [], level: '', safetyNotes: '', minSpacingMs: 500 },
    chapters: [],
    checkpoints: [{ ...goodQuestion(1000), key: QUESTION_KEY }],
  };
}

const viewingPath = (id: string) => `/api/student/assignments/${id}/viewing`;
const beaconPath = (id: string) => `/api/student/assignments/${id}/viewing/beacon`;
const report = (intervals: [number, number][], positionMs = 0): ViewingReport => ({
  intervals: intervals.map(([startMs, endMs]) => ({ startMs, endMs })),
  positionMs,
});

async function send(student: Member, assignmentId: string, body: unknown) {
  return student.client.send('post', viewingPath(assignmentId), body);
}

async function progressOf(assigned: Assigned) {
  return t.db('student_progress').where({ assignment_id: assigned.assignmentId, student_id: assigned.student.id }).first();
}

describe('POST /api/student/assignments/:assignmentId/viewing', () => {
  it('401 signed out, 403 without the CSRF header, 404 for a student not assigned', async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const anonymous = new Client(t);
    await anonymous.refreshCsrf();
    expect((await anonymous.send('post', viewingPath(assigned.assignmentId), report([]))).status).toBe(401);
    const noHeader = await assigned.student.client.agent.post(viewingPath(assigned.assignmentId)).send(report([]));
    expect(noHeader.status).toBe(403);
    expect(noHeader.body.error.code).toBe('csrf_invalid');
    const other = await assignedLesson(t, oneQuestion());
    const res = await send(other.student, assigned.assignmentId, report([[0, 1000]]));
    expect(res.status).toBe(404);
  });

  it('400 with a sentence for each bad interval or position; nothing is stored', async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const backwards = await send(assigned.student, assigned.assignmentId, report([[3000, 2000]]));
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.details).toEqual([{ path: 'intervals.0', message: 'An interval ends after it starts.' }]);
    const negative = await send(assigned.student, assigned.assignmentId, report([[-5, 2000]]));
    expect(negative.status).toBe(400);
    expect(negative.body.error.details[0].path).toBe('intervals.0.startMs');

    const pastEnd = await send(
      assigned.student,
      assigned.assignmentId,
      report(
        [
          [0, 1000],
          [11_000, 13_500],
        ],
        14_000,
      ),
    );
    expect(pastEnd.status).toBe(400);
    expect(pastEnd.body.error).toEqual({
      code: 'invalid_viewing',
      message: "Interval 2 ends at 13.5 s, after the recording's end (12.0 s). The position 14.0 s is after the recording's end (12.0 s).",
      details: [
        { path: 'intervals', message: "Interval 2 ends at 13.5 s, after the recording's end (12.0 s)." },
        { path: 'positionMs', message: "The position 14.0 s is after the recording's end (12.0 s)." },
      ],
    });
    expect(await progressOf(assigned)).toBeUndefined();
  });

  it('merges overlapping, repeated, seeked and split reports second by second (hand-computed)', async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const merge = async (intervals: [number, number][], positionMs: number) => {
      const res = await send(assigned.student, assigned.assignmentId, report(intervals, positionMs));
      expect(res.status).toBe(200);
      expect(res.headers['cache-control']).toBe('private, no-store');
      return ViewingResultDtoSchema.parse(res.body).completion;
    };
    // [0, 3 s) holds the midpoints of seconds 0, 1 and 2.
    expect((await merge([[0, 3000]], 3000)).watchedShare).toBeCloseTo(3 / 12);
    // Overlapping [2 s, 5.2 s): seconds 2, 3, 4 (5.5 s is outside) → 0–4.
    expect((await merge([[2000, 5200]], 5200)).watchedShare).toBeCloseTo(5 / 12);
    // Watching the start again adds nothing.
    expect((await merge([[0, 3000]], 3000)).watchedShare).toBeCloseTo(5 / 12);
    // A seek to 9 s, then to the end: seconds 9, 10, 11; a report split at 5.6 s counts second 5 once.
    await merge([[9000, 12_000]], 12_000);
    const split = await merge(
      [
        [5200, 5600],
        [5600, 6000],
      ],
      6000,
    );
    expect(split.watchedShare).toBeCloseTo(9 / 12);

    const row = await progressOf(assigned);
    // Seconds 0–5 and 9–11: bits 11111100 01110000.
    expect(Buffer.from(row.coverage).toString('hex')).toBe('fc70');
    expect(row.watched_seconds).toBe(9);
    expect(row.position_ms).toBe(6000);
    expect(row.viewing_updated_at).toBeInstanceOf(Date);
    expect(row.completed_at).toBeNull();
  });

  it('offers to resume where the student stopped; a position at the end starts over; a small overshoot is cut to the end', async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const resume = async () =>
      WatchViewDtoSchema.parse((await assigned.student.client.get(`/api/student/assignments/${assigned.assignmentId}/watch`)).body).progress
        .resumeMs;
    await send(assigned.student, assigned.assignmentId, report([[0, 7400]], 7400));
    expect(await resume()).toBe(7400);
    expect((await send(assigned.student, assigned.assignmentId, report([[7400, 12_600]], 12_600))).status).toBe(200);
    expect((await progressOf(assigned)).position_ms).toBe(12_000);
    expect(await resume()).toBe(0);
  });

  it('sets completed_at once, when every required answer is recorded and the share is watched', async () => {
    const assigned = await assignedLesson(t, oneQuestion(), { completionWatchShare: 0.5 });
    const watched = await send(assigned.student, assigned.assignmentId, report([[0, 6000]], 6000));
    expect(watched.body.completion).toMatchObject({
      watchedShare: 0.5,
      requiredAnswered: 0,
      requiredTotal: 1,
      done: false,
      completedAt: null,
    });

    const question = assigned.content.checkpoints[0]!;
    // A wrong answer is still a recorded answer: the rule asks for answers, not right ones.
    const optionId = question.kind === 'multiple-choice' ? question.options[1]!.id : '';
    await storeAnswer(t, assigned, assigned.student, {
      key: QUESTION_KEY,
      answer: { kind: 'multiple-choice', optionIds: [optionId] },
      attempt: 1,
    });
    const done = await send(assigned.student, assigned.assignmentId, report([[6000, 6500]], 6500));
    expect(done.body.completion).toMatchObject({ requiredAnswered: 1, done: true, completedAt: expect.any(String) });
    const first = (await progressOf(assigned)).completed_at as Date;
    expect(done.body.completion.completedAt).toBe(first.toISOString());

    const later = await send(assigned.student, assigned.assignmentId, report([[7000, 9000]], 9000));
    expect(later.body.completion.completedAt).toBe(first.toISOString());
    expect((await progressOf(assigned)).completed_at).toEqual(first);
  });

  it('two tabs reporting at once lose no second (the reports queue on the progress row)', async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const results = await Promise.all(
      Array.from({ length: 12 }, (_, s) => send(assigned.student, assigned.assignmentId, report([[s * 1000, s * 1000 + 1000]], s * 1000))),
    );
    expect(results.map((r) => r.status)).toEqual(Array(12).fill(200));
    const row = await progressOf(assigned);
    expect(row.watched_seconds).toBe(12);
    expect(Buffer.from(row.coverage).toString('hex')).toBe('fff0');
  });

  it('409 before the opening; taken for a day after the close, then refused', async () => {
    const early = await assignedLesson(t, oneQuestion(), { opensAt: hoursFromNow(2), dueAt: hoursFromNow(20) });
    const refused = await send(early.student, early.assignmentId, report([[0, 1000]]));
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('assignment_not_open');

    const justClosed = await assignedLesson(t, oneQuestion(), { opensAt: hoursFromNow(-20), dueAt: hoursFromNow(-1) });
    expect((await send(justClosed.student, justClosed.assignmentId, report([[0, 1000]]))).status).toBe(200);
    const longClosed = await assignedLesson(t, oneQuestion(), { opensAt: hoursFromNow(-80), dueAt: hoursFromNow(-30) });
    const gone = await send(longClosed.student, longClosed.assignmentId, report([[0, 1000]]));
    expect(gone.status).toBe(409);
    expect(gone.body.error.code).toBe('assignment_closed');
  });
});

describe('POST /api/student/assignments/:assignmentId/viewing/beacon', () => {
  const ORIGIN = new URL(PUBLIC_URL).origin;

  async function beacon(student: Member, assignmentId: string, body: string, headers: Record<string, string> = { Origin: ORIGIN }) {
    const req = student.client.agent.post(beaconPath(assignmentId)).set('Content-Type', 'text/plain;charset=UTF-8');
    for (const [name, value] of Object.entries(headers)) req.set(name, value);
    return req.send(body);
  }

  it("takes a text/plain JSON report with the CSRF token in the body from the app's own origin: 204, merged", async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const csrfToken = await assigned.student.client.refreshCsrf();
    const res = await beacon(assigned.student, assigned.assignmentId, JSON.stringify({ ...report([[0, 4000]], 4000), csrfToken }));
    expect(res.status).toBe(204);
    const row = await progressOf(assigned);
    expect(row.watched_seconds).toBe(4);
    expect(row.position_ms).toBe(4000);
  });

  it('403 for a missing or wrong token in the body (a header token does not count here)', async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const csrfToken = await assigned.student.client.refreshCsrf();
    const missing = await beacon(assigned.student, assigned.assignmentId, JSON.stringify(report([[0, 4000]], 4000)), {
      Origin: ORIGIN,
      'X-CSRF-Token': csrfToken,
    });
    expect(missing.status).toBe(403);
    expect(missing.body.error.code).toBe('csrf_invalid');
    const wrong = await beacon(
      assigned.student,
      assigned.assignmentId,
      JSON.stringify({ ...report([[0, 4000]]), csrfToken: 'not-the-token' }),
    );
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.code).toBe('csrf_invalid');
    // The ordinary route still wants the header: a body token is not read there.
    const plain = await assigned.student.client.agent.post(viewingPath(assigned.assignmentId)).send({ ...report([[0, 4000]]), csrfToken });
    expect(plain.status).toBe(403);
    expect(await progressOf(assigned)).toBeUndefined();
  });

  it('403 from another origin or without one, even with the right token', async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const csrfToken = await assigned.student.client.refreshCsrf();
    const body = JSON.stringify({ ...report([[0, 4000]]), csrfToken });
    const foreign = await beacon(assigned.student, assigned.assignmentId, body, { Origin: 'http://elsewhere.test' });
    expect(foreign.status).toBe(403);
    expect(foreign.body.error).toEqual({
      code: 'origin_refused',
      message: `A viewing report from http://elsewhere.test is refused: only pages of ${ORIGIN} may send one.`,
    });
    const none = await beacon(assigned.student, assigned.assignmentId, body, {});
    expect(none.status).toBe(403);
    expect(none.body.error.message).toBe('A viewing report sent without an Origin header is refused.');
    expect(await progressOf(assigned)).toBeUndefined();
  });

  it('400 for a body that is not JSON, and for bad intervals with their sentences', async () => {
    const assigned = await assignedLesson(t, oneQuestion());
    const csrfToken = await assigned.student.client.refreshCsrf();
    const garbled = await beacon(assigned.student, assigned.assignmentId, '{"intervals": [');
    expect(garbled.status).toBe(400);
    expect(garbled.body.error).toEqual({ code: 'malformed_json', message: 'The viewing report is not valid JSON.' });
    const pastEnd = await beacon(assigned.student, assigned.assignmentId, JSON.stringify({ ...report([[0, 20_000]]), csrfToken }));
    expect(pastEnd.status).toBe(400);
    expect(pastEnd.body.error.message).toBe("Interval 1 ends at 20.0 s, after the recording's end (12.0 s).");
  });
});
