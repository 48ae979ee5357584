// Test helpers (imported by *.test.ts only): a published lesson assigned to a class with a signed-in student.
import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import type { CheckpointAnswer, FeedbackPolicy, LessonContent, LessonDto, RevealPolicy } from '@core/contracts';
import { gradeAttempt } from '@core/lessons/grade-checkpoint';
import type { VariableValues } from '@core/physics/units/types';
import type { TestApp } from '../../../test/test-app';
import { buildClass, enrol } from '../../../test/factories';
import { createLesson, member, readyRecording, saveDraft, type Member } from '../lessons/lessons.test-support';
import { studentSeed } from '../responses/drawn-values';

const HOUR_MS = 60 * 60 * 1000;
export const hoursFromNow = (hours: number) => new Date(Date.now() + hours * HOUR_MS);

export interface AssignmentSettings {
  opensAt: Date;
  dueAt: Date;
  lateUntil: Date | null;
  feedback: FeedbackPolicy;
  reveal: RevealPolicy;
  completionWatchShare: number;
}

/** Open since yesterday, due in a week, feedback right away, answers after the last attempt. */
export const openSettings = (): AssignmentSettings => ({
  opensAt: hoursFromNow(-24),
  dueAt: hoursFromNow(24 * 7),
  lateUntil: null,
  feedback: 'immediately',
  reveal: 'after-last-attempt',
  completionWatchShare: 0.9,
});

/** Publishes the lesson's current draft through the API and fails loudly if it is refused. */
export async function publish(teacher: Member, lessonId: string, revision: number): Promise<number> {
  const res = await teacher.client.send('post', `/api/lessons/${lessonId}/publish`, { revision, note: '' });
  if (res.status !== 201) throw new Error(`publishing failed: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { number: number }).number;
}

/** An assignment row as the assignments service writes it (the watch API only reads them). */
export async function insertAssignment(
  db: Knex,
  row: { schoolId: string; lessonId: string; versionNumber: number; classId: string; createdBy: string } & AssignmentSettings,
): Promise<string> {
  const version = await db('lesson_versions').where({ lesson_id: row.lessonId, number: row.versionNumber }).first('id');
  if (!version) throw new Error(`no version ${row.versionNumber} of lesson ${row.lessonId}`);
  const [inserted] = await db('assignments')
    .insert({
      school_id: row.schoolId,
      lesson_id: row.lessonId,
      lesson_version_id: version.id,
      version_number: row.versionNumber,
      class_id: row.classId,
      created_by: row.createdBy,
      opens_at: row.opensAt,
      due_at: row.dueAt,
      late_until: row.lateUntil,
      feedback: row.feedback,
      reveal: row.reveal,
      completion_watch_share: row.completionWatchShare,
    })
    .returning('id');
  return (inserted as { id: string }).id;
}

export interface Assigned {
  teacher: Member;
  student: Member;
  lesson: LessonDto;
  classId: string;
  className: string;
  recordingId: string;
  versionNumber: number;
  assignmentId: string;
  content: LessonContent;
}

/**
 * A teacher of a fresh school publishes `content` (on a ready 12-second recording) and it is
 * assigned to their class, where one signed-in student is enrolled.
 */
export async function assignedLesson(t: TestApp, content: LessonContent, settings: Partial<AssignmentSettings> = {}): Promise<Assigned> {
  const teacher = await member(t, ['teacher']);
  const recording = await readyRecording(t, teacher);
  const lesson = await createLesson(teacher.client, recording.id);
  const saved = await saveDraft(teacher.client, lesson.id, lesson.revision, content);
  if (saved.problems.length > 0) throw new Error(`the test lesson breaks publish rules: ${JSON.stringify(saved.problems)}`);
  const versionNumber = await publish(teacher, lesson.id, saved.revision);
  const cls = await buildClass(t.db, { schoolId: teacher.schoolId, teacherId: teacher.id, name: 'Class 10P (test)' });
  const student = await member(t, ['student'], { schoolId: teacher.schoolId });
  await enrol(t.db, cls.id, student.id);
  const assignmentId = await assignTo(t, { teacher, lessonId: lesson.id, versionNumber, classId: cls.id }, settings);
  return {
    teacher,
    student,
    lesson,
    classId: cls.id,
    className: cls.name,
    recordingId: recording.id,
    versionNumber,
    assignmentId,
    content,
  };
}

/** Another assignment of the same published lesson (to the same or another class). */
export function assignTo(
  t: TestApp,
  to: { teacher: Member; lessonId: string; versionNumber: number; classId: string },
  settings: Partial<AssignmentSettings> = {},
): Promise<string> {
  return insertAssignment(t.db, {
    schoolId: to.teacher.schoolId,
    lessonId: to.lessonId,
    versionNumber: to.versionNumber,
    classId: to.classId,
    createdBy: to.teacher.id,
    ...openSettings(),
    ...settings,
  });
}

/** Another signed-in student of the school, enrolled in the class. */
export async function classmate(t: TestApp, assigned: Assigned): Promise<Member> {
  const student = await member(t, ['student'], { schoolId: assigned.teacher.schoolId });
  await enrol(t.db, assigned.classId, student.id);
  return student;
}

/**
 * Stores one answer and its engine grade as the responses service records them (graded with the
 * student's stored values), for tests of what the watch and results pages show of stored answers.
 */
export async function storeAnswer(
  t: TestApp,
  assigned: Assigned,
  student: Member,
  input: { key: string; answer: CheckpointAnswer; attempt: number; isExplanation?: boolean; receivedAt?: Date },
): Promise<string> {
  const checkpoint = assigned.content.checkpoints.find((c) => c.key === input.key);
  if (!checkpoint) throw new Error(`no checkpoint ${input.key}`);
  const stored = await t
    .db('student_variables')
    .where({ assignment_id: assigned.assignmentId, student_id: student.id, checkpoint_key: input.key })
    .first<{ values: VariableValues } | undefined>('values');
  const { grade, parsedSi } = gradeAttempt(checkpoint, input.answer, {
    seed: studentSeed(assigned.assignmentId, student.id),
    locale: 'en-GB',
    attempt: input.attempt,
    values: stored?.values,
  });
  const at = input.receivedAt ?? new Date();
  const [response] = await t
    .db('responses')
    .insert({
      school_id: assigned.teacher.schoolId,
      assignment_id: assigned.assignmentId,
      student_id: student.id,
      checkpoint_key: input.key,
      version_number: assigned.versionNumber,
      attempt: input.attempt,
      idempotency_key: randomUUID(),
      request_hash: 'test',
      answer: JSON.stringify(input.answer),
      raw_text: JSON.stringify(input.answer),
      parsed_si: parsedSi,
      variables: stored ? JSON.stringify(stored.values) : null,
      is_explanation: input.isExplanation ?? false,
      answered_at: at,
      received_at: at,
    })
    .returning('id');
  const responseId = (response as { id: string }).id;
  await t.db('grades').insert({
    response_id: responseId,
    assignment_id: assigned.assignmentId,
    checkpoint_key: input.key,
    score: grade.score,
    correct: grade.correct,
    mistake: grade.mistake,
    detail: JSON.stringify(grade),
    source: 'engine',
    version_number: assigned.versionNumber,
    graded_at: at,
  });
  return responseId;
}

/** A caption track of the recording, written as the captions service stores one. */
export async function addCaption(t: TestApp, recordingId: string, language: string, label: string): Promise<string> {
  const vtt = `WEBVTT\n\n00:00:00.000 --> 00:00:02.000\n(${label}) The switch closes.\n`;
  const [row] = await t
    .db('recording_captions')
    .insert({ recording_id: recordingId, language, label, is_default: language === 'en', vtt, cue_count: 1 })
    .returning('id');
  return (row as { id: string }).id;
}
