import type { Knex } from 'knex';
import type { AssignmentListQuery, FeedbackPolicy, LessonContent, RevealPolicy } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import type { Db } from '../../db/knex';
import type { AssignmentAccessFacts } from './assignments.policy';
import { whereAssignmentViewable } from './assignment-visibility';

/** An assignment with its lesson, class, school zone, maker and how far the class has got. */
export interface AssignmentView extends AssignmentAccessFacts {
  id: string;
  lessonId: string;
  lessonTitle: string;
  lessonLatestVersion: number | null;
  lessonVersionId: string;
  versionNumber: number;
  classId: string;
  className: string;
  opensAt: Date;
  dueAt: Date;
  lateUntil: Date | null;
  timeZone: string;
  feedback: FeedbackPolicy;
  reveal: RevealPolicy;
  completionWatchShare: number;
  createdByName: string | null;
  createdAt: Date;
  students: number;
  started: number;
  done: number;
}

// Only students still enrolled in the class count; started = opened, watched or answered (as studentState's in-progress).
const STUDENTS = 'SELECT count(*) FROM enrolments e WHERE e.class_id = a.class_id';
const PROGRESS_OF_ENROLLED = `FROM student_progress p JOIN enrolments e ON e.student_id = p.student_id AND e.class_id = a.class_id
  WHERE p.assignment_id = a.id`;
const STARTED = `SELECT count(*) ${PROGRESS_OF_ENROLLED} AND (p.first_opened_at IS NOT NULL OR p.watched_seconds > 0
  OR EXISTS (SELECT 1 FROM responses r WHERE r.assignment_id = a.id AND r.student_id = p.student_id))`;
const DONE = `SELECT count(*) ${PROGRESS_OF_ENROLLED} AND p.completed_at IS NOT NULL`;

function selectViews(db: Db, schoolId: string): Knex.QueryBuilder {
  return (
    db('assignments as a')
      // Every join also on school_id: ids alone never cross schools.
      .join('classes as c', (join) => join.on('c.id', 'a.class_id').andOn('c.school_id', 'a.school_id'))
      .join('lessons as l', (join) => join.on('l.id', 'a.lesson_id').andOn('l.school_id', 'a.school_id'))
      .join('schools as s', 's.id', 'a.school_id')
      .leftJoin('users as u', 'u.id', 'a.created_by')
      .where('a.school_id', schoolId)
      .select(
        'a.id',
        'a.school_id as schoolId',
        'a.created_by as createdBy',
        'u.name as createdByName',
        'c.teacher_id as classTeacherId',
        'c.department_id as classDepartmentId',
        'a.lesson_id as lessonId',
        'l.title as lessonTitle',
        'l.latest_version as lessonLatestVersion',
        'a.lesson_version_id as lessonVersionId',
        'a.version_number as versionNumber',
        'a.class_id as classId',
        'c.name as className',
        'a.opens_at as opensAt',
        'a.due_at as dueAt',
        'a.late_until as lateUntil',
        's.time_zone as timeZone',
        'a.feedback',
        'a.reveal',
        'a.completion_watch_share as completionWatchShare',
        'a.created_at as createdAt',
        db.raw(`(${STUDENTS})::int AS students`),
        db.raw(`(${STARTED})::int AS started`),
        db.raw(`(${DONE})::int AS done`),
      )
  );
}

/** One assignment of one school, whoever may see it (the policy decides). */
export async function findAssignmentView(db: Db, schoolId: string, assignmentId: string): Promise<AssignmentView | undefined> {
  const [row] = await selectViews(db, schoolId).where('a.id', assignmentId).limit(1);
  return row as AssignmentView | undefined;
}

/** Several assignments of one school by id (those just created), in the order given. */
export async function findAssignmentViews(db: Db, schoolId: string, ids: string[]): Promise<AssignmentView[]> {
  const rows = (await selectViews(db, schoolId).whereIn('a.id', ids)) as AssignmentView[];
  const byId = new Map(rows.map((row) => [row.id, row]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

/** The assignments the caller may see (canViewAssignment, as SQL), soonest due last opened first. */
export async function listAssignmentViews(db: Db, actor: Actor, query: AssignmentListQuery): Promise<AssignmentView[]> {
  const rows = selectViews(db, actor.active.schoolId);
  whereAssignmentViewable(rows, actor);
  if (query.classId) rows.where('a.class_id', query.classId);
  if (query.lessonId) rows.where('a.lesson_id', query.lessonId);
  return (await rows.orderBy([
    { column: 'a.due_at', order: 'desc' },
    { column: 'c.name', order: 'asc' },
    { column: 'a.id', order: 'asc' },
  ])) as AssignmentView[];
}

/** What assigning needs to know of a lesson of the caller's school. */
export interface LessonFacts {
  title: string;
  archived: boolean;
  latestVersion: number | null;
}

export async function findLessonFacts(db: Db, schoolId: string, lessonId: string): Promise<LessonFacts | undefined> {
  return db('lessons')
    .where({ id: lessonId, school_id: schoolId })
    .first<LessonFacts | undefined>('title', db.raw('archived_at IS NOT NULL AS archived'), 'latest_version as latestVersion');
}

/** A published version of a lesson of the school, with its frozen content. */
export interface LessonVersionRow {
  versionId: string;
  number: number;
  content: LessonContent;
}

export async function findLessonVersion(db: Db, schoolId: string, lessonId: string, number: number): Promise<LessonVersionRow | undefined> {
  return db('lesson_versions as v')
    .join('lessons as l', 'l.id', 'v.lesson_id')
    .where({ 'l.id': lessonId, 'l.school_id': schoolId, 'v.number': number })
    .first<LessonVersionRow | undefined>('v.id as versionId', 'v.number', 'v.content');
}

/** The content of the version an assignment points at. */
export async function findVersionContent(db: Db, schoolId: string, versionId: string): Promise<LessonContent | undefined> {
  const row = await db('lesson_versions as v')
    .join('lessons as l', 'l.id', 'v.lesson_id')
    .where({ 'v.id': versionId, 'l.school_id': schoolId })
    .first<{ content: LessonContent } | undefined>('v.content');
  return row?.content;
}

/** Classes of a school that can be assigned (not archived), by id. */
export interface AssignableClass {
  id: string;
  name: string;
  teacherId: string | null;
}

export async function findAssignableClasses(db: Db, schoolId: string, classIds: string[]): Promise<AssignableClass[]> {
  return db('classes')
    .where({ school_id: schoolId })
    .whereIn('id', classIds)
    .whereNull('archived_at')
    .select<AssignableClass[]>('id', 'name', 'teacher_id as teacherId');
}

/** How many responses, from how many students, an assignment has recorded. */
export async function countResponses(db: Db, schoolId: string, assignmentId: string): Promise<{ responses: number; students: number }> {
  const row = await db('responses')
    .where({ assignment_id: assignmentId, school_id: schoolId })
    .first<{ responses: number; students: number }>(
      db.raw('count(*)::int AS responses'),
      db.raw('count(DISTINCT student_id)::int AS students'),
    );
  return row;
}
