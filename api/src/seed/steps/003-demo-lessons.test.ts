import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CHECKPOINT_KINDS, type CheckpointOf, type LessonContent } from '@core/contracts';
import {
  canonicalJson,
  deriveSignAnswer,
  diffContent,
  drawnValuesFor,
  gradeCheckpoint,
  lessonProblems,
  sampleExpected,
  suggestCautions,
} from '@core/lessons';
import { createTestDatabase, type TestDatabase } from '../../../test/test-db';
import { recordingRow, silentLogger, startTestWorker, TEST_SETTINGS, testStorage, waitFor } from '../../jobs/jobs.test-support';
import { createJobQueue } from '../../jobs/pg-boss-queue';
import type { ObjectStorage } from '../../storage/object-storage';
import { seed, SEED_STEPS } from '../seeder';
import { seedPeopleAndClasses } from './001-people-and-classes';
import { seedDemoLessons } from './003-demo-lessons';

interface LessonRow {
  id: string;
  title: string;
  school_id: string;
  owner_id: string;
  department_id: string | null;
  recording_id: string;
  draft: LessonContent;
  draft_hash: string;
  latest_version: number | null;
  shared: boolean;
  revision: number;
  checkpoint_count: number;
}

const BALANCE = 'Current balance: force on a wire';
const EDDY = 'Eddy currents: a magnet falling through a copper tube';

/** A drawn value as the student sees it ('4.5 cm', '1.5 A', '60'), read by hand into SI. */
function si(text: string | number): number {
  if (typeof text === 'number') return text;
  const [number = '', unit = ''] = text.split(' ');
  const factor: Record<string, number> = { '': 1, A: 1, cm: 1e-2, mT: 1e-3 };
  const f = factor[unit];
  if (f === undefined) throw new Error(`No factor for the unit ${unit} in this test.`);
  return Number(number) * f;
}

/** The one checkpoint of a kind in a lesson. */
function only<K extends 'numeric' | 'sign' | 'note'>(content: LessonContent, kind: K) {
  const found = content.checkpoints.filter((c) => c.kind === kind);
  expect(found).toHaveLength(1);
  return found[0] as CheckpointOf<K>;
}

/** Textbook μ0 (N/A²), the value OpenStax University Physics Vol. 2 prints: 4π × 10⁻⁷ T·m/A. */
const MU0_TEXTBOOK = 4 * Math.PI * 1e-7;

/** The engine's expected value for a student's draw, shown and graded: checked against `independent` (SI). */
function checkDraw(checkpoint: CheckpointOf<'numeric'>, seed: string, independent: (v: Record<string, number>) => number, unit: number) {
  const drawn = Object.fromEntries(Object.entries(drawnValuesFor(checkpoint, seed)).map(([name, value]) => [name, si(value)]));
  const expected = independent(drawn) / unit;
  const sample = sampleExpected(checkpoint, seed);
  expect(sample.problem).toBeNull();
  const [shown = '', shownUnit] = (sample.expectedText ?? '').split(' ');
  expect(shownUnit).toBe(checkpoint.askedUnit);
  // The form shows 4 significant figures.
  expect(Math.abs(Number(shown) / expected - 1)).toBeLessThan(5e-4);
  const answer = (value: number) => ({ kind: 'numeric' as const, text: `${value.toPrecision(3)} ${checkpoint.askedUnit}` });
  expect(gradeCheckpoint(checkpoint, answer(expected), { seed, attempt: 1 }).correct).toBe(true);
  expect(gradeCheckpoint(checkpoint, answer(expected * 1.5), { seed, attempt: 1 }).correct).toBe(false);
}

/** The physics of the demo questions, each against a published source. */
function checkPhysics(balance: LessonContent, eddy: LessonContent) {
  for (const seed of ['student-1', 'student-2', 'student-3']) {
    // OpenStax University Physics Vol. 2, §12.4 (Magnetic Field of a Current Loop): B = μ0 N I / (2R) at the centre of N turns.
    checkDraw(only(eddy, 'numeric'), seed, (v) => (MU0_TEXTBOOK * v.N! * v.I!) / (2 * v.a!), 1e-3);
    // OpenStax University Physics Vol. 2, §11.4 (Magnetic Force on a Current-Carrying Conductor): F = I l B sin θ, θ = 90° here.
    checkDraw(only(balance, 'numeric'), seed, (v) => v.I! * v.L! * v.B! * Math.sin(Math.PI / 2), 1e-3);
  }
  // OpenStax University Physics Vol. 2, §12.2 (Magnetic Field Due to a Thin Straight Wire), right-hand rule: current along +x,
  // point on +y, so B is along x̂ × ŷ = +ẑ, out of the page, with |B| = μ0 I / (2π R) for 1 A at R = 1 cm.
  const wire = only(balance, 'sign');
  if (wire.answer.source !== 'geometry') throw new Error('The balance sign check should derive its answer from geometry.');
  const wireField = deriveSignAnswer(wire.answer.geometry, wire.choiceSet);
  expect(wireField).toMatchObject({ ok: true, choice: 'out' });
  if (wireField.ok) expect(wireField.field[2] / (MU0_TEXTBOOK / (2 * Math.PI * 0.01))).toBeCloseTo(1, 6);
  // OpenStax University Physics Vol. 2, §12.4, right-hand rule: a loop's current curled anticlockwise seen from +y gives B along +y
  // at its centre, |B| = μ0 I / (2R) for 1 A and R = 1.2 cm.
  const ring = only(eddy, 'sign');
  if (ring.answer.source !== 'geometry') throw new Error('The eddy sign check should derive its answer from geometry.');
  const ringField = deriveSignAnswer(ring.answer.geometry, ring.choiceSet);
  expect(ringField).toMatchObject({ ok: true, choice: '+y' });
  if (ringField.ok) expect(ringField.field[1] / (MU0_TEXTBOOK / (2 * 0.012))).toBeCloseTo(1, 6);
}

describe('seed step 003: the demo lessons', { timeout: 180_000 }, () => {
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

  it('says which step must run first and keeps nothing when the demo recordings are missing', async () => {
    const attempt = database.knex.transaction(async (trx) => {
      await seedPeopleAndClasses(trx);
      await seedDemoLessons(trx);
    });
    await expect(attempt).rejects.toThrow(
      'The demo lessons are built on “Demo: current balance”, a recording of Ada Quillfeather: seed step 002 must run first.',
    );
    expect(await database.knex('lessons').count<{ count: number }[]>('* as count')).toEqual([{ count: 0 }]);
    expect(await database.knex('users').count<{ count: number }[]>('* as count')).toEqual([{ count: 0 }]);
  });

  it('gives Ada Quillfeather a published, shared lesson and a draft, once, that pass the publish rules on the real recordings', async () => {
    expect(await seed(database.url, SEED_STEPS, s3)).toEqual(SEED_STEPS.map((step) => step.name));
    // The seeder records the step: a second start seeds nothing more.
    expect(await seed(database.url, SEED_STEPS, s3)).toEqual([]);

    const ada = await database
      .knex('memberships as m')
      .join('users as u', 'u.id', 'm.user_id')
      .join('schools as s', 's.id', 'm.school_id')
      .where({ 'u.email': 'ada.quillfeather@fernhollow.example', 's.name': 'Fernhollow Academy (demo)' })
      .first<{ userId: string; schoolId: string; departmentId: string }>(
        'u.id as userId',
        's.id as schoolId',
        'm.department_id as departmentId',
      );
    expect(ada.departmentId).toEqual(expect.any(String));
    const lessons = await database.knex('lessons').orderBy('title').select<LessonRow[]>('*');
    expect(lessons.map((l) => l.title)).toEqual([BALANCE, EDDY]);
    for (const lesson of lessons) {
      expect(lesson).toMatchObject({ school_id: ada.schoolId, owner_id: ada.userId, department_id: ada.departmentId, revision: 0 });
      expect(lesson.checkpoint_count).toBe(lesson.draft.checkpoints.length);
      // Every kind a teacher can pin, in each lesson.
      expect(new Set(lesson.draft.checkpoints.map((c) => c.kind))).toEqual(new Set(CHECKPOINT_KINDS));
      expect(lesson.draft.chapters.length).toBeGreaterThanOrEqual(2);
      expect(lesson.draft_hash).toBe(createHash('sha256').update(canonicalJson(lesson.draft)).digest('hex'));
      // Safety notes are the studio's own suggestions, deferring to the school's rules.
      const { title, tags, description } = lesson.draft.settings;
      const cautions = suggestCautions({ title, tags, description });
      expect(cautions.map((c) => c.topic)).toContain('magnets');
      expect(lesson.draft.settings.safetyNotes).toBe(cautions.map((c) => c.text).join('\n\n'));
      expect(lesson.draft.settings.safetyNotes).toContain("Follow your school's safety rules and local regulations");
      const note = only(lesson.draft, 'note');
      expect(note.tone).toBe('safety');
      expect(cautions.some((c) => note.body.endsWith(c.text))).toBe(true);
    }

    const [published, draft] = lessons as [LessonRow, LessonRow];
    checkPhysics(published.draft, draft.draft);
    expect(published).toMatchObject({ latest_version: 1, shared: true });
    expect(draft).toMatchObject({ latest_version: null, shared: false });
    const versions = await database.knex('lesson_versions').select('*');
    expect(versions).toHaveLength(1);
    expect(versions[0]).toMatchObject({
      lesson_id: published.id,
      number: 1,
      content_hash: published.draft_hash,
      recording_id: published.recording_id,
      published_by: ada.userId,
      checkpoint_count: published.draft.checkpoints.length,
    });
    expect(versions[0].content).toEqual(published.draft);
    expect(versions[0].changes).toEqual(diffContent(null, published.draft));
    const audit = await database.knex('audit_events').whereIn('action', ['lesson_published', 'lesson_shared']).orderBy('action');
    expect(audit.map((a) => [a.action, a.actor_id, a.data.lessonId])).toEqual([
      ['lesson_published', ada.userId, published.id],
      ['lesson_shared', ada.userId, published.id],
    ]);

    // What npm start's worker does next: the recordings become ready with their probed length and frame rate.
    const queue = await createJobQueue({
      databaseUrl: database.url,
      db: database.knex,
      settings: TEST_SETTINGS,
      logger: silentLogger,
      maintenance: false,
    });
    const worker = await startTestWorker(queue, database.knex, storage);
    try {
      for (const lesson of lessons)
        await waitFor(async () => (await recordingRow(database.knex, lesson.recording_id))?.state !== 'processing');
    } finally {
      await worker.stop();
      await queue.stop();
    }
    for (const lesson of lessons) {
      const recording = await recordingRow(database.knex, lesson.recording_id);
      expect(recording).toMatchObject({ state: 'ready', frame_rate: 24 });
      const durationMs = Math.floor(recording.duration_seconds * 1000);
      expect(lessonProblems(lesson.draft, { durationMs, frameRate: recording.frame_rate })).toEqual([]);
      const times = lesson.draft.checkpoints.map((c) => c.atMs).sort((a, b) => a - b);
      times.slice(1).forEach((t, i) => expect(t - (times[i] as number)).toBeGreaterThanOrEqual(lesson.draft.settings.minSpacingMs));
      expect(Math.max(...times)).toBeLessThan(durationMs);
      expect(Math.max(...lesson.draft.chapters.map((c) => c.endMs))).toBeLessThanOrEqual(durationMs);
    }
  });
});
