import { createHash } from 'node:crypto';
import { mkdtemp, readFile, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Knex } from 'knex';
import { partSizeFor, recordingPrefix } from '@core/recordings';
import { chooseActive, type Actor } from '../../auth/actor';
import { findActorData } from '../../auth/actor.repository';
import { loadEnv } from '../../env';
import { createCaptionsService } from '../../features/recordings/captions.service';
import { createUploadsService, type UploadsService } from '../../features/uploads/uploads.service';
import { transactionJobQueue } from '../../jobs/pg-boss-queue';
import { queueSettingsFromEnv } from '../../jobs/queue-settings';
import { createObjectStorage, StorageUnavailableError, storageConfigFromEnv } from '../../storage/object-storage';
import { DEMO_SCHOOL, DEMO_STAFF } from '../demo-roster';
import { DEMO_RECORDINGS, generateDemoVideo, toWebVtt, type DemoRecording } from './002-demo-media';

const OWNER_NAME = 'Ada Quillfeather';

/** The demo teacher, acting in the demo school as a teacher, exactly as a signed-in request would. */
async function demoTeacher(trx: Knex.Transaction): Promise<Actor> {
  const person = DEMO_STAFF.find((p) => p.name === OWNER_NAME);
  const user = person && (await trx('users').where({ email: person.email }).first<{ id: string } | undefined>('id'));
  const school = await trx('schools').where({ name: DEMO_SCHOOL.name }).first<{ id: string } | undefined>('id');
  const data = user && (await findActorData(trx, user.id));
  const active = data && school && chooseActive(data.memberships, { schoolId: school.id, role: 'teacher' });
  if (!data || !active || active.schoolId !== school?.id || active.role !== 'teacher') {
    throw new Error(`The demo recordings belong to ${OWNER_NAME}, a teacher of ${DEMO_SCHOOL.name}: seed step 001 must run first.`);
  }
  return { userId: data.user.id, email: data.user.email, name: data.user.name, memberships: data.memberships, active };
}

/**
 * Sends a file the way the library page does: the API creates the upload, signs each part, the
 * parts go straight to storage with the signed URLs, and the API completes it (which queues
 * processing). Returns the recording id.
 */
async function uploadLikeTheBrowser(
  uploads: UploadsService,
  actor: Actor,
  demo: DemoRecording,
  filePath: string,
  started: (recordingId: string) => void,
): Promise<string> {
  const bytes = await readFile(filePath);
  const { mtimeMs } = await stat(filePath);
  const upload = await uploads.create(actor, {
    fileName: demo.fileName,
    size: bytes.length,
    lastModified: Math.floor(mtimeMs),
    type: 'video/mp4',
    // The page hashes the first part so a re-chosen file can be matched; the API checks the format.
    firstPartSha256: createHash('sha256')
      .update(bytes.subarray(0, partSizeFor(bytes.length)))
      .digest('hex'),
  });
  started(upload.recordingId);
  const parts: { partNumber: number; etag: string }[] = [];
  for (let partNumber = 1; partNumber <= upload.partCount; partNumber++) {
    const signed = await uploads.signPart(actor, upload.id, partNumber);
    const start = (partNumber - 1) * upload.partSize;
    const response = await fetch(signed.url, { method: 'PUT', body: bytes.subarray(start, start + signed.contentLength) });
    const etag = response.headers.get('etag');
    if (!response.ok || !etag) throw new Error(`Storage refused part ${partNumber} of "${demo.fileName}": HTTP ${response.status}.`);
    parts.push({ partNumber, etag });
  }
  const recording = await uploads.complete(actor, upload.id, { parts });
  if (recording.state !== 'processing') throw new Error(`"${demo.fileName}" ended ${recording.state} after upload instead of processing.`);
  return recording.id;
}

function explain(error: unknown, endpoint: string): Error {
  if (error instanceof StorageUnavailableError) {
    return new Error(
      `The demo recordings need the S3 storage at ${endpoint} (npm start runs a local one before seeding): ${error.message}`,
    );
  }
  return error instanceof Error ? error : new Error(String(error));
}

/**
 * Seed step 002: short invented demonstrations, drawn by ffmpeg, uploaded through the product's
 * own upload path and queued for processing in the seed's transaction, with WebVTT captions. The
 * app's worker makes them ready once it runs. `source` is the app's environment (S3 and limits).
 */
export async function seedDemoRecordings(trx: Knex.Transaction, source: Record<string, string | undefined> = process.env): Promise<void> {
  const env = loadEnv(source);
  const storage = createObjectStorage(storageConfigFromEnv(env));
  const actor = await demoTeacher(trx);
  const jobs = await transactionJobQueue(trx, queueSettingsFromEnv(env));
  const uploads = createUploadsService({ db: trx, storage, jobs, env });
  const captions = createCaptionsService(trx);
  const workDir = await mkdtemp(path.join(tmpdir(), 'pinfield-seed-'));
  const prefixes: string[] = [];
  try {
    // Two cores: drawing the three at once takes about as long as the longest.
    const files = await Promise.all(DEMO_RECORDINGS.map((demo, index) => generateDemoVideo(demo, workDir, index)));
    for (const [index, demo] of DEMO_RECORDINGS.entries()) {
      const recordingId = await uploadLikeTheBrowser(uploads, actor, demo, files[index]!, (id) =>
        prefixes.push(recordingPrefix(actor.active.schoolId, id)),
      );
      for (const track of demo.captions) {
        await captions.create(actor, recordingId, {
          language: track.language,
          label: track.label,
          isDefault: track.isDefault,
          vtt: toWebVtt(track),
        });
      }
    }
  } catch (error) {
    // The transaction rolls back; the objects already stored must go with it.
    await Promise.allSettled(prefixes.map((prefix) => storage.deletePrefix(prefix)));
    throw explain(error, env.S3_ENDPOINT);
  } finally {
    await jobs.stop();
    await rm(workDir, { recursive: true, force: true });
    storage.client.destroy();
  }
}
