import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@core/roles';
import type { Actor } from '../../auth/actor';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { buildClass, buildDepartment, buildMember, buildSchool } from '../../../test/factories';
import { insertRecording } from '../recordings/test-recordings';
import { insertLesson, insertVersion } from '../lessons/lessons.repository';
import { initialContent } from '../lessons/lesson-content';
import { canManageAssignment, canViewAssignment, type AssignmentAccessFacts } from './assignments.policy';
import { insertAssignments } from './assignments.repository';
import { listAssignmentViews } from './assignments.read-model';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const ROLE_SETS: Role[][] = [
  ['teacher'],
  ['coordinator'],
  ['coordinator', 'teacher'],
  ['substitute'],
  ['admin'],
  ['student'],
  ['teacher', 'substitute'],
];

const actorOf = (userId: string, schoolId: string, roles: Role[], departmentId: string | null): Actor => ({
  userId,
  email: 'me@test.example',
  name: 'Me',
  memberships: [],
  active: { schoolId, schoolName: 'Test', timeZone: 'Europe/London', locale: 'en-GB', roles, departmentId, role: roles[0]! },
});

const settings = {
  opensAt: new Date('2030-01-01T09:00:00Z'),
  dueAt: new Date('2030-01-08T17:00:00Z'),
  lateUntil: null,
  feedback: 'immediately' as const,
  reveal: 'after-last-attempt' as const,
  completionWatchShare: 0.9,
};

/** A lesson with a version 1 in the school, owned by `ownerId`. */
async function version1(schoolId: string, ownerId: string) {
  const recording = await insertRecording(t.db, { schoolId, ownerId });
  const content = initialContent({
    recordingId: recording.id,
    title: 'Policy lesson',
    description: '',
    tags: [],
    level: '',
    safetyNotes: '',
  });
  const lessonId = await insertLesson(t.db, {
    schoolId,
    ownerId,
    departmentId: null,
    recordingId: recording.id,
    content,
    copiedFromId: null,
  });
  const versionId = await insertVersion(t.db, {
    schoolId,
    lessonId,
    number: 1,
    content,
    changes: { added: [], removed: [], edited: [], chaptersChanged: false, settings: [] },
    note: '',
    recordingId: recording.id,
    publishedBy: ownerId,
  });
  return { lessonId, versionId };
}

describe('assignment access', () => {
  it('canManageAssignment, role by role (hand-written table)', () => {
    const school = 'school-1';
    const row = (facts: Partial<AssignmentAccessFacts>): AssignmentAccessFacts => ({
      schoolId: school,
      createdBy: 'maker',
      classTeacherId: 'class-teacher',
      classDepartmentId: 'physics',
      ...facts,
    });
    const cases: [string, Actor, AssignmentAccessFacts, boolean, boolean][] = [
      // who, actor, row, may view, may manage
      ['its maker', actorOf('maker', school, ['teacher'], 'physics'), row({}), true, true],
      ['the class’s teacher', actorOf('class-teacher', school, ['teacher'], 'physics'), row({}), true, true],
      ['another teacher of the department', actorOf('someone', school, ['teacher'], 'physics'), row({}), false, false],
      ['the department’s coordinator', actorOf('someone', school, ['coordinator'], 'physics'), row({}), true, false],
      ['a school-wide coordinator', actorOf('someone', school, ['coordinator'], null), row({}), true, false],
      ['another department’s coordinator', actorOf('someone', school, ['coordinator'], 'chemistry'), row({}), false, false],
      ['an admin', actorOf('someone', school, ['admin'], null), row({}), true, true],
      ['a substitute', actorOf('someone', school, ['substitute'], 'physics'), row({}), false, false],
      ['a student', actorOf('someone', school, ['student'], null), row({}), false, false],
      ['an admin of another school', actorOf('someone', 'school-2', ['admin'], null), row({}), false, false],
      ['its maker, now a coordinator only', actorOf('maker', school, ['coordinator'], 'chemistry'), row({}), false, false],
      [
        'its maker after the account of the class’s teacher went',
        actorOf('maker', school, ['teacher'], null),
        row({ classTeacherId: null }),
        true,
        true,
      ],
    ];
    for (const [who, actor, facts, view, manage] of cases) {
      expect(canViewAssignment(actor, facts), `${who} views`).toBe(view);
      expect(canManageAssignment(actor, facts), `${who} manages`).toBe(manage);
    }
  });

  it('the list’s SQL and canViewAssignment agree for every role set, over makers, class teachers and departments', async () => {
    const school = await buildSchool(t.db);
    const physics = await buildDepartment(t.db, school.id);
    const chemistry = await buildDepartment(t.db, school.id);
    const me = await buildMember(t.db, { roles: ['teacher'], schoolId: school.id, departmentId: physics.id });
    const other = await buildMember(t.db, { roles: ['teacher'], schoolId: school.id, departmentId: physics.id });
    const { lessonId, versionId } = await version1(school.id, other.id);
    const rows: (AssignmentAccessFacts & { id: string })[] = [];
    for (const teacherId of [me.id, other.id, null]) {
      for (const departmentId of [physics.id, chemistry.id, null]) {
        const cls = await buildClass(t.db, { schoolId: school.id, teacherId, departmentId });
        for (const createdBy of [me.id, other.id, null]) {
          const [id] = await insertAssignments(t.db, {
            schoolId: school.id,
            lessonId,
            versionId,
            versionNumber: 1,
            createdBy: other.id,
            classIds: [cls.id],
            settings,
          });
          // A maker's account removed later leaves null, as ON DELETE SET NULL would.
          await t.db('assignments').where({ id }).update({ created_by: createdBy });
          rows.push({ id: id!, schoolId: school.id, createdBy, classTeacherId: teacherId, classDepartmentId: departmentId });
        }
      }
    }
    const elsewhere = await buildSchool(t.db);
    const foreignTeacher = await buildMember(t.db, { roles: ['teacher'], schoolId: elsewhere.id });
    const foreign = await version1(elsewhere.id, foreignTeacher.id);
    const foreignClass = await buildClass(t.db, { schoolId: elsewhere.id, teacherId: foreignTeacher.id });
    const [foreignId] = await insertAssignments(t.db, {
      schoolId: elsewhere.id,
      lessonId: foreign.lessonId,
      versionId: foreign.versionId,
      versionNumber: 1,
      createdBy: foreignTeacher.id,
      classIds: [foreignClass.id],
      settings,
    });
    rows.push({
      id: foreignId!,
      schoolId: elsewhere.id,
      createdBy: foreignTeacher.id,
      classTeacherId: foreignTeacher.id,
      classDepartmentId: null,
    });

    let visibleSomewhere = 0;
    for (const roles of ROLE_SETS) {
      for (const departmentId of [physics.id, null]) {
        const actor = actorOf(me.id, school.id, roles, departmentId);
        const expected = rows
          .filter((row) => canViewAssignment(actor, row))
          .map((row) => row.id)
          .sort();
        const listed = (await listAssignmentViews(t.db, actor, {})).map((row) => row.id).sort();
        expect(listed, `${roles.join('+')} in ${departmentId ? 'physics' : 'no department'}`).toEqual(expected);
        visibleSomewhere += expected.length;
      }
    }
    expect(visibleSomewhere).toBeGreaterThan(0);
  });
});
