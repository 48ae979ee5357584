import type { Knex } from 'knex';
import type { FeedbackPolicy, LessonContent, RevealPolicy } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import type { CacheInvalidation } from '../../auth/cache-invalidation';
import { NotFoundError } from '../../errors';

/** One assignment with everything the student side needs to show, grade and record an answer. */
export interface AssignmentContext {
  id: string;
  schoolId: string;
  classId: string;
  className: string;
  lessonId: string;
  lessonTitle: string;
  versionNumber: number;
  content: LessonContent;
  recordingId: string;
  durationMs: number;
  opensAt: Date;
  dueAt: Date;
  lateUntil: Date | null;
  feedback: FeedbackPolicy;
  reveal: RevealPolicy;
  completionWatchShare: number;
  timeZone: string;
  locale: string;
  teacherName: string | null;
}

interface AssignmentRow {
  id: string;
  schoolId: string;
  classId: string;
  className: string;
  lessonId: string;
  versionId: string;
  versionNumber: number;
  opensAt: Date;
  dueAt: Date;
  lateUntil: Date | null;
  feedback: FeedbackPolicy;
  reveal: RevealPolicy;
  completionWatchShare: number;
  timeZone: string;
  locale: string;
  teacherId: string | null;
  teacherName: string | null;
}

interface VersionFacts {
  content: LessonContent;
  lessonTitle: string;
  recordingId: string;
  durationMs: number;
}

/** Published versions never change; this bounds memory, not freshness. */
const VERSIONS_KEPT = 500;
const ROWS_KEPT = 5000;
const ENROLMENTS_KEPT = 50_000;

const notAssigned = () => new NotFoundError('That assignment (it may not be assigned to your class)');

function remember<K, V>(map: Map<K, V>, key: K, value: V, limit: number): void {
  if (map.size >= limit) map.delete(map.keys().next().value as K);
  map.set(key, value);
}

async function loadRow(db: Knex, assignmentId: string): Promise<AssignmentRow | undefined> {
  const [row] = await db('assignments as a')
    .join('classes as c', function joinClass() {
      this.on('c.id', 'a.class_id').andOn('c.school_id', 'a.school_id');
    })
    .join('schools as s', 's.id', 'a.school_id')
    .leftJoin('users as t', 't.id', 'c.teacher_id')
    .where('a.id', assignmentId)
    .select<AssignmentRow[]>(
      'a.id',
      'a.school_id as schoolId',
      'a.class_id as classId',
      'c.name as className',
      'a.lesson_id as lessonId',
      'a.lesson_version_id as versionId',
      'a.version_number as versionNumber',
      'a.opens_at as opensAt',
      'a.due_at as dueAt',
      'a.late_until as lateUntil',
      'a.feedback',
      'a.reveal',
      'a.completion_watch_share as completionWatchShare',
      's.time_zone as timeZone',
      's.locale',
      'c.teacher_id as teacherId',
      't.name as teacherName',
    )
    .limit(1);
  return row;
}

async function loadVersion(db: Knex, versionId: string, lessonId: string): Promise<VersionFacts> {
  const row = await db('lesson_versions as v')
    .join('recordings as r', 'r.id', 'v.recording_id')
    .where({ 'v.id': versionId, 'v.lesson_id': lessonId })
    .first<{ content: LessonContent; recordingId: string; durationSeconds: number | null } | undefined>(
      'v.content',
      'v.recording_id as recordingId',
      'r.duration_seconds as durationSeconds',
    );
  if (!row) throw new Error(`assignment refers to a missing lesson version ${versionId}`);
  return {
    content: row.content,
    lessonTitle: row.content.settings.title,
    recordingId: row.recordingId,
    durationMs: Math.round((row.durationSeconds ?? 0) * 1000),
  };
}

async function isEnrolled(db: Knex, classId: string, studentId: string): Promise<boolean> {
  const row = await db('enrolments').where({ class_id: classId, student_id: studentId }).first('id');
  return row !== undefined;
}

/**
 * Assignments as their students see them. Lesson versions are cached for good (immutable).
 * Assignment rows and enrolments are cached only while `invalidation` vouches that every change
 * committed more than a moment ago has reached this process (see cache-invalidation.ts); without it,
 * each call reads them.
 */
export function createAssignmentContexts(deps: { db: Knex; invalidation?: CacheInvalidation }) {
  const { db, invalidation } = deps;
  const versions = new Map<string, VersionFacts>();
  const rows = new Map<string, AssignmentRow>();
  // `${classId}:${studentId}` → enrolled; a "no" is kept too, so a stranger's retries stay cheap.
  const enrolments = new Map<string, boolean>();

  invalidation?.subscribe((event) => {
    if (event.kind === 'all') {
      rows.clear();
      enrolments.clear();
    } else if (event.kind === 'assignment') rows.delete(event.id);
    else if (event.kind === 'enrolment') enrolments.delete(`${event.classId}:${event.studentId}`);
    else if (event.kind === 'class' || event.kind === 'school' || event.kind === 'user') {
      // Names, teachers, zones: rare changes, so dropping every row of that class or school is cheap enough.
      for (const [id, row] of rows) {
        if (row.classId === event.id || row.schoolId === event.id || row.teacherId === event.id) rows.delete(id);
      }
    }
  });

  const caching = () => invalidation?.trusted() ?? false;

  async function row(assignmentId: string): Promise<AssignmentRow | undefined> {
    const hit = caching() ? rows.get(assignmentId) : undefined;
    if (hit) return hit;
    const epoch = invalidation?.epoch();
    const loaded = await loadRow(db, assignmentId);
    // A change heard while this read was in flight may be older than what was read: keep nothing then.
    if (loaded && invalidation && invalidation.epoch() === epoch) remember(rows, assignmentId, loaded, ROWS_KEPT);
    return loaded;
  }

  async function version(row: AssignmentRow): Promise<VersionFacts> {
    const hit = versions.get(row.versionId);
    if (hit) return hit;
    const loaded = await loadVersion(db, row.versionId, row.lessonId);
    remember(versions, row.versionId, loaded, VERSIONS_KEPT);
    return loaded;
  }

  async function enrolled(classId: string, studentId: string): Promise<boolean> {
    const key = `${classId}:${studentId}`;
    const hit = caching() ? enrolments.get(key) : undefined;
    if (hit !== undefined) return hit;
    const epoch = invalidation?.epoch();
    const answer = await isEnrolled(db, classId, studentId);
    if (invalidation && invalidation.epoch() === epoch) remember(enrolments, key, answer, ENROLMENTS_KEPT);
    return answer;
  }

  return {
    /** The assignment as a student of its class sees it: 404 NotFoundError unless the actor is a student enrolled in the class, in the active school. Cached: lesson versions are immutable; assignment rows briefly. */
    async forStudent(actor: Actor, assignmentId: string): Promise<AssignmentContext> {
      if (!actor.active.roles.includes('student')) throw notAssigned();
      const found = await row(assignmentId);
      if (!found || found.schoolId !== actor.active.schoolId) throw notAssigned();
      const [facts, member] = await Promise.all([version(found), enrolled(found.classId, actor.userId)]);
      if (!member) throw notAssigned();
      return {
        id: found.id,
        schoolId: found.schoolId,
        classId: found.classId,
        className: found.className,
        lessonId: found.lessonId,
        lessonTitle: facts.lessonTitle,
        versionNumber: found.versionNumber,
        content: facts.content,
        recordingId: facts.recordingId,
        durationMs: facts.durationMs,
        opensAt: found.opensAt,
        dueAt: found.dueAt,
        lateUntil: found.lateUntil,
        feedback: found.feedback,
        reveal: found.reveal,
        completionWatchShare: found.completionWatchShare,
        timeZone: found.timeZone,
        locale: found.locale,
        teacherName: found.teacherName,
      };
    },

    /** Drop cached rows of one assignment (after a teacher edits or moves it). */
    forget(assignmentId: string): void {
      rows.delete(assignmentId);
    },
  };
}

export type AssignmentContexts = ReturnType<typeof createAssignmentContexts>;
