import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CaptionDtoSchema } from '@core/contracts';
import { createTestApp, signedInClient, type TestApp } from '../../../test/test-app';
import { buildMember, buildSchool } from '../../../test/factories';
import { insertRecording } from './test-recordings';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function teacher(schoolId: string) {
  const person = await buildMember(t.db, { roles: ['teacher'], schoolId });
  return { ...person, client: await signedInClient(t, person.email) };
}

async function ownedRecording() {
  const school = await buildSchool(t.db);
  const owner = await teacher(school.id);
  const rec = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id });
  return { school, owner, rec, path: `/api/recordings/${rec.id}/captions` };
}

const VALID = 'WEBVTT\n\n00:00.000 --> 00:02.500\nThe magnet falls slowly.\n\n00:02.500 --> 00:05.000\nEddy currents oppose it.\n';

describe('POST /api/recordings/:recordingId/captions', () => {
  it('stores a valid file; the first track becomes the default and is served as WebVTT', async () => {
    const { owner, rec, path } = await ownedRecording();
    const res = await owner.client.send('post', path, { language: 'en-gb', label: 'English', vtt: VALID });
    expect(res.status).toBe(201);
    const caption = CaptionDtoSchema.parse(res.body);
    expect(caption).toMatchObject({ language: 'en-GB', label: 'English', isDefault: true, cueCount: 2 });
    expect(caption.url).toBe(`/api/recordings/${rec.id}/captions/${caption.id}.vtt`);

    const file = await owner.client.get(caption.url);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('text/vtt; charset=utf-8');
    expect(file.headers['x-content-type-options']).toBe('nosniff');
    expect(file.headers['cache-control']).toMatch(/^private\b/);
    expect(file.text).toBe(VALID);
    expect((await owner.client.get(`/api/recordings/${rec.id}`)).body.captions).toEqual([caption]);
  });

  it('400 caption_invalid lists each problem by the line an editor shows', async () => {
    const { owner, rec, path } = await ownedRecording();
    const vtt = [
      'WEBVTT', // 1
      '', // 2
      '00:00.000 --> 00:02.000', // 3
      'Fine so far', // 4
      '', // 5
      '00:02.00 --> 00:04.000', // 6: two-digit milliseconds
      'Skipped cue', // 7
      '', // 8
      '00:04.000 --> 00:06.000', // 9
      'First line', // 10
      'Tom &amp Jerry <b>bold', // 11: an escape without ";" and an unclosed tag
      '', // 12
    ].join('\n');
    const res = await owner.client.send('post', path, { language: 'en', label: 'English', vtt });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('caption_invalid');
    expect(res.body.error.message).toBe('The caption file has 3 problems: fix them and choose the file again.');
    // Messages are webvtt-parser's, after the W3C WebVTT parsing rules (timestamps need three-digit milliseconds).
    expect(res.body.error.details).toEqual([
      { path: 'line 6', message: 'Milliseconds must be given in three digits. (column 9)' },
      { path: 'line 11', message: 'Incorrect escape. (column 9)' },
      { path: 'line 11', message: 'Required end tag missing. (column 23)' },
    ]);
    expect(await t.db('recording_captions').where({ recording_id: rec.id }).first()).toBeUndefined();
  });

  it('400 for a file without cues, or without the WEBVTT line', async () => {
    const { owner, rec, path } = await ownedRecording();
    const empty = await owner.client.send('post', path, { language: 'en', label: 'English', vtt: 'WEBVTT\n\nNOTE nothing yet\n' });
    expect(empty.status).toBe(400);
    expect(empty.body.error).toMatchObject({
      code: 'caption_invalid',
      details: [{ path: 'vtt', message: 'No cues found after the WEBVTT line.' }],
    });
    const srt = await owner.client.send('post', path, { language: 'en', label: 'English', vtt: '1\n00:00:00,000 --> 00:00:02,000\nHi\n' });
    expect(srt.status).toBe(400);
    expect(srt.body.error.details[0]).toEqual({ path: 'line 1', message: 'No valid signature. (File needs to start with "WEBVTT".)' });
    expect(await t.db('recording_captions').where({ recording_id: rec.id }).first()).toBeUndefined();
  });

  it('400 names a malformed language tag or a missing label', async () => {
    const { owner, path } = await ownedRecording();
    const res = await owner.client.send('post', path, { language: 'english', label: '', vtt: VALID });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([
      { path: 'language', message: 'Use a language tag such as en, en-GB or fr.' },
      { path: 'label', message: 'Enter a label, such as English.' },
    ]);
  });

  it('409 caption_exists for the same language twice, however it is capitalised', async () => {
    const { owner, path } = await ownedRecording();
    expect((await owner.client.send('post', path, { language: 'fr', label: 'Français', vtt: VALID })).status).toBe(201);
    const again = await owner.client.send('post', path, { language: 'FR', label: 'French again', vtt: VALID });
    expect(again.status).toBe(409);
    expect(again.body.error).toEqual({
      code: 'caption_exists',
      message: 'This recording already has captions in fr ("Français"). Delete that track first to replace it.',
    });
  });

  it('403 for a colleague, who may still read the tracks', async () => {
    const { school, owner, path } = await ownedRecording();
    const colleague = await teacher(school.id);
    const created = await owner.client.send('post', path, { language: 'en', label: 'English', vtt: VALID });
    expect((await colleague.client.send('post', path, { language: 'de', label: 'Deutsch', vtt: VALID })).status).toBe(403);
    expect((await colleague.client.send('delete', `${path}/${created.body.id}`)).status).toBe(403);
    expect((await colleague.client.get(created.body.url)).text).toBe(VALID);
  });
});

describe('caption defaults', () => {
  it('isDefault moves the default; it cannot be switched off; deleting it promotes the oldest track', async () => {
    const { owner, rec, path } = await ownedRecording();
    const add = async (language: string, label: string, isDefault = false) =>
      (await owner.client.send('post', path, { language, label, vtt: VALID, isDefault })).body;
    const en = await add('en', 'English');
    const de = await add('de', 'Deutsch');
    expect(de.isDefault).toBe(false);
    const es = await add('es', 'Español', true);
    expect(es.isDefault).toBe(true);
    const defaults = async () =>
      (await owner.client.get(`/api/recordings/${rec.id}`)).body.captions
        .filter((c: { isDefault: boolean }) => c.isDefault)
        .map((c: { language: string }) => c.language);
    expect(await defaults()).toEqual(['es']);

    const off = await owner.client.send('patch', `${path}/${es.id}`, { isDefault: false });
    expect(off.status).toBe(400);
    expect(off.body.error.message).toBe('One caption track is always the default: make another track the default instead.');
    const moved = await owner.client.send('patch', `${path}/${de.id}`, { isDefault: true, label: 'German' });
    expect(moved.status).toBe(200);
    expect(moved.body).toMatchObject({ language: 'de', label: 'German', isDefault: true });
    expect(await defaults()).toEqual(['de']);

    expect((await owner.client.send('delete', `${path}/${de.id}`)).status).toBe(204);
    // en was added before es, so it takes over.
    expect(await defaults()).toEqual([en.language]);
    expect((await owner.client.get(de.url)).status).toBe(404);
  });

  it('400 for an empty change, 404 for a track of another recording', async () => {
    const { owner, school, path } = await ownedRecording();
    const other = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id });
    const created = (await owner.client.send('post', path, { language: 'en', label: 'English', vtt: VALID })).body;
    const empty = await owner.client.send('patch', `${path}/${created.id}`, {});
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toBe('Change the label or the default.');
    const elsewhere = await owner.client.send('patch', `/api/recordings/${other.id}/captions/${created.id}`, { label: 'x' });
    expect(elsewhere.status).toBe(404);
    expect(elsewhere.body.error.message).toBe('That caption track was not found.');
    expect((await owner.client.get(`/api/recordings/${other.id}/captions/${created.id}.vtt`)).status).toBe(404);
  });
});
