import type { Knex } from 'knex';
import type { LessonContent } from '@core/contracts';
import { diffContent, lessonProblems } from '@core/lessons';
import { recordLessonAudit } from '../../features/lessons/lesson-audit.repository';
import { insertLesson, insertVersion, updateFlags } from '../../features/lessons/lessons.repository';
import { DEMO_SCHOOL, DEMO_STAFF } from '../demo-roster';
import { currentBalance, type DemoRecordingFacts } from './003-demo-lesson-content';
import { eddyCurrents } from './003-demo-lesson-eddy';
import { DEMO_RECORDINGS } from './002-demo-media';

const OWNER_NAME = 'Ada Quillfeather';

export interface DemoLesson {
  /** The step 002 recording it is built on, by title. */
  recordingTitle: string;
  /** Published as version 1 and shared with the department; otherwise left a draft. */
  publish: boolean;
  build(recording: DemoRecordingFacts): LessonContent;
}

/** The demo teacher's two lessons: one published and shared, one still a draft. */
export const DEMO_LESSONS: DemoLesson[] = [
  { recordingTitle: 'Demo: current balance', publish: true, build: currentBalance },
  { recordingTitle: 'Demo: magnet through a copper tube', publish: false, build: eddyCurrents },
];

const PUBLISH_NOTE = 'First version for the department.';

interface Owner {
  userId: string;
  schoolId: string;
  departmentId: string | null;
}

/** Ada's membership as a teacher of the demo school (step 001). */
async function demoOwner(trx: Knex.Transaction): Promise<Owner> {
  const email = DEMO_STAFF.find((p) => p.name === OWNER_NAME)?.email ?? '';
  const row = await trx('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .join('schools as s', 's.id', 'm.school_id')
    .where({ 'u.email': email, 's.name': DEMO_SCHOOL.name, 'm.status': 'active' })
    .whereRaw("'teacher' = ANY(m.roles)")
    .first<Owner | undefined>('u.id as userId', 's.id as schoolId', 'm.department_id as departmentId');
  if (!row) throw new Error(`The demo lessons belong to ${OWNER_NAME}, a teacher of ${DEMO_SCHOOL.name}: seed step 001 must run first.`);
  return row;
}

interface RecordingRow {
  id: string;
  duration_seconds: number | null;
  frame_rate: number | null;
}

/**
 * The recording's id and the facts the publish rules are checked against: its probed length and
 * frame rate once processed, else (still processing, as right after step 002 in the same
 * transaction) the length step 002 drew it with.
 */
async function demoRecording(trx: Knex.Transaction, owner: Owner, title: string) {
  const row = await trx('recordings')
    .where({ school_id: owner.schoolId, owner_id: owner.userId, title })
    .whereIn('state', ['processing', 'ready'])
    .orderBy('created_at')
    .first<RecordingRow | undefined>('id', 'duration_seconds', 'frame_rate');
  const drawn = DEMO_RECORDINGS.find((demo) => demo.fileName.replace(/\.mp4$/, '') === title);
  if (!row || !drawn)
    throw new Error(`The demo lessons are built on “${title}”, a recording of ${OWNER_NAME}: seed step 002 must run first.`);
  const durationMs = row.duration_seconds === null ? drawn.seconds * 1000 : Math.floor(row.duration_seconds * 1000);
  return { id: row.id, durationMs, frameRate: row.frame_rate };
}

/**
 * Seed step 003: Ada Quillfeather's demo lessons on the demo recordings, written with the lessons
 * API's own repository. A lesson meant to be published is refused here, as the publish route would
 * refuse it, if lessonProblems finds anything; the published one gets version 1 (changes against
 * nothing), is shared with Ada's department, and both events go to the audit log like the routes'.
 */
export async function seedDemoLessons(trx: Knex.Transaction): Promise<void> {
  const owner = await demoOwner(trx);
  for (const demo of DEMO_LESSONS) {
    const recording = await demoRecording(trx, owner, demo.recordingTitle);
    const content = demo.build({ durationMs: recording.durationMs });
    const problems = lessonProblems(content, recording);
    if (problems.length > 0) {
      const list = problems.map((p) => `${p.path}: ${p.message}`).join(' ');
      throw new Error(`The demo lesson “${content.settings.title}” does not meet the publish rules on “${demo.recordingTitle}”: ${list}`);
    }
    const lessonId = await insertLesson(trx, {
      schoolId: owner.schoolId,
      ownerId: owner.userId,
      departmentId: owner.departmentId,
      recordingId: recording.id,
      content,
      copiedFromId: null,
    });
    if (!demo.publish) continue;
    const audit = { schoolId: owner.schoolId, actorId: owner.userId, lessonId, title: content.settings.title };
    await insertVersion(trx, {
      schoolId: owner.schoolId,
      lessonId,
      number: 1,
      content,
      changes: diffContent(null, content),
      note: PUBLISH_NOTE,
      recordingId: recording.id,
      publishedBy: owner.userId,
    });
    await recordLessonAudit(trx, { ...audit, action: 'lesson_published', data: { version: 1 } });
    await updateFlags(trx, owner.schoolId, lessonId, { shared: true });
    await recordLessonAudit(trx, { ...audit, action: 'lesson_shared' });
  }
}
