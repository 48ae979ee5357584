import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { StudentHomeDtoSchema, StudentResultsDtoSchema, WatchViewDtoSchema, type CheckpointAnswer } from '@core/contracts';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { ALLOWED_KEYS, CANARY, CANARY_KEYS, canariesIn, canaryContent } from './canary-lesson.test-support';
import { addCaption, assignedLesson, classmate, storeAnswer, type Assigned, type AssignmentSettings } from './watch.test-support';
import type { Member } from '../lessons/lessons.test-support';
import { answerBody, submit } from '../responses/responses.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const base = (id: string) => `/api/student/assignments/${id}`;

/** Every body the watch page and the student's home load, as text, by what it is. */
async function everyBodyLoaded(student: Member, assignmentId: string): Promise<Record<string, string>> {
  const bodies: Record<string, string> = {};
  const home = await student.client.get('/api/student/assignments');
  expect(home.status).toBe(200);
  bodies.home = home.text;
  const watch = await student.client.get(`${base(assignmentId)}/watch`);
  expect(watch.status).toBe(200);
  bodies.watch = watch.text;
  const view = WatchViewDtoSchema.parse(watch.body);
  const tracks = [view.playback.thumbnailsUrl, ...view.playback.captions.map((c) => c.url)].filter((u): u is string => u !== null);
  expect(tracks.length).toBeGreaterThanOrEqual(2);
  for (const url of tracks) {
    const track = await student.client.get(url);
    expect(track.status, url).toBe(200);
    expect(track.headers['content-type']).toBe('text/vtt; charset=utf-8');
    bodies[url] = track.text;
  }
  const results = await student.client.get(`${base(assignmentId)}/results`);
  expect(results.status).toBe(200);
  bodies.results = results.text;
  return bodies;
}

function leaks(bodies: Record<string, string>): Record<string, string[]> {
  return Object.fromEntries(
    Object.entries(bodies)
      .map(([name, body]) => [name, canariesIn(body)] as const)
      .filter(([, found]) => found.length > 0),
  );
}

/** A wrong (but readable) answer at every answerable canary checkpoint. */
const WRONG: [key: string, answer: CheckpointAnswer][] = [
  [CANARY_KEYS.choice, { kind: 'multiple-choice', optionIds: ['wrong'] }],
  [CANARY_KEYS.numeric, { kind: 'numeric', text: '1 uT' }],
  [CANARY_KEYS.fixed, { kind: 'numeric', text: '12 uT' }],
  [CANARY_KEYS.short, { kind: 'short-text', text: 'the left-hand rule' }],
  [CANARY_KEYS.signSet, { kind: 'sign', choice: 'out' }],
  [CANARY_KEYS.signGeo, { kind: 'sign', choice: 'into' }],
  [CANARY_KEYS.predChoices, { kind: 'prediction', optionId: 'same', text: null, explanation: null }],
  [CANARY_KEYS.predText, { kind: 'prediction', optionId: null, text: 'It will stay put.', explanation: null }],
];

async function answerAllWrong(assigned: Assigned, student: Member, attempt: number): Promise<void> {
  for (const [key, answer] of WRONG) await storeAnswer(t, assigned, student, { key, answer, attempt });
}

async function canaryAssignment(settings: Partial<AssignmentSettings> = {}) {
  const assigned = await assignedLesson(t, canaryContent(), settings);
  await addCaption(t, assigned.recordingId, 'en', 'English');
  await addCaption(t, assigned.recordingId, 'fr', 'Français');
  return assigned;
}

describe('the leak test: no hidden field reaches a student before they answer', () => {
  it('plants a canary in every hidden field, and none is in the home, the watch view, the tracks or the results', async () => {
    const assigned = await canaryAssignment();
    const bodies = await everyBodyLoaded(assigned.student, assigned.assignmentId);
    expect(leaks(bodies)).toEqual({});
  });

  it('every checkpoint of the watch view carries only the allow-listed fields of its kind, every kind present', async () => {
    const assigned = await canaryAssignment();
    const res = await assigned.student.client.get(`${base(assigned.assignmentId)}/watch`);
    const view = WatchViewDtoSchema.parse(res.body);
    expect(new Set(view.view.checkpoints.map((c) => c.kind))).toEqual(new Set(Object.keys(ALLOWED_KEYS)));
    for (const checkpoint of res.body.view.checkpoints as Record<string, unknown>[]) {
      expect(Object.keys(checkpoint).sort(), String(checkpoint.key)).toEqual(
        [...ALLOWED_KEYS[checkpoint.kind as keyof typeof ALLOWED_KEYS]].sort(),
      );
      for (const option of (checkpoint.options as Record<string, unknown>[] | null | undefined) ?? []) {
        expect(Object.keys(option).sort()).toEqual(['id', 'text']);
      }
    }
    // Names of answer-key fields appear nowhere in the checkpoints (nested ones included); `feedback` and
    // `reveal` are also the assignment's policy names, so the assignment's facts are left out of this scan.
    const checkpointsText = JSON.stringify({ view: res.body.view, book: res.body.book });
    for (const field of [
      'correct',
      'correctOptionId',
      'expected',
      'accepted',
      'distractors',
      'hints',
      'explanation',
      'feedback',
      'revealText',
      'variables',
      'absoluteTolerance',
      'relativeTolerancePercent',
      'sigFigs',
      'answer',
      'geometry',
      'reveal',
    ]) {
      expect(checkpointsText, field).not.toContain(`"${field}"`);
    }
    // The set sign answer ("into") is only among the choices; the geometry's derived answer is not stated.
    const signs = view.view.checkpoints.filter((c) => c.kind === 'sign');
    expect(signs.map((c) => c.choices)).toEqual([
      ['into', 'out'],
      ['into', 'out'],
    ]);
  });

  it("a classmate's stored answers and grades never reach another student", async () => {
    const assigned = await canaryAssignment();
    const other = await classmate(t, assigned);
    expect((await other.client.get(`${base(assigned.assignmentId)}/watch`)).status).toBe(200);
    for (const attempt of [1, 2, 3]) await answerAllWrong(assigned, other, attempt);
    expect(leaks(await everyBodyLoaded(assigned.student, assigned.assignmentId))).toEqual({});
  });

  it('feedback and reveal "never": wrong answers until no attempts are left still show no canary', async () => {
    const assigned = await canaryAssignment({ feedback: 'never', reveal: 'never' });
    expect((await assigned.student.client.get(`${base(assigned.assignmentId)}/watch`)).status).toBe(200);
    for (const attempt of [1, 2, 3]) await answerAllWrong(assigned, assigned.student, attempt);
    const bodies = await everyBodyLoaded(assigned.student, assigned.assignmentId);
    expect(leaks(bodies)).toEqual({});
    const view = WatchViewDtoSchema.parse(JSON.parse(bodies.watch!));
    expect(view.book[CANARY_KEYS.choice]).toMatchObject({ used: 3, grade: { correct: null, score: 0, hints: [], reveal: null } });
  });

  it('feedback right away, answers after the last attempt: one miss shows its feedback and first hint, nothing else', async () => {
    const assigned = await canaryAssignment({ feedback: 'immediately', reveal: 'after-last-attempt' });
    expect((await assigned.student.client.get(`${base(assigned.assignmentId)}/watch`)).status).toBe(200);
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.choice, answer: WRONG[0]![1], attempt: 1 });
    const bodies = await everyBodyLoaded(assigned.student, assigned.assignmentId);
    // The chosen option's feedback and the first hint, in the watch view's book; the results show the feedback.
    expect(leaks(bodies)).toEqual({ watch: ['mcHint1', 'mcFeedbackWrong'], results: ['mcFeedbackWrong'] });

    // The last attempt: now the answer and explanation may be shown, still no other option's feedback.
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.choice, answer: WRONG[0]![1], attempt: 2 });
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.choice, answer: WRONG[0]![1], attempt: 3 });
    const after = await everyBodyLoaded(assigned.student, assigned.assignmentId);
    expect(leaks(after)).toEqual({
      watch: ['mcHint1', 'mcHint2', 'mcExplanation', 'mcFeedbackWrong'],
      results: ['mcExplanation', 'mcFeedbackWrong'],
    });
  });

  it('answers "after the due date": used-up attempts show no answer or explanation before the close', async () => {
    const assigned = await canaryAssignment({ feedback: 'immediately', reveal: 'after-due' });
    expect((await assigned.student.client.get(`${base(assigned.assignmentId)}/watch`)).status).toBe(200);
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.fixed, answer: { kind: 'numeric', text: '12 uT' }, attempt: 1 });
    await storeAnswer(t, assigned, assigned.student, { key: CANARY_KEYS.fixed, answer: { kind: 'numeric', text: '12 uT' }, attempt: 2 });
    const bodies = await everyBodyLoaded(assigned.student, assigned.assignmentId);
    expect(leaks(bodies)).toEqual({ watch: ['fixedHint'] });
    const results = StudentResultsDtoSchema.parse(JSON.parse(bodies.results!));
    expect(results.checkpoints.find((c) => c.key === CANARY_KEYS.fixed)).toMatchObject({ reveal: null, grade: { correct: false } });
  });

  it('the home is the same with and without answers: it never carries a grade text', async () => {
    const assigned = await canaryAssignment();
    await answerAllWrong(assigned, assigned.student, 1);
    const home = await assigned.student.client.get('/api/student/assignments');
    StudentHomeDtoSchema.parse(home.body);
    expect(canariesIn(home.text)).toEqual([]);
  });

  it('names every canary it plants (the check itself can fail)', () => {
    const planted = JSON.stringify(canaryContent());
    expect(canariesIn(planted).sort()).toEqual(Object.keys(CANARY).sort());
  });
});

describe('graded replies carry hidden fields only as the policies allow', () => {
  async function opened(settings: Partial<AssignmentSettings>) {
    const assigned = await canaryAssignment(settings);
    expect((await assigned.student.client.get(`${base(assigned.assignmentId)}/watch`)).status).toBe(200);
    return assigned;
  }

  async function reply(assigned: Assigned, key: string, answer: CheckpointAnswer) {
    const res = await submit(assigned.student.client, assigned.assignmentId, answerBody(key, answer));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res;
  }

  const RIGHT_CHOICE: CheckpointAnswer = { kind: 'multiple-choice', optionIds: ['right'] };
  const WRONG_CHOICE: CheckpointAnswer = { kind: 'multiple-choice', optionIds: ['wrong'] };

  it('feedback right away: a miss shows its own feedback and one hint; a right answer its feedback and the answer', async () => {
    const assigned = await opened({ feedback: 'immediately', reveal: 'after-last-attempt' });
    expect(canariesIn((await reply(assigned, CANARY_KEYS.choice, WRONG_CHOICE)).text)).toEqual(['mcHint1', 'mcFeedbackWrong']);
    // The hint unlocked by the miss stays listed.
    expect(canariesIn((await reply(assigned, CANARY_KEYS.choice, RIGHT_CHOICE)).text)).toEqual([
      'mcHint1',
      'mcExplanation',
      'mcFeedbackRight',
    ]);
    // Every other kind, answered wrong once: at most its hint, never its answer key.
    for (const [key, answer] of WRONG.slice(1)) {
      const found = canariesIn((await reply(assigned, key, answer)).text);
      const checkpoint = canaryContent().checkpoints.find((c) => c.key === key)!;
      const finished = 'attempts' in checkpoint && checkpoint.attempts === 1;
      for (const name of found) {
        // One attempt only (a prediction): the last attempt reveals the answer and explanation.
        expect(name.endsWith('Hint') || (finished && /Reveal|Explanation$/.test(name)), `${key}: ${name}`).toBe(true);
      }
    }
    // The watch view's book shows the same grade the reply did.
    const view = WatchViewDtoSchema.parse((await assigned.student.client.get(`${base(assigned.assignmentId)}/watch`)).body);
    expect(view.book[CANARY_KEYS.choice]).toMatchObject({
      used: 2,
      answer: RIGHT_CHOICE,
      grade: { correct: true, reveal: { explanation: CANARY.mcExplanation } },
    });
  });

  it('feedback "never": no reply says anything hidden, not even for a right answer on the last attempt', async () => {
    const assigned = await opened({ feedback: 'never', reveal: 'never' });
    for (const answer of [WRONG_CHOICE, WRONG_CHOICE, RIGHT_CHOICE]) {
      const res = await reply(assigned, CANARY_KEYS.choice, answer);
      expect(canariesIn(res.text)).toEqual([]);
      expect(res.body).toMatchObject({ feedbackHidden: true, grade: { correct: null, score: 0, hints: [], reveal: null } });
    }
    for (const [key, answer] of WRONG.slice(1)) expect(canariesIn((await reply(assigned, key, answer)).text), key).toEqual([]);
  });

  it('feedback and answers after the due date: a right answer says only that it is saved', async () => {
    const assigned = await opened({ feedback: 'after-due', reveal: 'after-due' });
    const res = await reply(assigned, CANARY_KEYS.choice, RIGHT_CHOICE);
    expect(canariesIn(res.text)).toEqual([]);
    expect(res.body.grade.feedback).toMatch(/^Your answer is saved\. You will see whether it was right after the lesson closes\./);
    expect(leaks(await everyBodyLoaded(assigned.student, assigned.assignmentId))).toEqual({});
  });

  it('answers "never" with feedback right away: the right option\'s feedback, never the explanation', async () => {
    const assigned = await opened({ feedback: 'immediately', reveal: 'never' });
    expect(canariesIn((await reply(assigned, CANARY_KEYS.choice, RIGHT_CHOICE)).text)).toEqual(['mcFeedbackRight']);
    const prediction: CheckpointAnswer = { kind: 'prediction', optionId: 'same', text: null, explanation: null };
    // Its one attempt missed: the hint it unlocks, but neither what happened nor the explanation.
    expect(canariesIn((await reply(assigned, CANARY_KEYS.predChoices, prediction)).text)).toEqual(['predChoicesHint']);
    const bodies = await everyBodyLoaded(assigned.student, assigned.assignmentId);
    expect(leaks(bodies)).toEqual({ watch: ['mcFeedbackRight', 'predChoicesHint'], results: ['mcFeedbackRight'] });
  });

  it("a prediction's explanation at its reveal is recorded beside it and uses no attempt", async () => {
    const assigned = await opened({ feedback: 'immediately', reveal: 'after-last-attempt' });
    const prediction: CheckpointAnswer = { kind: 'prediction', optionId: 'same', text: null, explanation: null };
    await reply(assigned, CANARY_KEYS.predChoices, prediction);
    const explained: CheckpointAnswer = { ...prediction, explanation: 'The needle was already at its limit.' };
    await reply(assigned, CANARY_KEYS.predChoices, explained);
    const view = WatchViewDtoSchema.parse((await assigned.student.client.get(`${base(assigned.assignmentId)}/watch`)).body);
    expect(view.book[CANARY_KEYS.predChoices]).toMatchObject({ used: 1, answer: explained });
    const results = StudentResultsDtoSchema.parse((await assigned.student.client.get(`${base(assigned.assignmentId)}/results`)).body);
    expect(results.checkpoints.find((c) => c.key === CANARY_KEYS.predChoices)?.attempts.map((a) => a.answerText)).toEqual([
      'Stay where it is',
      'Stay where it is — because The needle was already at its limit.',
    ]);
  });
});
