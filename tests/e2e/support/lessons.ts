import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';
import { expect } from 'vitest';
import type { Page } from 'playwright-core';
import type { AssignmentCreatedDto, AssignmentDto, FeedbackPolicy, LessonContent, LessonDto, RevealPolicy } from '@core/contracts';
import { DEMO_SCHOOL } from '../../../api/src/seed/demo-roster';
import { apiAs, readyRecordingId } from './api';

/**
 * Lessons and assignments set up through the real API as a signed-in teacher, for the tests of what
 * a student does with them (the studio and the assign form have their own browser tests).
 */

export interface RecordingFacts {
  durationMs: number;
}

export interface PublishedLesson {
  lessonId: string;
  versionNumber: number;
  content: LessonContent;
}

/** Saves `content` whole as the lesson's draft (no publish problems allowed) and publishes it. */
async function saveAndPublish(page: Page, lessonId: string, revision: number, content: LessonContent, note: string): Promise<number> {
  const saved = await apiAs<{ revision: number; problems: { path: string; message: string }[] }>(
    page,
    'PUT',
    `/lessons/${lessonId}/draft`,
    {
      revision,
      content,
    },
  );
  expect(saved.status).toBe(200);
  expect(saved.body.problems).toEqual([]);
  const published = await apiAs<{ number: number }>(page, 'POST', `/lessons/${lessonId}/publish`, { revision: saved.body.revision, note });
  expect(published.status).toBe(201);
  return published.body.number;
}

/** A new lesson on a demo recording, built from the recording's real length, published as version 1. */
export async function publishLesson(
  page: Page,
  recordingTitle: string,
  build: (recording: RecordingFacts) => LessonContent,
): Promise<PublishedLesson> {
  const recordingId = await readyRecordingId(page, recordingTitle);
  const created = await apiAs<LessonDto>(page, 'POST', '/lessons', {
    recordingId,
    title: 'E2E lesson (being set up)',
    description: '',
    tags: [],
    level: '',
    safetyNotes: '',
  });
  expect(created.status).toBe(201);
  const durationMs = created.body.recording.durationMs;
  if (!durationMs) throw new Error(`The demo recording “${recordingTitle}” has no duration yet.`);
  const content = build({ durationMs });
  const versionNumber = await saveAndPublish(page, created.body.id, created.body.revision, content, 'First version');
  return { lessonId: created.body.id, versionNumber, content };
}

/** Publishes `content` as the lesson's next version (a teacher's correction). */
export async function publishCorrection(page: Page, lessonId: string, content: LessonContent, note: string): Promise<number> {
  const lesson = await apiAs<LessonDto>(page, 'GET', `/lessons/${lessonId}`);
  expect(lesson.status).toBe(200);
  return saveAndPublish(page, lessonId, lesson.body.revision, content, note);
}

/** A wall-clock time in the demo school's zone, `offsetMs` from now, as the assign form's inputs take it. */
export function schoolTime(offsetMs: number): string {
  return format(new TZDate(Date.now() + offsetMs, DEMO_SCHOOL.timeZone), "yyyy-MM-dd'T'HH:mm");
}

const HOUR = 3_600_000;

export interface AssignOptions {
  className: string;
  feedback?: FeedbackPolicy;
  reveal?: RevealPolicy;
  completionWatchShare?: number;
}

/** Assigns a published version to one of the signed-in teacher's classes: open since an hour ago, due in a week. */
export async function assignLesson(page: Page, lesson: PublishedLesson, options: AssignOptions): Promise<AssignmentDto> {
  const classes = await apiAs<{ classes: { id: string; name: string }[] }>(page, 'GET', '/teacher/classes');
  const cls = classes.body.classes.find((c) => c.name === options.className);
  if (!cls) throw new Error(`The teacher has no class named “${options.className}”.`);
  const created = await apiAs<AssignmentCreatedDto>(page, 'POST', '/assignments', {
    lessonId: lesson.lessonId,
    versionNumber: lesson.versionNumber,
    classIds: [cls.id],
    opensAt: schoolTime(-HOUR),
    dueAt: schoolTime(7 * 24 * HOUR),
    lateUntil: null,
    feedback: options.feedback ?? 'immediately',
    reveal: options.reveal ?? 'after-last-attempt',
    completionWatchShare: options.completionWatchShare ?? 0.9,
  });
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  const [assignment] = created.body.assignments;
  if (!assignment) throw new Error('Assigning to one class answered with no assignment.');
  return assignment;
}

/** A short tag that keeps this run's lesson titles apart from earlier runs' on a long-lived database. */
export function runTag(): string {
  return Date.now().toString(36).slice(-5);
}
