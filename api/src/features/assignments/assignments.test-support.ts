// Test helpers (imported by *.test.ts only): published lessons, assignments and answers made through the API.
import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import type { AssignmentDto, Checkpoint, CheckpointAnswer, LessonContent, LessonDto, ResponseResultDto } from '@core/contracts';
import { instantToLocal } from '@core/assignments';
import type { VariableValues } from '@core/physics/units/types';
import { multipleChoice } from '@core/lessons/fixtures.test-support';
import type { Client, TestApp } from '../../../test/test-app';
import { createLesson, readyRecording, saveDraft, type Member } from '../lessons/lessons.test-support';

/** The zone `buildSchool` gives every test school. */
export const TEST_ZONE = 'Europe/London';
const DAY_MS = 24 * 60 * 60 * 1000;

/** A wall-clock time in the test school's zone, `days` from now (negative: in the past). */
export const schoolTime = (days: number) => instantToLocal(new Date(Date.now() + days * DAY_MS), TEST_ZONE);

/** Publishes the stored draft (at `revision`) and fails loudly if refused. */
export async function publish(client: Client, lessonId: string, revision: number): Promise<number> {
  const res = await client.send('post', `/api/lessons/${lessonId}/publish`, { revision, note: '' });
  if (res.status !== 201) throw new Error(`publishing failed: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { number: number }).number;
}

export interface PublishedLesson {
  lesson: LessonDto;
  content: LessonContent;
  /** The draft's revision after the last save. */
  revision: number;
}

/** A lesson of the owner's on a fresh 12-second recording, with these checkpoints published as version 1. */
export async function publishedLesson(
  t: TestApp,
  owner: Member,
  checkpoints: Checkpoint[],
  title = 'Field of a flat coil',
): Promise<PublishedLesson> {
  const recording = await readyRecording(t, owner);
  const lesson = await createLesson(owner.client, recording.id, { title });
  const content: LessonContent = { ...lesson.draft, checkpoints };
  const saved = await saveDraft(owner.client, lesson.id, 0, content);
  if (saved.problems.length > 0) throw new Error(`the test lesson has problems: ${JSON.stringify(saved.problems)}`);
  await publish(owner.client, lesson.id, saved.revision);
  return { lesson, content, revision: saved.revision };
}

/** Saves new checkpoints into the lesson's draft and publishes them as the next version. */
export async function publishNext(owner: Member, published: PublishedLesson, checkpoints: Checkpoint[]): Promise<PublishedLesson> {
  const content: LessonContent = { ...published.content, checkpoints };
  const saved = await saveDraft(owner.client, published.lesson.id, published.revision, content);
  if (saved.problems.length > 0) throw new Error(`the corrected lesson has problems: ${JSON.stringify(saved.problems)}`);
  await publish(owner.client, published.lesson.id, saved.revision);
  return { lesson: published.lesson, content, revision: saved.revision };
}

/** A request body for POST /api/assignments: open since yesterday, due in a week, feedback at once. */
export function assignmentBody(lessonId: string, classIds: string[], overrides: Record<string, unknown> = {}) {
  return {
    lessonId,
    versionNumber: 1,
    classIds,
    opensAt: schoolTime(-1),
    dueAt: schoolTime(7),
    lateUntil: null,
    feedback: 'immediately',
    reveal: 'after-last-attempt',
    completionWatchShare: 0.9,
    ...overrides,
  };
}

/** Assigns through the API and fails loudly if refused. */
export async function assign(client: Client, body: ReturnType<typeof assignmentBody>): Promise<AssignmentDto[]> {
  const res = await client.send('post', '/api/assignments', body);
  if (res.status !== 201) throw new Error(`assigning failed: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { assignments: AssignmentDto[] }).assignments;
}

/** A multiple-choice answer picking the options with these texts. */
export function choose(checkpoint: Checkpoint, ...texts: string[]): CheckpointAnswer {
  if (checkpoint.kind !== 'multiple-choice') throw new Error('choose() is for multiple-choice questions');
  const optionIds = texts.map((text) => {
    const option = checkpoint.options.find((o) => o.text === text);
    if (!option) throw new Error(`no option “${text}”`);
    return option.id;
  });
  return { kind: 'multiple-choice', optionIds };
}

/** Answers through the real submit endpoint as a signed-in student and fails loudly unless it is recorded (201). */
export async function submitAnswer(
  student: Client,
  assignmentId: string,
  checkpointKey: string,
  answer: CheckpointAnswer,
): Promise<ResponseResultDto> {
  const res = await student.send('post', `/api/student/assignments/${assignmentId}/responses`, {
    idempotencyKey: randomUUID(),
    checkpointKey,
    answer,
    answeredAt: new Date().toISOString(),
  });
  if (res.status !== 201) throw new Error(`submitting failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as ResponseResultDto;
}

/** Gives a student chosen values at a numeric checkpoint before their first view draws any (the draw keeps stored values). */
export async function storeValues(
  db: Knex,
  assignmentId: string,
  studentId: string,
  checkpointKey: string,
  values: VariableValues,
): Promise<void> {
  await db('student_variables').insert({
    assignment_id: assignmentId,
    student_id: studentId,
    checkpoint_key: checkpointKey,
    values: JSON.stringify(values),
  });
}

/** A question published with a slip (the wrong option marked right), for the move tests. */
export const SLIPPED_NEEDLE = multipleChoice({
  atMs: 2_000,
  label: 'Needle direction',
  options: [
    { id: 'a', text: 'Clockwise', correct: true, feedback: '' },
    { id: 'b', text: 'Anticlockwise', correct: false, feedback: '' },
  ],
  shuffle: false,
});

/** The same question corrected in the next version (same key). */
export const FIXED_NEEDLE: Checkpoint = {
  ...SLIPPED_NEEDLE,
  options: [
    { id: 'a', text: 'Clockwise', correct: false, feedback: '' },
    { id: 'b', text: 'Anticlockwise', correct: true, feedback: 'Yes: seen from above, the current circulates anticlockwise.' },
  ],
};
