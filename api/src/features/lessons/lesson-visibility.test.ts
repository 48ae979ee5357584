import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@core/roles';
import type { Actor } from '../../auth/actor';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { buildDepartment, buildMember, buildSchool } from '../../../test/factories';
import { insertRecording } from '../recordings/test-recordings';
import { canViewLesson } from './lessons.policy';
import { insertLesson } from './lessons.repository';
import { initialContent } from './lesson-content';
import { listLessonViews } from './lessons.read-model';

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

describe('the list’s SQL and canViewLesson agree', () => {
  it('for every role set, with and without a department, over owners, departments and sharing', async () => {
    const school = await buildSchool(t.db);
    const physics = await buildDepartment(t.db, school.id);
    const chemistry = await buildDepartment(t.db, school.id);
    const me = await buildMember(t.db, { roles: ['teacher'], schoolId: school.id, departmentId: physics.id });
    const other = await buildMember(t.db, { roles: ['teacher'], schoolId: school.id, departmentId: physics.id });
    const recording = await insertRecording(t.db, { schoolId: school.id, ownerId: me.id });
    const elsewhere = await buildSchool(t.db);
    const foreignOwner = await buildMember(t.db, { roles: ['teacher'], schoolId: elsewhere.id });
    const foreignRecording = await insertRecording(t.db, { schoolId: elsewhere.id, ownerId: foreignOwner.id });

    // Every combination of owner, department and sharing, plus another school's lessons.
    const rows: { id: string; schoolId: string; ownerId: string | null; departmentId: string | null; shared: boolean }[] = [];
    for (const ownerId of [me.id, other.id, null]) {
      for (const departmentId of [physics.id, chemistry.id, null]) {
        for (const shared of [false, true]) {
          const content = initialContent({
            recordingId: recording.id,
            title: `${ownerId}-${departmentId}-${shared}`,
            description: '',
            tags: [],
            level: '',
            safetyNotes: '',
          });
          const id = await insertLesson(t.db, {
            schoolId: school.id,
            ownerId: other.id,
            departmentId,
            recordingId: recording.id,
            content,
            copiedFromId: null,
          });
          // Owner null (the owner's account was deleted) is set after the insert, as ON DELETE SET NULL leaves it.
          await t.db('lessons').where({ id }).update({ owner_id: ownerId, shared });
          rows.push({ id, schoolId: school.id, ownerId, departmentId, shared });
        }
      }
    }
    for (const shared of [false, true]) {
      const content = initialContent({
        recordingId: foreignRecording.id,
        title: 'Elsewhere',
        description: '',
        tags: [],
        level: '',
        safetyNotes: '',
      });
      const id = await insertLesson(t.db, {
        schoolId: elsewhere.id,
        ownerId: foreignOwner.id,
        departmentId: null,
        recordingId: foreignRecording.id,
        content,
        copiedFromId: null,
      });
      await t.db('lessons').where({ id }).update({ shared });
      rows.push({ id, schoolId: elsewhere.id, ownerId: foreignOwner.id, departmentId: null, shared });
    }

    let visibleSomewhere = 0;
    for (const roles of ROLE_SETS) {
      for (const departmentId of [physics.id, null]) {
        const actor: Actor = {
          userId: me.id,
          email: me.email,
          name: me.name,
          memberships: [],
          active: { schoolId: school.id, schoolName: 'Test', timeZone: 'UTC', locale: 'en-GB', roles, departmentId, role: roles[0]! },
        };
        const expected = rows
          .filter((row) => canViewLesson(actor, row))
          .map((row) => row.id)
          .sort();
        const listed = (await listLessonViews(t.db, actor, { sort: 'updated' })).map((row) => row.id).sort();
        expect(listed, `${roles.join('+')} in ${departmentId ? 'physics' : 'no department'}`).toEqual(expected);
        visibleSomewhere += expected.length;
      }
    }
    // The table is not trivially empty: some role sets see some lessons, the student none.
    expect(visibleSomewhere).toBeGreaterThan(0);
  });
});
