import { z } from 'zod';
import { LIMITS } from '../limits';
import { IdSchema } from './common';
import { LessonStateSchema } from './lessons';

export const RECORDING_STATES = ['uploading', 'processing', 'ready', 'failed'] as const;
export const RecordingStateSchema = z.enum(RECORDING_STATES);
export type RecordingState = z.infer<typeof RecordingStateSchema>;

/** Why a recording failed; each comes with a sentence the teacher can act on. */
export const FAILURE_CODES = [
  'not_video', // the bytes are another kind of file ("this file is a PDF, not a video")
  'no_video_track', // a container with audio only, or nothing playable
  'truncated', // the file stops early ("stops early at 00:41")
  'empty', // zero bytes stored
  'too_large', // stored size over UPLOAD_MAX_BYTES
  'size_mismatch', // stored size differs from the size declared when the upload started
  'quota_exceeded', // the teacher's storage quota would be passed
  'unreadable', // ffmpeg could not decode it at all
  'timed_out', // processing passed PROCESSING_TIMEOUT_MINUTES
  'processing_error', // anything else: retry is offered
] as const;
export const FailureCodeSchema = z.enum(FAILURE_CODES);
export type FailureCode = z.infer<typeof FailureCodeSchema>;

const fileName = z
  .string({ error: 'The file needs a name.' })
  .min(1, { error: 'The file needs a name.' })
  .max(LIMITS.fileNameMax, { error: `A file name has at most ${LIMITS.fileNameMax} characters.` });
const sha256Hex = z.string().regex(/^[0-9a-f]{64}$/, { error: 'Expected the SHA-256 of the first part, as 64 lowercase hex digits.' });
const fileFacts = {
  fileName,
  size: z.number({ error: 'Expected the file size in bytes.' }).int().min(0),
  /** The browser's File.lastModified, in milliseconds since 1970. */
  lastModified: z.number({ error: 'Expected the file’s last-modified time.' }).int().min(0),
  /** SHA-256 of the file's first part (of the size `partSizeFor(size)` gives), so a re-chosen file can be matched. */
  firstPartSha256: sha256Hex,
};

// ---- uploads -------------------------------------------------------------------------------

export const UploadCreateSchema = z.object({
  ...fileFacts,
  /** The browser's File.type; may be empty (the worker sniffs the real type from the bytes). */
  type: z.string().max(255),
});
export type UploadCreate = z.infer<typeof UploadCreateSchema>;

/** A re-chosen file offered to continue an unfinished upload. */
export const UploadResumeSchema = z.object(fileFacts);
export type UploadResume = z.infer<typeof UploadResumeSchema>;

export const UploadDtoSchema = z.object({
  id: IdSchema,
  recordingId: IdSchema,
  /** Object key in storage; Uppy passes it back to the signing calls. */
  key: z.string(),
  fileName: z.string(),
  size: z.number().int(),
  lastModified: z.number().int(),
  partSize: z.number().int(),
  partCount: z.number().int(),
  createdAt: z.string(),
  lastActivityAt: z.string(),
});
export type UploadDto = z.infer<typeof UploadDtoSchema>;

/** An unfinished upload in the library: the file must be chosen again to continue it. */
export const OpenUploadDtoSchema = UploadDtoSchema.extend({
  uploadedBytes: z.number().int(),
  uploadedParts: z.number().int(),
});
export type OpenUploadDto = z.infer<typeof OpenUploadDtoSchema>;

export const UploadLimitsDtoSchema = z.object({
  maxBytes: z.number().int(),
  quotaBytes: z.number().int(),
  usedBytes: z.number().int(),
  /** For the file picker's accept attribute: MIME patterns and extensions. */
  accept: z.array(z.string()),
});
export type UploadLimitsDto = z.infer<typeof UploadLimitsDtoSchema>;

export const OpenUploadListDtoSchema = z.object({ uploads: z.array(OpenUploadDtoSchema), limits: UploadLimitsDtoSchema });
export type OpenUploadListDto = z.infer<typeof OpenUploadListDtoSchema>;

export const PartParamsSchema = z.object({
  uploadId: IdSchema,
  partNumber: z.coerce.number({ error: 'Expected a part number.' }).int().min(1).max(10_000),
});

export const SignedPartDtoSchema = z.object({ url: z.string(), expiresAt: z.string(), contentLength: z.number().int() });
export type SignedPartDto = z.infer<typeof SignedPartDtoSchema>;

export const StoredPartDtoSchema = z.object({ partNumber: z.number().int(), size: z.number().int(), etag: z.string() });
export const StoredPartListDtoSchema = z.object({ parts: z.array(StoredPartDtoSchema) });
export type StoredPartListDto = z.infer<typeof StoredPartListDtoSchema>;

export const UploadCompleteSchema = z.object({
  parts: z
    .array(z.object({ partNumber: z.number().int().min(1).max(10_000), etag: z.string().min(1).max(200) }))
    .min(1, { error: 'An upload needs at least one part.' })
    .max(10_000),
});
export type UploadComplete = z.infer<typeof UploadCompleteSchema>;

// ---- recordings ----------------------------------------------------------------------------

export const CaptionDtoSchema = z.object({
  id: IdSchema,
  language: z.string(),
  label: z.string(),
  isDefault: z.boolean(),
  cueCount: z.number().int(),
  /** API path of the WebVTT file (served by the API, same origin). */
  url: z.string(),
  updatedAt: z.string(),
});
export type CaptionDto = z.infer<typeof CaptionDtoSchema>;

export const RecordingDtoSchema = z.object({
  id: IdSchema,
  title: z.string(),
  originalFileName: z.string(),
  state: RecordingStateSchema,
  /** 0-100: upload progress is the browser's, this is processing progress. */
  progress: z.number().int(),
  failure: z.object({ code: FailureCodeSchema, message: z.string(), retryable: z.boolean() }).nullable(),
  /** Stored size once uploaded, otherwise the declared size. */
  sizeBytes: z.number().int(),
  durationSeconds: z.number().nullable(),
  width: z.number().int().nullable(),
  height: z.number().int().nullable(),
  frameRate: z.number().nullable(),
  videoCodec: z.string().nullable(),
  audioCodec: z.string().nullable(),
  rotation: z.number().int().nullable(),
  renditionMode: z.enum(['transcode', 'remux']).nullable(),
  /** A presigned GET URL of the poster frame (short-lived), or null before processing made one. */
  posterUrl: z.string().nullable(),
  owner: z.object({ id: IdSchema, name: z.string() }).nullable(),
  /** Whether the caller may rename, delete, retry or caption it. */
  canEdit: z.boolean(),
  /** The unfinished upload behind an `uploading` recording. */
  uploadId: IdSchema.nullable(),
  /** The school's lessons built on it; while any remain the recording cannot be deleted. */
  usedBy: z.array(z.object({ id: IdSchema, title: z.string(), state: LessonStateSchema })),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type RecordingDto = z.infer<typeof RecordingDtoSchema>;

export const RecordingDetailDtoSchema = RecordingDtoSchema.extend({ captions: z.array(CaptionDtoSchema) });
export type RecordingDetailDto = z.infer<typeof RecordingDetailDtoSchema>;

export const RECORDING_SORTS = ['newest', 'oldest', 'title', 'duration', 'size'] as const;
export const RecordingListQuerySchema = z.object({
  q: z.string().trim().max(LIMITS.searchMax).optional(),
  state: RecordingStateSchema.optional(),
  owner: z.enum(['mine', 'school']).default('school'),
  sort: z.enum(RECORDING_SORTS).default('newest'),
});
export type RecordingListQuery = z.infer<typeof RecordingListQuerySchema>;

export const RecordingListDtoSchema = z.object({ recordings: z.array(RecordingDtoSchema) });
export type RecordingListDto = z.infer<typeof RecordingListDtoSchema>;

export const RecordingUpdateSchema = z.object({
  title: z
    .string({ error: 'Enter a title.' })
    .trim()
    .min(1, { error: 'Enter a title.' })
    .max(LIMITS.recordingTitleMax, { error: `A title has at most ${LIMITS.recordingTitleMax} characters.` }),
});
export type RecordingUpdate = z.infer<typeof RecordingUpdateSchema>;

/** What a player needs; URLs are signed per request and outlive the recording by a margin. */
export const PlaybackDtoSchema = z.object({
  recordingId: IdSchema,
  src: z.object({ url: z.string(), type: z.literal('video/mp4') }),
  posterUrl: z.string().nullable(),
  /** When `src.url` stops working; fetch this again before then (or on a media error). */
  expiresAt: z.string(),
  durationSeconds: z.number(),
  width: z.number().int(),
  height: z.number().int(),
  /** API path of the WebVTT thumbnails track (its cues carry freshly signed sprite URLs). */
  thumbnailsUrl: z.string().nullable(),
  captions: z.array(CaptionDtoSchema),
});
export type PlaybackDto = z.infer<typeof PlaybackDtoSchema>;

// ---- captions ------------------------------------------------------------------------------

/** A BCP 47 tag as people write them: en, en-GB, pt-BR, zh-Hant. */
export const LanguageTagSchema = z
  .string({ error: 'Choose a language.' })
  .trim()
  .regex(/^[A-Za-z]{2,3}(-[A-Za-z0-9]{2,8})*$/, { error: 'Use a language tag such as en, en-GB or fr.' });

export const CaptionCreateSchema = z.object({
  language: LanguageTagSchema,
  label: z
    .string({ error: 'Enter a label, such as English.' })
    .trim()
    .min(1, { error: 'Enter a label, such as English.' })
    .max(LIMITS.captionLabelMax, { error: `A label has at most ${LIMITS.captionLabelMax} characters.` }),
  isDefault: z.boolean().default(false),
  /** The WebVTT file's text. */
  vtt: z
    .string({ error: 'Choose a WebVTT (.vtt) file.' })
    .min(1, { error: 'The caption file is empty.' })
    .max(LIMITS.captionBytesMax, { error: `A caption file has at most ${LIMITS.captionBytesMax / 1024} KiB.` }),
});
export type CaptionCreate = z.infer<typeof CaptionCreateSchema>;

export const CaptionUpdateSchema = z
  .object({
    label: CaptionCreateSchema.shape.label.optional(),
    isDefault: z.boolean().optional(),
  })
  .refine((value) => value.label !== undefined || value.isDefault !== undefined, { error: 'Change the label or the default.' });
export type CaptionUpdate = z.infer<typeof CaptionUpdateSchema>;
