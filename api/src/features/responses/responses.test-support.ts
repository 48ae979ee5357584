// Test helpers (imported by *.test.ts only): a small published lesson and answers sent through the API.
import { randomUUID } from 'node:crypto';
import type { CheckpointAnswer, LessonContent } from '@core/contracts';
import { lesson, multipleChoice, note, numeric, prediction, shortText } from '@core/lessons/fixtures.test-support';
import type { Client, TestApp } from '../../../test/test-app';

export const KEYS = {
  choice: 'mckey00001',
  numeric: 'numkey0001',
  text: 'stkey00001',
  prediction: 'prkey00001',
  note: 'ntkey00001',
} as const;

/** Answerable checkpoints of four kinds and a note, inside the 12-second test recording. */
export function submitLesson(over: { choiceAttempts?: number } = {}): LessonContent {
  return lesson(
    [
      multipleChoice({ key: KEYS.choice, atMs: 2_000, attempts: over.choiceAttempts ?? 3, shuffle: false }),
      numeric({ key: KEYS.numeric, atMs: 4_000 }),
      shortText({ key: KEYS.text, atMs: 6_000, required: false }),
      prediction({ key: KEYS.prediction, atMs: 8_000, revealAtMs: 10_000 }),
      note({ key: KEYS.note, atMs: 11_000 }),
    ],
    { chapters: [] },
  );
}

export const RIGHT_CHOICE: CheckpointAnswer = { kind: 'multiple-choice', optionIds: ['a'] };
export const WRONG_CHOICE: CheckpointAnswer = { kind: 'multiple-choice', optionIds: ['b'] };

export const responsesPath = (assignmentId: string) => `/api/student/assignments/${assignmentId}/responses`;

/** One submission body with a fresh key, answered now unless told otherwise. */
export function answerBody(checkpointKey: string, answer: CheckpointAnswer, over: { idempotencyKey?: string; answeredAt?: Date } = {}) {
  return {
    idempotencyKey: over.idempotencyKey ?? randomUUID(),
    checkpointKey,
    answer,
    answeredAt: (over.answeredAt ?? new Date()).toISOString(),
  };
}

export function submit(client: Client, assignmentId: string, body: ReturnType<typeof answerBody>) {
  return client.send('post', responsesPath(assignmentId), body);
}

/** The test database's URL, from the Knex instance's connection settings (for a second pool on it). */
export function databaseUrl(t: TestApp): string {
  const c = t.db.client.config.connection as { host: string; port: number; user: string; password: string; database: string };
  return `postgres://${encodeURIComponent(c.user)}:${encodeURIComponent(c.password)}@${c.host}:${c.port}/${c.database}`;
}
