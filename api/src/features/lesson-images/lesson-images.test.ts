import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LessonImageDtoSchema } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { createLesson, member, readyRecording, type Member } from '../lessons/lessons.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

// 2x2 pictures written by ffmpeg (and the classic 1x1 GIF), so the sniffer sees real files.
const IMAGES = {
  png: 'iVBORw0KGgoAAAANSUhEUgAAAAIAAAACCAIAAAD91JpzAAAACXBIWXMAAAABAAAAAQBPJcTWAAAAEElEQVR4nGMwTDkJRAwQCgAj9gV5wT7pWAAAAABJRU5ErkJggg==',
  webp: 'UklGRjYAAABXRUJQVlA4ICoAAADQAQCdASoCAAIAAgA0JaACdLoB+AADsAD+7Qcv/PTNeYP8nP+3Jl5tsAA=',
  gif: 'R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7',
  jpeg: '/9j/4AAQSkZJRgABAgAAAQABAAD//gAQTGF2YzU5LjM3LjEwMAD/2wBDAAgEBAQEBAUFBQUFBQYGBgYGBgYGBgYGBgYHBwcICAgHBwcGBgcHCAgICAkJCQgICAgJCQoKCgwMCwsODg4RERT/xABLAAEBAAAAAAAAAAAAAAAAAAAABQEBAAAAAAAAAAAAAAAAAAAABhABAAAAAAAAAAAAAAAAAAAAABEBAAAAAAAAAAAAAAAAAAAAAP/AABEIAAIAAgMBIgACEQADEQD/2gAMAwEAAhEDEQA/AIIB2Ov/2Q==',
};
const bytesOf = (kind: keyof typeof IMAGES) => Buffer.from(IMAGES[kind], 'base64');
const PDF = Buffer.from('%PDF-1.4\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n');
const SVG = Buffer.from('<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>\n');

async function owner(): Promise<{ teacher: Member; lessonId: string }> {
  const teacher = await member(t, ['teacher']);
  const recording = await readyRecording(t, teacher);
  return { teacher, lessonId: (await createLesson(teacher.client, recording.id)).id };
}

/** The editor's upload: raw bytes, the name URI-encoded in X-File-Name, the CSRF token. */
async function upload(client: Client, lessonId: string, bytes: Buffer, headers: Record<string, string> = {}) {
  const token = await client.refreshCsrf();
  const req = client.agent.post(`/api/lessons/${lessonId}/images`).set('X-CSRF-Token', token).set('Content-Type', 'image/png');
  for (const [name, value] of Object.entries({ 'X-File-Name': 'coil diagram.png', ...headers })) req.set(name, value);
  return req.send(bytes);
}

describe('POST /api/lessons/:lessonId/images', () => {
  it('401 signed out, 403 for a colleague who cannot edit and for a student, 404 for another school', async () => {
    const { teacher, lessonId } = await owner();
    expect((await upload(new Client(t), lessonId, bytesOf('png'))).status).toBe(401);
    const colleague = await member(t, ['teacher'], { schoolId: teacher.schoolId });
    expect((await upload(colleague.client, lessonId, bytesOf('png'))).status).toBe(404);
    const student = await member(t, ['student'], { schoolId: teacher.schoolId });
    expect((await upload(student.client, lessonId, bytesOf('png'))).status).toBe(403);
    await teacher.client.send('patch', `/api/lessons/${lessonId}`, { shared: true });
    const sharedTo = await member(t, ['substitute', 'teacher'], { schoolId: teacher.schoolId });
    const refused = await upload(sharedTo.client, lessonId, bytesOf('png'));
    expect(refused.status).toBe(403);
    const stranger = await member(t, ['teacher', 'admin']);
    expect((await upload(stranger.client, lessonId, bytesOf('png'))).status).toBe(404);
  });

  it('400 without a usable X-File-Name header', async () => {
    const { teacher, lessonId } = await owner();
    const missing = await teacher.client.agent
      .post(`/api/lessons/${lessonId}/images`)
      .set('X-CSRF-Token', await teacher.client.refreshCsrf())
      .send(bytesOf('png'));
    expect(missing.status).toBe(400);
    expect(missing.body.error.details).toEqual([
      { path: 'x-file-name', message: 'Send the image’s file name in the X-File-Name header (URI-encoded).' },
    ]);
    const badlyEncoded = await upload(teacher.client, lessonId, bytesOf('png'), { 'X-File-Name': '%E0%A4%A.png' });
    expect(badlyEncoded.body.error.details[0].message).toBe(
      'The X-File-Name header is not a URI-encoded name (encode it with encodeURIComponent).',
    );
  });

  it('201 for a PNG: stored under the school’s prefix with the sniffed type, and served with it', async () => {
    const { teacher, lessonId } = await owner();
    const res = await upload(teacher.client, lessonId, bytesOf('png'), {
      'X-File-Name': encodeURIComponent('Spule [Feld].png'),
      'Content-Type': 'image/jpeg',
    });
    expect(res.status).toBe(201);
    const image = LessonImageDtoSchema.parse(res.body);
    expect(image).toEqual({
      id: image.id,
      url: `/api/lesson-images/${image.id}`,
      markdown: `![Spule Feld](/api/lesson-images/${image.id})`,
      contentType: 'image/png',
      size: bytesOf('png').length,
    });
    const row = await t.db('lesson_images').where({ id: image.id }).first();
    expect(row).toMatchObject({ school_id: teacher.schoolId, lesson_id: lessonId, uploaded_by: teacher.id, file_name: 'Spule [Feld].png' });
    expect(row.object_key).toBe(`schools/${teacher.schoolId}/lesson-images/${image.id}`);

    const served = await teacher.client.get(image.url);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/png');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect(served.headers['cache-control']).toBe('private, max-age=86400');
    expect(served.headers['content-security-policy']).toBe("default-src 'none'; sandbox");
    expect(served.headers['content-disposition']).toMatch(/^inline; filename=/);
    expect(Buffer.compare(served.body as Buffer, bytesOf('png'))).toBe(0);
  });

  it('accepts JPEG, GIF and WebP by their bytes, whatever the name says', async () => {
    const { teacher, lessonId } = await owner();
    for (const [kind, type] of [
      ['jpeg', 'image/jpeg'],
      ['gif', 'image/gif'],
      ['webp', 'image/webp'],
    ] as const) {
      const res = await upload(teacher.client, lessonId, bytesOf(kind), { 'X-File-Name': 'picture.png' });
      expect(res.status).toBe(201);
      expect(res.body.contentType).toBe(type);
    }
  });

  it('refuses a PDF renamed .png, an SVG and an empty file with a sentence saying why; nothing is stored', async () => {
    const { teacher, lessonId } = await owner();
    const pdf = await upload(teacher.client, lessonId, PDF, { 'X-File-Name': 'diagram.png' });
    expect(pdf.status).toBe(415);
    expect(pdf.body.error).toEqual({ code: 'image_type_refused', message: 'This file is a PDF, not an image (PNG, JPEG, GIF or WebP).' });
    const svg = await upload(teacher.client, lessonId, SVG, { 'X-File-Name': 'field.svg', 'Content-Type': 'image/svg+xml' });
    expect(svg.status).toBe(415);
    expect(svg.body.error.message).toBe(
      'This file is an SVG drawing, which Pinfield does not accept because it can carry scripts: save it as a PNG or JPEG and add it again.',
    );
    const empty = await upload(teacher.client, lessonId, Buffer.alloc(0));
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toBe('“coil diagram.png” is empty (0 bytes): choose the image again.');
    expect(await t.db('lesson_images').where({ lesson_id: lessonId }).count({ n: '*' })).toEqual([{ n: 0 }]);
    expect(await t.storage.listKeys(`schools/${teacher.schoolId}/lesson-images/`)).toEqual([]);
  });

  it('413 over the limit, with the limit in the sentence', async () => {
    const { teacher, lessonId } = await owner();
    const big = Buffer.concat([bytesOf('png'), Buffer.alloc(LIMITS.lessonImageBytesMax)]);
    const res = await upload(teacher.client, lessonId, big);
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({
      code: 'payload_too_large',
      message: 'This image is larger than 5 MiB: make it smaller (or save it as JPEG) and add it again.',
    });
  });
});

describe('GET /api/lesson-images/:imageId', () => {
  it('any member of the school may load it (students too); another school gets 404, signed out 401', async () => {
    const { teacher, lessonId } = await owner();
    const image = (await upload(teacher.client, lessonId, bytesOf('gif'))).body as { url: string };
    const student = await member(t, ['student'], { schoolId: teacher.schoolId });
    const forStudent = await student.client.get(image.url);
    expect(forStudent.status).toBe(200);
    expect(forStudent.headers['content-type']).toBe('image/gif');
    const stranger = await member(t, ['teacher', 'admin']);
    const foreign = await stranger.client.get(image.url);
    expect(foreign.status).toBe(404);
    expect(foreign.body.error).toEqual({ code: 'not_found', message: 'That image was not found.' });
    expect((await new Client(t).get(image.url)).status).toBe(401);
  });
});
