import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import webvtt from 'webvtt-parser';
import { PlaybackDtoSchema } from '@core/contracts';
import { createTestApp, signedInClient, type TestApp } from '../../../test/test-app';
import { buildMember, buildSchool } from '../../../test/factories';
import { insertReadyRecording, insertRecording, patternBytes } from './test-recordings';
import { createMediaUrls } from './media-urls';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function teacher(schoolId?: string) {
  const person = await buildMember(t.db, { roles: ['teacher'], schoolId });
  return { ...person, client: await signedInClient(t, person.email) };
}

const expiresParam = (url: string) => Number(new URL(url).searchParams.get('X-Amz-Expires'));

describe('GET /api/recordings/:recordingId/playback', () => {
  it('signs the rendition for ranged reads: Range answers 206 with exactly those bytes', async () => {
    const me = await teacher();
    const rec = await insertReadyRecording(t.db, t.storage, { schoolId: me.schoolId, ownerId: me.id });
    const res = await me.client.get(`/api/recordings/${rec.id}/playback`);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('private, no-store');
    const playback = PlaybackDtoSchema.parse(res.body);
    expect(playback).toMatchObject({ recordingId: rec.id, durationSeconds: 12, width: 1280, height: 720, captions: [] });
    expect(playback.src.type).toBe('video/mp4');
    expect(playback.thumbnailsUrl).toBe(`/api/recordings/${rec.id}/thumbnails.vtt`);

    // Range requests and 206 Partial Content: RFC 9110 §14.2 and §15.3.7.
    const ranged = await fetch(playback.src.url, { headers: { Range: 'bytes=1000-1999' } });
    expect(ranged.status).toBe(206);
    expect(ranged.headers.get('content-range')).toBe(`bytes 1000-1999/${64 * 1024}`);
    expect(Buffer.from(await ranged.arrayBuffer())).toEqual(patternBytes(64 * 1024, 2).subarray(1000, 2000));
    expect((await fetch(playback.posterUrl!)).status).toBe(200);
  });

  it('lasts PLAYBACK_URL_MINUTES, or the duration plus 30 minutes when that is longer', async () => {
    const me = await teacher();
    const short = await insertReadyRecording(t.db, t.storage, { schoolId: me.schoolId, ownerId: me.id, durationSeconds: 12 });
    const long = await insertReadyRecording(t.db, t.storage, { schoolId: me.schoolId, ownerId: me.id, durationSeconds: 3 * 3600 });
    const before = Date.now();
    const shortPlayback = (await me.client.get(`/api/recordings/${short.id}/playback`)).body;
    const longPlayback = (await me.client.get(`/api/recordings/${long.id}/playback`)).body;
    const after = Date.now();
    expect(expiresParam(shortPlayback.src.url)).toBe(120 * 60);
    expect(expiresParam(longPlayback.src.url)).toBe(3 * 3600 + 30 * 60);
    const expiresAt = Date.parse(shortPlayback.expiresAt);
    expect(expiresAt).toBeGreaterThanOrEqual(before + 7200 * 1000);
    expect(expiresAt).toBeLessThanOrEqual(after + 7200 * 1000);
  });

  it('a URL signed for one second stops working once it has passed', async () => {
    const me = await teacher();
    const rec = await insertReadyRecording(t.db, t.storage, { schoolId: me.schoolId, ownerId: me.id });
    const urls = createMediaUrls(t.storage, 120);
    const lasting = await urls.playback(rec.keys.rendition, 12);
    const brief = await urls.playback(rec.keys.rendition, 12, { expiresInSeconds: 1 });
    expect(expiresParam(brief.url)).toBe(1);
    await new Promise((resolve) => setTimeout(resolve, 2100));
    const expired = await fetch(brief.url);
    // S3 answers an expired presigned URL with 403 AccessDenied "Request has expired" (AWS S3 docs, presigned URLs).
    expect(expired.status).toBe(403);
    expect(await expired.text()).toContain('Request has expired');
    expect((await fetch(lasting.url)).status).toBe(200);
  });

  it('409 not_ready with a sentence while processing, uploading or failed', async () => {
    const me = await teacher();
    const processing = await insertRecording(t.db, { schoolId: me.schoolId, ownerId: me.id, state: 'processing', progress: 40 });
    const res = await me.client.get(`/api/recordings/${processing.id}/playback`);
    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({
      code: 'not_ready',
      message: 'This recording is still being prepared for playback (40% done). It plays once it is ready.',
    });
    const uploading = await insertRecording(t.db, { schoolId: me.schoolId, ownerId: me.id, state: 'uploading' });
    expect((await me.client.get(`/api/recordings/${uploading.id}/playback`)).body.error.message).toBe(
      'This recording is still uploading, so it cannot be played yet.',
    );
    const failed = await insertRecording(t.db, {
      schoolId: me.schoolId,
      ownerId: me.id,
      state: 'failed',
      failureCode: 'no_video_track',
      failureMessage: 'The file has no video track.',
    });
    expect((await me.client.get(`/api/recordings/${failed.id}/playback`)).body.error.message).toBe(
      'This recording could not be prepared for playback, so there is nothing to play. The file has no video track.',
    );
    expect((await me.client.get(`/api/recordings/${failed.id}/thumbnails.vtt`)).status).toBe(409);
  });
});

describe('GET /api/recordings/:recordingId/download', () => {
  it('302 to the original, as an attachment under its own name with spaces and non-ASCII letters', async () => {
    const me = await teacher();
    const name = 'Pendel 2 – Überlauf ü "final".mov';
    const rec = await insertReadyRecording(t.db, t.storage, { schoolId: me.schoolId, ownerId: me.id, originalFileName: name });
    const res = await me.client.get(`/api/recordings/${rec.id}/download`);
    expect(res.status).toBe(302);
    const object = await fetch(res.headers.location!);
    expect(object.status).toBe(200);
    const disposition = object.headers.get('content-disposition')!;
    // RFC 6266 §4.3: an ASCII `filename` fallback and the exact name as RFC 5987 `filename*`.
    expect(disposition).toMatch(/^attachment; filename="[\x20-\x7e]+"; filename\*=UTF-8''/);
    const extended = disposition.match(/filename\*=UTF-8''([^;]+)$/)![1]!;
    expect(decodeURIComponent(extended)).toBe(name);
    expect(Buffer.from(await object.arrayBuffer())).toEqual(patternBytes(3000, 1));
  });

  it('404 when the original is no longer stored, 409 while still uploading', async () => {
    const me = await teacher();
    const refused = await insertRecording(t.db, { schoolId: me.schoolId, ownerId: me.id, state: 'failed', failureCode: 'too_large' });
    const gone = await me.client.get(`/api/recordings/${refused.id}/download`);
    expect(gone.status).toBe(404);
    expect(gone.body.error.message).toBe('The original file of this recording was not found.');
    const uploading = await insertRecording(t.db, { schoolId: me.schoolId, ownerId: me.id, state: 'uploading' });
    expect((await me.client.get(`/api/recordings/${uploading.id}/download`)).status).toBe(409);
  });
});

describe('GET /api/recordings/:recordingId/thumbnails.vtt', () => {
  it('one cue per tile across sheets, the last ending at the duration, each URL fetching its sheet', async () => {
    const me = await teacher();
    const rec = await insertReadyRecording(t.db, t.storage, { schoolId: me.schoolId, ownerId: me.id, durationSeconds: 22, tiles: [4, 2] });
    const res = await me.client.get(`/api/recordings/${rec.id}/thumbnails.vtt`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/vtt; charset=utf-8');
    expect(res.headers['cache-control']).toBe('private, no-store');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    // A thumbnails track is metadata: its cue payload is raw text, so URLs keep their & unescaped
    // (W3C WebVTT, "WebVTT metadata text").
    const parsed = new webvtt.WebVTTParser().parse(res.text, 'metadata');
    expect(parsed.errors).toEqual([]);
    const cues = parsed.cues.map((cue) => ({ start: cue.startTime, end: cue.endTime, fragment: cue.text.split('#')[1] }));
    expect(cues).toEqual([
      { start: 0, end: 4, fragment: 'xywh=0,0,160,90' },
      { start: 4, end: 8, fragment: 'xywh=160,0,160,90' },
      { start: 8, end: 12, fragment: 'xywh=0,90,160,90' },
      { start: 12, end: 16, fragment: 'xywh=160,90,160,90' },
      { start: 16, end: 20, fragment: 'xywh=0,0,160,90' },
      { start: 20, end: 22, fragment: 'xywh=160,0,160,90' },
    ]);
    const sheetUrls = [...new Set(parsed.cues.map((cue) => cue.text.split('#')[0]!))];
    expect(sheetUrls.map((url) => new URL(url).pathname.split('/').pop())).toEqual(['sheet-001.jpg', 'sheet-002.jpg']);
    for (const [index, url] of sheetUrls.entries()) {
      const sheet = await fetch(url);
      expect(sheet.status).toBe(200);
      expect(Buffer.from(await sheet.arrayBuffer())).toEqual(patternBytes(800, 10 + index));
    }
  });

  it('404 for a ready recording without thumbnails, and playback then offers none', async () => {
    const me = await teacher();
    const rec = await insertRecording(t.db, { schoolId: me.schoolId, ownerId: me.id, thumbnails: null });
    const res = await me.client.get(`/api/recordings/${rec.id}/thumbnails.vtt`);
    expect(res.status).toBe(404);
    expect(res.body.error.message).toBe('The thumbnail track of this recording was not found.');
    expect((await me.client.get(`/api/recordings/${rec.id}/playback`)).body.thumbnailsUrl).toBeNull();
  });
});

describe('another school', () => {
  it('gets 404 for the recording and every URL of it', async () => {
    const owner = await teacher();
    const rec = await insertReadyRecording(t.db, t.storage, { schoolId: owner.schoolId, ownerId: owner.id });
    const caption = await owner.client.send('post', `/api/recordings/${rec.id}/captions`, {
      language: 'en',
      label: 'English',
      vtt: 'WEBVTT\n\n00:00.000 --> 00:02.000\nHello\n',
    });
    expect(caption.status).toBe(201);
    const outsider = await teacher((await buildSchool(t.db)).id);
    const base = `/api/recordings/${rec.id}`;
    const captionPath = `${base}/captions/${caption.body.id}`;
    const answers = [
      await outsider.client.get(base),
      await outsider.client.get(`${base}/playback`),
      await outsider.client.get(`${base}/download`),
      await outsider.client.get(`${base}/thumbnails.vtt`),
      await outsider.client.get(`${captionPath}.vtt`),
      await outsider.client.send('patch', base, { title: 'Taken' }),
      await outsider.client.send('delete', base),
      await outsider.client.send('post', `${base}/retry`),
      await outsider.client.send('post', `${base}/captions`, {
        language: 'fr',
        label: 'Français',
        vtt: 'WEBVTT\n\n00:00.000 --> 00:01.000\nx\n',
      }),
      await outsider.client.send('patch', captionPath, { label: 'Taken' }),
      await outsider.client.send('delete', captionPath),
    ];
    expect(answers.map((res) => [res.status, res.body.error?.message])).toEqual(answers.map(() => [404, 'That recording was not found.']));
    expect(await t.storage.listKeys(rec.prefix)).toHaveLength(4);
    expect((await owner.client.get(`${captionPath}.vtt`)).status).toBe(200);
  });
});
