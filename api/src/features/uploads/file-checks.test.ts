import { describe, expect, it } from 'vitest';
import { checkDeclaredFile, completionVerdict, storedContentType, titleFromFileName } from './file-checks';
import { partProblems, partsToJoin } from './part-checks';

const GIB = 1024 ** 3;
const MIB = 1024 ** 2;
const max = 2 * GIB;

describe('checkDeclaredFile', () => {
  const check = (type: string, fileName = 'clip.mp4', size = 10) => checkDeclaredFile({ type, fileName, size }, max);

  it('accepts any video type, whatever the name', () => {
    expect(check('video/mp4')).toBeNull();
    expect(check('video/quicktime', 'IMG_1234.MOV')).toBeNull();
    expect(check('video/x-matroska; codecs="avc1"', 'no extension')).toBeNull();
  });

  it('accepts an unhelpful type only with a video extension', () => {
    for (const ext of ['mp4', 'MOV', 'm4v', 'webm', 'mkv', 'avi', '3gp', 'mts', 'm2ts']) expect(check('', `a.${ext}`)).toBeNull();
    // RFC 4337 registers application/mp4 for MP4 files.
    expect(check('application/mp4', 'a.mp4')).toBeNull();
    // Apache httpd's mime.types maps .mts to model/vnd.mts (apache/httpd pull request #372 discusses it).
    expect(check('model/vnd.mts', 'camera.MTS')).toBeNull();
    expect(check('application/octet-stream', 'a.bin')?.code).toBe('not_video');
    expect(check('', '.mp4')?.code).toBe('not_video');
  });

  it('names the kind of a clear non-video', () => {
    expect(check('application/pdf')?.message).toBe('This file is a PDF, not a video.');
    expect(check('image/jpeg')?.message).toBe('This file is a picture (JPEG), not a video.');
    expect(check('image/png')?.message).toBe('This file is a picture (PNG), not a video.');
    expect(check('image/heic')?.message).toBe('This file is a picture (HEIC), not a video.');
    expect(check('audio/mp4', 'voice.m4a')?.message).toBe('This file is audio only, not a video.');
    expect(check('application/vnd.openxmlformats-officedocument.presentationml.presentation')?.message).toBe(
      'This file is a PowerPoint presentation, not a video.',
    );
    expect(check('text/plain')?.message).toBe('This file is a text file, not a video.');
    expect(check('application/x-tar')?.message).toBe('This file is of type application/x-tar, not a video.');
  });

  it('checks the size before the type', () => {
    expect(check('application/pdf', 'a.pdf', 0)).toEqual({
      code: 'empty',
      message: 'This file is empty (0 bytes): choose the recording itself.',
    });
    expect(check('video/mp4', 'a.mp4', max)).toBeNull();
    expect(check('video/mp4', 'a.mp4', max + 1)).toEqual({ code: 'too_large', message: 'The file is larger than the 2 GiB limit.' });
    expect(checkDeclaredFile({ type: 'video/mp4', fileName: 'a.mp4', size: 5 * GIB }, 4 * GIB)?.message).toBe(
      'The file is larger than the 4 GiB limit.',
    );
  });
});

describe('names and types kept', () => {
  it('takes the title from the name without its extension', () => {
    expect(titleFromFileName('Falling magnet, take 2.mp4')).toBe('Falling magnet, take 2');
    expect(titleFromFileName('lab.week 3.final.MOV')).toBe('lab.week 3.final');
    expect(titleFromFileName('no extension')).toBe('no extension');
    expect(titleFromFileName('.mp4')).toBe('.mp4');
    expect(titleFromFileName(`${'x'.repeat(250)}.mp4`)).toHaveLength(200);
  });

  it('stores a plain type, or generic binary for anything odd', () => {
    expect(storedContentType('video/mp4; codecs="avc1"')).toBe('video/mp4');
    expect(storedContentType('')).toBe('application/octet-stream');
    expect(storedContentType('video/mp4\r\nX-Evil: 1')).toBe('application/octet-stream');
  });
});

describe('completionVerdict', () => {
  const facts = { storedSize: 11 * MIB, declaredSize: 11 * MIB, maxBytes: max, usedBytes: 0, quotaBytes: 20 * GIB };

  it('accepts the promised size within limit and quota', () => {
    expect(completionVerdict(facts)).toEqual({ ok: true });
    expect(completionVerdict({ ...facts, usedBytes: 20 * GIB - 11 * MIB })).toEqual({ ok: true });
  });

  it('refuses, in order: another size, over the limit, over the quota', () => {
    expect(completionVerdict({ ...facts, storedSize: 9 * MIB })).toMatchObject({ ok: false, code: 'size_mismatch' });
    expect(completionVerdict({ ...facts, storedSize: 3 * GIB, declaredSize: 3 * GIB })).toEqual({
      ok: false,
      code: 'too_large',
      message: 'The file is larger than the 2 GiB limit.',
    });
    expect(completionVerdict({ ...facts, usedBytes: 20 * GIB - 11 * MIB + 1 })).toMatchObject({ ok: false, code: 'quota_exceeded' });
  });
});

describe('partProblems', () => {
  const stored = [1, 2, 3].map((n) => ({ partNumber: n, size: 8 * MIB, etag: `"etag-${n}"` }));
  const sent = [1, 2, 3].map((n) => ({ partNumber: n, etag: `"etag-${n}"` }));

  it('accepts all parts stored with the ETags sent, quoted or not', () => {
    expect(partProblems(3, stored, sent)).toBeNull();
    expect(
      partProblems(
        3,
        stored,
        sent.map((p) => ({ ...p, etag: p.etag.replace(/"/g, '') })),
      ),
    ).toBeNull();
  });

  it('lists missing parts in a sentence', () => {
    expect(partProblems(3, stored.slice(0, 1), sent)?.message).toBe(
      'Parts 2 and 3 of 3 are not stored yet: send them, then finish the upload.',
    );
    const many = partProblems(30, [], [{ partNumber: 1, etag: 'x' }]);
    expect(many?.message).toBe(
      'Parts 1, 2, 3, 4, 5, 6, 7, 8, 9, 10 and 20 more of 30 are not stored yet: send them, then finish the upload.',
    );
    expect(many?.code).toBe('parts_missing');
  });

  it('names parts whose ETag differs or that the list leaves out', () => {
    const problem = partProblems(3, stored, [sent[0]!, { partNumber: 2, etag: 'other' }]);
    expect(problem?.code).toBe('parts_mismatch');
    expect(problem?.details).toEqual([
      { path: 'parts', message: 'Part 2 has another ETag in storage.' },
      { path: 'parts', message: 'Part 3 is missing from the list.' },
    ]);
  });

  it('joins exactly parts 1..count in order', () => {
    const extra = [...stored].reverse().concat({ partNumber: 4, size: 1, etag: 'x' });
    expect(partsToJoin(3, extra).map((p) => p.partNumber)).toEqual([1, 2, 3]);
  });
});
