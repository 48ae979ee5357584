import { formatBytes } from '@core/recordings';
import type { FailureCode, UploadResume } from '@core/contracts';
import { LIMITS } from '@core/limits';

/** Extensions of the containers phones and cameras write; used when the browser gives no useful type. */
export const VIDEO_EXTENSIONS = ['mp4', 'mov', 'm4v', 'webm', 'mkv', 'avi', '3gp', 'mts', 'm2ts'] as const;

/** For the file picker's accept attribute. */
export const ACCEPT = ['video/*', ...VIDEO_EXTENSIONS.map((ext) => `.${ext}`)];

/**
 * Types reported for video files without saying "video": none at all, the generic binary type,
 * MP4's application registration (RFC 4337), and model/vnd.mts, which Apache's mime.types table
 * (copied by many MIME libraries) gives .mts camera files after an unrelated IANA registration.
 */
const AMBIGUOUS_TYPES = new Set(['', 'application/octet-stream', 'application/mp4', 'model/vnd.mts']);

/** Clear non-videos, named the way a teacher would say them. */
const KIND_BY_TYPE: Record<string, string> = {
  'application/pdf': 'a PDF',
  'application/zip': 'a ZIP archive',
  'application/x-zip-compressed': 'a ZIP archive',
  'application/msword': 'a Word document',
  'application/vnd.openxmlformats-officedocument.wordprocessingml.document': 'a Word document',
  'application/vnd.ms-powerpoint': 'a PowerPoint presentation',
  'application/vnd.openxmlformats-officedocument.presentationml.presentation': 'a PowerPoint presentation',
  'application/vnd.ms-excel': 'a spreadsheet',
  'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet': 'a spreadsheet',
  'application/vnd.oasis.opendocument.text': 'a text document',
  'application/vnd.oasis.opendocument.presentation': 'a presentation',
  'application/vnd.oasis.opendocument.spreadsheet': 'a spreadsheet',
  'application/json': 'a data file (JSON)',
  'image/svg+xml': 'a drawing (SVG)',
  'image/jpeg': 'a picture (JPEG)',
  'image/heic': 'a picture (HEIC)',
  'image/heif': 'a picture (HEIF)',
};

export type FileProblem = { code: 'empty' | 'too_large' | 'not_video'; message: string };

function essence(type: string): string {
  return type.split(';')[0]!.trim().toLowerCase();
}

function extensionOf(fileName: string): string {
  const dot = fileName.lastIndexOf('.');
  return dot > 0 ? fileName.slice(dot + 1).toLowerCase() : '';
}

/** What kind of non-video a MIME type names, or null when it is (or may be) a video. */
function nonVideoKind(type: string, fileName: string): string | null {
  if (type.startsWith('video/')) return null;
  if (AMBIGUOUS_TYPES.has(type)) {
    return (VIDEO_EXTENSIONS as readonly string[]).includes(extensionOf(fileName)) ? null : 'unknown';
  }
  if (KIND_BY_TYPE[type]) return KIND_BY_TYPE[type];
  if (type.startsWith('audio/')) return 'audio only';
  if (type.startsWith('image/')) return `a picture (${type.slice('image/'.length).replace(/^x-/, '').toUpperCase()})`;
  if (type.startsWith('text/')) return 'a text file';
  return `of type ${type}`;
}

/** Checks the size and type the browser declared before anything is stored. */
export function checkDeclaredFile(input: { fileName: string; size: number; type: string }, maxBytes: number): FileProblem | null {
  if (input.size === 0) return { code: 'empty', message: 'This file is empty (0 bytes): choose the recording itself.' };
  if (input.size > maxBytes) return { code: 'too_large', message: tooLargeMessage(maxBytes) };
  const kind = nonVideoKind(essence(input.type), input.fileName);
  if (kind === 'unknown') {
    return {
      code: 'not_video',
      message: `This file does not look like a video: its name does not end in a video extension (${VIDEO_EXTENSIONS.join(', ')}) and the browser did not say what it is.`,
    };
  }
  if (kind) return { code: 'not_video', message: `This file is ${kind}, not a video.` };
  return null;
}

export function tooLargeMessage(maxBytes: number): string {
  return `The file is larger than the ${formatBytes(maxBytes)} limit.`;
}

/** The type the original is stored with until the worker sniffs the real one. */
export function storedContentType(type: string): string {
  const value = essence(type);
  // Only a plain type/subtype goes into an S3 header; anything odd is stored as generic binary.
  return /^[a-z0-9][a-z0-9!#$&^_.+-]*\/[a-z0-9][a-z0-9!#$&^_.+-]*$/.test(value) ? value : 'application/octet-stream';
}

/** "Chemistry demo.final.mp4" -> "Chemistry demo.final": the title a new recording starts with. */
export function titleFromFileName(fileName: string): string {
  const dot = fileName.lastIndexOf('.');
  const stem = (dot > 0 ? fileName.slice(0, dot) : fileName).trim();
  return (stem || fileName.trim() || 'Untitled recording').slice(0, LIMITS.recordingTitleMax);
}

export function quotaMessage(usedBytes: number, fileBytes: number, quotaBytes: number): string {
  const free = Math.max(0, quotaBytes - usedBytes);
  return (
    `This file (${formatBytes(fileBytes)}) does not fit in your storage: you use ${formatBytes(usedBytes)} of your ` +
    `${formatBytes(quotaBytes)} limit, so ${free === 0 ? 'nothing' : formatBytes(free)} is free. ` +
    'Delete recordings you no longer need, or ask your admin for more space.'
  );
}

function sizeText(a: number, b: number): [string, string] {
  // Two sizes that round to the same text are told apart in bytes.
  const [x, y] = [formatBytes(a), formatBytes(b)];
  return x === y ? [`${a.toLocaleString('en-GB')} bytes`, `${b.toLocaleString('en-GB')} bytes`] : [x, y];
}

interface StoredFacts {
  fileName: string;
  size: number;
  lastModified: number;
  firstPartSha256: string;
}

/** Every way a re-chosen file differs from the unfinished upload, most telling first. */
export function fileDifferences(chosen: UploadResume, stored: StoredFacts): { path: string; message: string }[] {
  const differences: { path: string; message: string }[] = [];
  if (chosen.size !== stored.size) {
    const [now, then] = sizeText(chosen.size, stored.size);
    differences.push({ path: 'size', message: `it is ${now}, the unfinished upload is ${then}` });
  }
  if (chosen.fileName !== stored.fileName) {
    differences.push({ path: 'fileName', message: `it is called “${chosen.fileName}”, the unfinished upload is “${stored.fileName}”` });
  }
  if (chosen.lastModified !== stored.lastModified) {
    const when = (ms: number) =>
      new Date(ms)
        .toISOString()
        .replace('T', ' ')
        .replace(/\.\d+Z$/, ' UTC');
    differences.push({
      path: 'lastModified',
      message: `it was last changed ${when(chosen.lastModified)}, the unfinished upload’s file ${when(stored.lastModified)}`,
    });
  }
  if (chosen.firstPartSha256 !== stored.firstPartSha256) {
    differences.push({ path: 'firstPartSha256', message: 'its first part has different contents from the unfinished upload’s' });
  }
  return differences;
}

export type CompletionVerdict =
  { ok: true } | { ok: false; code: Extract<FailureCode, 'size_mismatch' | 'too_large' | 'quota_exceeded'>; message: string };

/** Whether an assembled object may become a recording: its real size against what was promised and allowed. */
export function completionVerdict(facts: {
  storedSize: number;
  declaredSize: number;
  maxBytes: number;
  usedBytes: number;
  quotaBytes: number;
}): CompletionVerdict {
  const { storedSize, declaredSize, maxBytes, usedBytes, quotaBytes } = facts;
  if (storedSize !== declaredSize) {
    const [stored, declared] = sizeText(storedSize, declaredSize);
    return {
      ok: false,
      code: 'size_mismatch',
      message: `The stored file is ${stored} but the upload said ${declared}: the file changed or was cut short while uploading. Upload it again.`,
    };
  }
  if (storedSize > maxBytes) return { ok: false, code: 'too_large', message: tooLargeMessage(maxBytes) };
  if (usedBytes + storedSize > quotaBytes)
    return { ok: false, code: 'quota_exceeded', message: quotaMessage(usedBytes, storedSize, quotaBytes) };
  return { ok: true };
}
