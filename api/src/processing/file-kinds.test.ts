import { describe, expect, it } from 'vitest';
import { describeMime, UNRECOGNISED_LABEL } from './file-kinds';
import { FAILURE_MESSAGES, notVideoMessage } from './media-failure';

describe('describeMime', () => {
  it.each([
    ['application/pdf', 'a PDF'],
    ['image/jpeg', 'a picture (JPEG)'],
    ['image/heic', 'a picture (HEIC)'],
    ['image/x-icon', 'a picture'],
    ['application/vnd.openxmlformats-officedocument.wordprocessingml.document', 'a Word document'],
    ['application/vnd.openxmlformats-officedocument.presentationml.presentation', 'a PowerPoint presentation'],
    ['application/zip', 'a ZIP archive'],
    ['audio/mpeg', 'audio only'],
    ['audio/x-m4a', 'audio only'],
    ['text/vtt', 'a captions file (WebVTT)'],
  ])('names %s "%s", not a video', (mime, label) => {
    expect(describeMime(mime)).toEqual({ mime, label, isVideo: false, recognised: true });
  });

  it.each([
    ['video/mp4', 'an MP4 video'],
    ['video/quicktime', 'a QuickTime video (MOV)'],
    ['video/mp2t', 'a camcorder video (MTS)'],
    ['application/mxf', 'a camera video (MXF)'],
    ['video/x-something-new', 'a video'],
  ])('takes %s as a video container', (mime, label) => {
    expect(describeMime(mime)).toMatchObject({ label, isVideo: true });
  });

  it('names other kinds by their extension, with the article the letter takes', () => {
    expect(describeMime('application/x-sqlite3', 'sqlite').label).toBe('an SQLITE file');
    expect(describeMime('application/vnd.adobe.photoshop', 'psd').label).toBe('a PSD file');
    expect(describeMime('application/x-weird', undefined).label).toBe('another kind of file');
  });

  it('calls unknown bytes unrecognised and not video', () => {
    expect(describeMime(undefined)).toEqual({
      mime: 'application/octet-stream',
      label: UNRECOGNISED_LABEL,
      isVideo: false,
      recognised: false,
    });
    expect(UNRECOGNISED_LABEL).toBe('not a file type Pinfield recognises');
  });
});

describe('notVideoMessage', () => {
  it('says what the file is', () => {
    expect(notVideoMessage(describeMime('application/pdf'))).toBe('This file is a PDF, not a video.');
    expect(notVideoMessage(describeMime('image/png'))).toBe('This file is a picture (PNG), not a video.');
  });
  it('has its own sentence for unknown bytes', () => {
    expect(notVideoMessage(describeMime(null))).toBe(FAILURE_MESSAGES.unrecognised);
  });
});
