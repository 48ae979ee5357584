import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { localToInstant } from '@core/assignments';
import { createTestDatabase, type TestDatabase } from '../../../test/test-db';
import { testStorage } from '../../jobs/jobs.test-support';
import type { ObjectStorage } from '../../storage/object-storage';
import { DEMO_ASSIGNED_CLASS, demoAccounts, studentEmail } from '../demo-roster';
import { seed, SEED_STEPS } from '../seeder';
import { seedPeopleAndClasses } from './001-people-and-classes';
import { demoAssignmentDates, seedDemoAssignment } from './004-demo-assignment';

describe('the demo assignment’s dates, typed in school time (hand-computed)', () => {
  it('opens yesterday at 08:00 and is due a week from today at 17:00, by the school’s calendar', () => {
    expect(demoAssignmentDates(new Date('2026-12-03T10:00:00Z'), 'Europe/London')).toEqual({
      opensAt: '2026-12-02T08:00',
      dueAt: '2026-12-10T17:00',
    });
    // 23:30 UTC on 30 June is already 1 July in London (summer time, UTC+1).
    expect(demoAssignmentDates(new Date('2027-06-30T23:30:00Z'), 'Europe/London')).toEqual({
      opensAt: '2027-06-30T08:00',
      dueAt: '2027-07-08T17:00',
    });
    // Across the month and year ends, and the clocks going forward on 28 March 2027.
    expect(demoAssignmentDates(new Date('2027-01-01T12:00:00Z'), 'Europe/London')).toEqual({
      opensAt: '2026-12-31T08:00',
      dueAt: '2027-01-08T17:00',
    });
    expect(demoAssignmentDates(new Date('2027-03-25T12:00:00Z'), 'Europe/London')).toEqual({
      opensAt: '2027-03-24T08:00',
      dueAt: '2027-04-01T17:00',
    });
  });
});

describe('seed step 004: the demo assignment', { timeout: 180_000 }, () => {
  let database: TestDatabase;
  let storage: ObjectStorage;
  const s3 = { NODE_ENV: 'test', S3_ENDPOINT: process.env.S3_ENDPOINT, S3_BUCKET: process.env.S3_BUCKET };

  beforeAll(async () => {
    database = await createTestDatabase();
    storage = testStorage();
  });
  afterAll(async () => {
    for (const { id } of await database.knex('schools').select<{ id: string }[]>('id')) await storage.deletePrefix(`schools/${id}/`);
    await database.drop();
  });

  it('says which step must run first and keeps nothing when there is no published lesson', async () => {
    const attempt = database.knex.transaction(async (trx) => {
      await seedPeopleAndClasses(trx);
      await seedDemoAssignment(trx);
    });
    await expect(attempt).rejects.toThrow(
      "The demo assignment needs a published lesson of Ada Quillfeather's: seed step 003 must run first.",
    );
    expect(await database.knex('users').count<{ count: number }[]>('* as count')).toEqual([{ count: 0 }]);
  });

  it('assigns Ada’s published lesson to her class, once, with every student of it among the demo accounts', async () => {
    const before = new Date();
    expect(await seed(database.url, SEED_STEPS, s3)).toContain('004-demo-assignment');
    const after = new Date();
    expect(await seed(database.url, SEED_STEPS, s3)).toEqual([]);

    const ada = await database.knex('users').where({ email: 'ada.quillfeather@fernhollow.example' }).first<{ id: string }>('id');
    const lesson = await database
      .knex('lessons')
      .where({ owner_id: ada.id })
      .whereNotNull('latest_version')
      .first<{ id: string; title: string; latest_version: number }>('id', 'title', 'latest_version');
    const version = await database.knex('lesson_versions').where({ lesson_id: lesson.id, number: lesson.latest_version }).first('id');
    const rows = await database
      .knex('assignments as a')
      .join('classes as c', 'c.id', 'a.class_id')
      .join('schools as s', 's.id', 'a.school_id')
      .select('a.*', 'c.name as class_name', 'c.teacher_id', 's.time_zone');
    expect(rows).toHaveLength(1);
    const [row] = rows;
    expect(row).toMatchObject({
      lesson_id: lesson.id,
      lesson_version_id: version.id,
      version_number: 1,
      class_name: DEMO_ASSIGNED_CLASS.name,
      teacher_id: ada.id,
      created_by: ada.id,
      late_until: null,
      feedback: 'immediately',
      reveal: 'after-last-attempt',
      completion_watch_share: 0.9,
      time_zone: 'Europe/London',
    });
    // The dates of the seed's day (the day may have turned during the run: either side is right).
    const expected = [before, after].map((now) => {
      const local = demoAssignmentDates(now, 'Europe/London');
      return [localToInstant(local.opensAt, 'Europe/London').toISOString(), localToInstant(local.dueAt, 'Europe/London').toISOString()];
    });
    expect(expected).toContainEqual([row.opens_at.toISOString(), row.due_at.toISOString()]);
    // Open now: students can start at once.
    expect(row.opens_at.getTime()).toBeLessThan(before.getTime());
    expect(row.due_at.getTime()).toBeGreaterThan(after.getTime() + 6 * 24 * 60 * 60 * 1000);

    // Every student of the class can sign in from the picker (and npm start lists them), so the class can complete it.
    const enrolled = await database
      .knex('enrolments as e')
      .join('users as u', 'u.id', 'e.student_id')
      .where('e.class_id', row.class_id)
      .orderBy('u.email')
      .pluck('u.email');
    expect(enrolled).toEqual(DEMO_ASSIGNED_CLASS.students.map(studentEmail).sort());
    const offered = demoAccounts.filter((account) => account.label === `Student, ${DEMO_ASSIGNED_CLASS.name}`).map((a) => a.email);
    expect(offered.sort()).toEqual(enrolled);
    const [event] = await database.knex('audit_events').where({ action: 'assignment_created' });
    expect(event).toMatchObject({ actor_id: ada.id, school_id: row.school_id });
    expect(event.data).toMatchObject({
      assignmentId: row.id,
      lessonId: lesson.id,
      title: lesson.title,
      className: DEMO_ASSIGNED_CLASS.name,
      version: 1,
    });
  });
});
