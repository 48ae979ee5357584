import { z } from 'zod';
import { LIMITS } from '../limits';
import { ChapterSchema, CheckpointKeySchema, CheckpointSchema, markdown } from './checkpoints';
import { IdSchema } from './common';

// ---- the content a draft saves and a version freezes ------------------------------------------

const TagSchema = z
  .string()
  .trim()
  .toLowerCase()
  .min(1, { error: 'A tag cannot be empty.' })
  .max(LIMITS.lessonTagMax, { error: `A tag has at most ${LIMITS.lessonTagMax} characters.` });

export const LessonSettingsSchema = z.object({
  title: z
    .string({ error: 'Give the lesson a title.' })
    .trim()
    .min(1, { error: 'Give the lesson a title.' })
    .max(LIMITS.lessonTitleMax, { error: `A title has at most ${LIMITS.lessonTitleMax} characters.` }),
  description: markdown(LIMITS.lessonDescriptionMax, 'the description'),
  tags: z.array(TagSchema).max(LIMITS.lessonTagsMax, { error: `At most ${LIMITS.lessonTagsMax} tags.` }),
  /** Free text: "Year 10", "Introductory college". */
  level: z
    .string()
    .trim()
    .max(LIMITS.lessonLevelMax, { error: `A level has at most ${LIMITS.lessonLevelMax} characters.` }),
  /** Shown to students before the video starts. */
  safetyNotes: markdown(LIMITS.safetyNotesMax, 'the safety notes'),
  /** Closest two checkpoints may be. */
  minSpacingMs: z
    .number()
    .int()
    .min(1, { error: 'Checkpoints need at least 1 ms between them.' })
    .max(LIMITS.minSpacingMsMax, { error: `A spacing of at most ${LIMITS.minSpacingMsMax / 1000} s.` }),
});
export type LessonSettings = z.infer<typeof LessonSettingsSchema>;

/**
 * Everything a version freezes. A draft is saved whole (it may still have problems: see
 * lessonProblems); publishing needs none.
 */
export const LessonContentSchema = z.object({
  settings: LessonSettingsSchema,
  chapters: z.array(ChapterSchema).max(LIMITS.chaptersMax, { error: `At most ${LIMITS.chaptersMax} chapters.` }),
  checkpoints: z.array(CheckpointSchema).max(LIMITS.checkpointsMax, { error: `At most ${LIMITS.checkpointsMax} checkpoints.` }),
});
export type LessonContent = z.infer<typeof LessonContentSchema>;

/** A rule a lesson breaks, at a path inside LessonContent ('checkpoints.3.expected'), with a sentence to fix it. */
export const LessonProblemSchema = z.object({ path: z.string(), message: z.string() });
export type LessonProblem = z.infer<typeof LessonProblemSchema>;

// ---- lessons ---------------------------------------------------------------------------------

export const LESSON_STATES = ['draft', 'published', 'archived'] as const;
export const LessonStateSchema = z.enum(LESSON_STATES);
export type LessonState = z.infer<typeof LessonStateSchema>;

export const LessonCreateSchema = z.object({
  recordingId: IdSchema,
  title: LessonSettingsSchema.shape.title,
  description: LessonSettingsSchema.shape.description,
  tags: LessonSettingsSchema.shape.tags,
  level: LessonSettingsSchema.shape.level,
  safetyNotes: LessonSettingsSchema.shape.safetyNotes,
});
export type LessonCreate = z.infer<typeof LessonCreateSchema>;

export const LESSON_SORTS = ['updated', 'title', 'created'] as const;

export const LessonListQuerySchema = z.object({
  q: z.string().trim().max(LIMITS.searchMax).optional(),
  tag: z.string().trim().toLowerCase().max(LIMITS.lessonTagMax).optional(),
  /** 'me', 'others', or a user id. */
  owner: z.union([z.enum(['me', 'others']), IdSchema]).optional(),
  state: LessonStateSchema.optional(),
  sort: z.enum(LESSON_SORTS).default('updated'),
});
export type LessonListQuery = z.infer<typeof LessonListQuerySchema>;

const PersonRefSchema = z.object({ id: IdSchema, name: z.string() });

const RecordingRefSchema = z.object({
  id: IdSchema,
  title: z.string(),
  durationMs: z.number().int().nullable(),
  frameRate: z.number().nullable(),
  /** False when the recording is no longer ready (deleted objects, failed reprocessing). */
  ready: z.boolean(),
});

export const LessonSummaryDtoSchema = z.object({
  id: IdSchema,
  title: z.string(),
  tags: z.array(z.string()),
  level: z.string(),
  state: LessonStateSchema,
  owner: PersonRefSchema.nullable(),
  recording: RecordingRefSchema,
  shared: z.boolean(),
  checkpointCount: z.number().int(),
  /** The newest published version's number, or null. */
  publishedVersion: z.number().int().nullable(),
  /** The draft differs from the newest published version. */
  unpublishedChanges: z.boolean(),
  posterUrl: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type LessonSummaryDto = z.infer<typeof LessonSummaryDtoSchema>;

export const LessonListDtoSchema = z.object({
  lessons: z.array(LessonSummaryDtoSchema),
  /** Every tag used by a lesson the caller can see, for the filter. */
  tags: z.array(z.string()),
  owners: z.array(PersonRefSchema),
});
export type LessonListDto = z.infer<typeof LessonListDtoSchema>;

export const LessonDtoSchema = LessonSummaryDtoSchema.extend({
  /** Bumped by every saved draft; a save names the revision it started from. */
  revision: z.number().int(),
  draft: LessonContentSchema,
  problems: z.array(LessonProblemSchema),
  savedAt: z.string(),
  savedBy: PersonRefSchema.nullable(),
  canEdit: z.boolean(),
});
export type LessonDto = z.infer<typeof LessonDtoSchema>;

export const DraftSaveSchema = z.object({
  /** The revision this edit started from; another tab's newer save is a 409 edit_conflict. */
  revision: z.number().int().min(0),
  content: LessonContentSchema,
});
export type DraftSave = z.infer<typeof DraftSaveSchema>;

export const DraftSavedDtoSchema = z.object({
  revision: z.number().int(),
  savedAt: z.string(),
  problems: z.array(LessonProblemSchema),
  unpublishedChanges: z.boolean(),
});
export type DraftSavedDto = z.infer<typeof DraftSavedDtoSchema>;

/** details of a 409 edit_conflict: who saved the newer revision, and when. */
export const EditConflictDetailsSchema = z.object({ revision: z.number().int(), savedAt: z.string(), savedBy: z.string().nullable() });

export const LessonUpdateSchema = z
  .object({ shared: z.boolean(), archived: z.boolean() })
  .partial()
  .refine((body) => Object.keys(body).length > 0, { error: 'Send shared or archived.' });
export type LessonUpdate = z.infer<typeof LessonUpdateSchema>;

export const PublishSchema = z.object({
  revision: z.number().int().min(0),
  note: z
    .string()
    .trim()
    .max(LIMITS.versionNoteMax, { error: `A note has at most ${LIMITS.versionNoteMax} characters.` }),
});
export type Publish = z.infer<typeof PublishSchema>;

// ---- versions --------------------------------------------------------------------------------

/** What changed from the previous version, checkpoint by checkpoint (by key). */
export const VersionChangesSchema = z.object({
  added: z.array(z.object({ key: CheckpointKeySchema, label: z.string() })),
  removed: z.array(z.object({ key: CheckpointKeySchema, label: z.string() })),
  /** `fields`: the top-level fields that differ ('atMs', 'expected', 'options'). */
  edited: z.array(z.object({ key: CheckpointKeySchema, label: z.string(), fields: z.array(z.string()) })),
  chaptersChanged: z.boolean(),
  /** Settings fields that differ ('title', 'safetyNotes'). */
  settings: z.array(z.string()),
});
export type VersionChanges = z.infer<typeof VersionChangesSchema>;

export const VersionSummaryDtoSchema = z.object({
  id: IdSchema,
  number: z.number().int(),
  note: z.string(),
  publishedAt: z.string(),
  publishedBy: PersonRefSchema.nullable(),
  checkpointCount: z.number().int(),
  changes: VersionChangesSchema,
});
export type VersionSummaryDto = z.infer<typeof VersionSummaryDtoSchema>;

export const VersionDtoSchema = VersionSummaryDtoSchema.extend({ content: LessonContentSchema });
export type VersionDto = z.infer<typeof VersionDtoSchema>;

// ---- import ----------------------------------------------------------------------------------

export const LessonImportSchema = z.object({
  recordingId: IdSchema,
  fileName: z.string().max(LIMITS.fileNameMax),
  /** The file's text, kept raw so problems can name their line. */
  text: z.string().max(LIMITS.lessonFileBytesMax, { error: 'A lesson file has at most 1 MiB.' }),
});
export type LessonImport = z.infer<typeof LessonImportSchema>;

// ---- images in Markdown ----------------------------------------------------------------------

export const LessonImageDtoSchema = z.object({
  id: IdSchema,
  /** Same-origin path served by the API with the sniffed type and nosniff. */
  url: z.string(),
  /** Ready to paste: ![alt](url). */
  markdown: z.string(),
  contentType: z.string(),
  size: z.number().int(),
});
export type LessonImageDto = z.infer<typeof LessonImageDtoSchema>;
