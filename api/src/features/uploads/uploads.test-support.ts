import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { partLength, partSizeFor } from '@core/recordings';
import type { UploadDto } from '@core/contracts';
import { signedInClient, type Client, type TestApp } from '../../../test/test-app';
import { buildMember } from '../../../test/factories';

export const MIB = 1024 * 1024;

/** A teacher of a fresh school, signed in through the real e-mail link. */
export async function newTeacher(t: TestApp) {
  const person = await buildMember(t.db, { roles: ['teacher'] });
  return { person, client: await signedInClient(t, person.email) };
}

/** A fake "video": random bytes (the API never reads them; only the worker sniffs). */
export function fakeFile(size: number, fileName = 'Pendulum demo.mp4', type = 'video/mp4', lastModified = 1_764_000_000_000) {
  const bytes = randomBytes(size);
  const firstPartSha256 = createHash('sha256')
    .update(bytes.subarray(0, partSizeFor(size)))
    .digest('hex');
  return {
    bytes,
    facts: { fileName, size, lastModified, firstPartSha256 },
    create: { fileName, size, lastModified, firstPartSha256, type },
  };
}

export function sha256(bytes: Buffer): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** The bytes of one part of a file, as the browser slices them. */
export function partBytes(bytes: Buffer, upload: UploadDto, partNumber: number): Buffer {
  const start = (partNumber - 1) * upload.partSize;
  return bytes.subarray(start, start + partLength(upload.size, upload.partSize, partNumber));
}

/** Signs one part through the API and PUTs it straight to storage, as the browser does; returns its ETag. */
export async function sendPart(client: Client, upload: UploadDto, bytes: Buffer, partNumber: number): Promise<string> {
  const signed = await client.send('post', `/api/uploads/${upload.id}/parts/${partNumber}`);
  if (signed.status !== 200) throw new Error(`signing part ${partNumber} failed: ${signed.status} ${JSON.stringify(signed.body)}`);
  const res = await fetch(signed.body.url, { method: 'PUT', body: partBytes(bytes, upload, partNumber) });
  if (res.status !== 200) throw new Error(`PUT of part ${partNumber} failed: ${res.status} ${await res.text()}`);
  return res.headers.get('etag')!;
}

export async function sendParts(client: Client, upload: UploadDto, bytes: Buffer, partNumbers: number[]) {
  const parts: { partNumber: number; etag: string }[] = [];
  for (const partNumber of partNumbers) parts.push({ partNumber, etag: await sendPart(client, upload, bytes, partNumber) });
  return parts;
}

/** Starts an upload and fails loudly if the API refuses. */
export async function startUpload(client: Client, body: Record<string, unknown>): Promise<UploadDto> {
  const res = await client.send('post', '/api/uploads', body);
  if (res.status !== 201) throw new Error(`starting the upload failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as UploadDto;
}

/** Deletes every object a test file stored under its schools' prefixes (the fake's bucket is shared). */
export async function deleteSchoolObjects(t: TestApp): Promise<void> {
  const schools = (await t.db('schools').select('id')) as { id: string }[];
  for (const school of schools) await t.storage.deletePrefix(`schools/${school.id}/`);
}

/** A recording row of a given size, as if another upload had finished (for quota checks). */
export async function insertStoredRecording(
  t: TestApp,
  owner: { id: string; schoolId: string },
  storedSize: number,
  extra: { state?: string; failure_code?: string } = {},
): Promise<void> {
  const id = randomUUID();
  await t.db('recordings').insert({
    id,
    school_id: owner.schoolId,
    owner_id: owner.id,
    title: 'Earlier recording',
    original_file_name: 'earlier.mp4',
    state: extra.state ?? 'ready',
    failure_code: extra.failure_code ?? null,
    failure_message: extra.failure_code ? 'An earlier failure.' : null,
    declared_size: storedSize,
    stored_size: storedSize,
    original_key: `schools/${owner.schoolId}/recordings/${id}/original`,
  });
}
