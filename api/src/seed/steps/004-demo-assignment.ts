import type { Knex } from 'knex';
import { DEFAULT_COMPLETION_WATCH_SHARE } from '@core/contracts';
import { instantToLocal, localToInstant } from '@core/assignments';
import { recordAudit } from '../../features/audit/audit.repository';
import { auditData } from '../../features/assignments/assignment-audit';
import { insertAssignments } from '../../features/assignments/assignments.repository';
import { DEMO_SCHOOL, DEMO_STAFF } from '../demo-roster';

const TEACHER_NAME = 'Ada Quillfeather';
const OPENS_AT = '08:00';
const DUE_AT = '17:00';
const DUE_IN_DAYS = 7;

/** A calendar date 'YYYY-MM-DD' moved by whole days (calendar arithmetic in UTC: no zone can shift it). */
function addDays(date: string, days: number): string {
  const [year, month, day] = date.split('-').map(Number) as [number, number, number];
  return new Date(Date.UTC(year, month - 1, day + days)).toISOString().slice(0, 10);
}

/**
 * The demo assignment's dates as the teacher would type them in school time: it opened yesterday
 * at the start of the school day and is due a week from today at the end of it.
 */
export function demoAssignmentDates(now: Date, timeZone: string): { opensAt: string; dueAt: string } {
  const today = instantToLocal(now, timeZone).slice(0, 10);
  return { opensAt: `${addDays(today, -1)}T${OPENS_AT}`, dueAt: `${addDays(today, DUE_IN_DAYS)}T${DUE_AT}` };
}

interface Teacher {
  userId: string;
  schoolId: string;
  timeZone: string;
}

async function demoTeacher(trx: Knex.Transaction): Promise<Teacher> {
  const email = DEMO_STAFF.find((p) => p.name === TEACHER_NAME)?.email ?? '';
  const row = await trx('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .join('schools as s', 's.id', 'm.school_id')
    .where({ 'u.email': email, 's.name': DEMO_SCHOOL.name, 'm.status': 'active' })
    .whereRaw("'teacher' = ANY(m.roles)")
    .first<Teacher | undefined>('u.id as userId', 's.id as schoolId', 's.time_zone as timeZone');
  if (!row) throw new Error(`The demo assignment is ${TEACHER_NAME}'s, a teacher of ${DEMO_SCHOOL.name}: seed step 001 must run first.`);
  return row;
}

/**
 * Seed step 004: each of Ada Quillfeather's published lessons (step 003), at its newest version,
 * assigned to each of her classes (10F Physics, whose students step 001 enrolled and the demo
 * accounts list): opened yesterday, due in a week at 17:00 school time, feedback right after each
 * answer, answers revealed after the last attempt. Written with the assignments API's repository,
 * with the audit event the route records.
 */
export async function seedDemoAssignment(trx: Knex.Transaction, now: Date = new Date()): Promise<void> {
  const teacher = await demoTeacher(trx);
  const lessons = await trx('lessons as l')
    .join('lesson_versions as v', (join) => join.on('v.lesson_id', 'l.id').andOn('v.number', 'l.latest_version'))
    .where({ 'l.school_id': teacher.schoolId, 'l.owner_id': teacher.userId })
    .whereNull('l.archived_at')
    .orderBy('l.title')
    .select<{ id: string; title: string; versionId: string; number: number }[]>('l.id', 'l.title', 'v.id as versionId', 'v.number');
  if (lessons.length === 0)
    throw new Error(`The demo assignment needs a published lesson of ${TEACHER_NAME}'s: seed step 003 must run first.`);
  const classes = await trx('classes')
    .where({ school_id: teacher.schoolId, teacher_id: teacher.userId })
    .whereNull('archived_at')
    .orderBy('name')
    .select<{ id: string; name: string }[]>('id', 'name');
  if (classes.length === 0)
    throw new Error(`The demo assignment goes to ${TEACHER_NAME}'s classes, and she has none: seed step 001 must run first.`);

  const dates = demoAssignmentDates(now, teacher.timeZone);
  const settings = {
    opensAt: localToInstant(dates.opensAt, teacher.timeZone),
    dueAt: localToInstant(dates.dueAt, teacher.timeZone),
    lateUntil: null,
    feedback: 'immediately' as const,
    reveal: 'after-last-attempt' as const,
    completionWatchShare: DEFAULT_COMPLETION_WATCH_SHARE,
  };
  for (const lesson of lessons) {
    const ids = await insertAssignments(trx, {
      schoolId: teacher.schoolId,
      lessonId: lesson.id,
      versionId: lesson.versionId,
      versionNumber: lesson.number,
      createdBy: teacher.userId,
      classIds: classes.map((cls) => cls.id),
      settings,
    });
    for (const [index, id] of ids.entries()) {
      const cls = classes[index]!;
      await recordAudit(trx, {
        schoolId: teacher.schoolId,
        actorId: teacher.userId,
        subjectId: null,
        action: 'assignment_created',
        data: auditData(
          { id, lessonId: lesson.id, lessonTitle: lesson.title, classId: cls.id, className: cls.name },
          { version: lesson.number },
        ),
      });
    }
  }
}
