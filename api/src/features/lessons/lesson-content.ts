import { createHash } from 'node:crypto';
import type { LessonContent, LessonCreate, LessonProblem } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { canonicalJson, lessonProblems, newKey } from '@core/lessons';

/** SHA-256 of the content's canonical JSON: equal content, equal hash, whatever the key order jsonb returns. */
export function contentHash(content: LessonContent): string {
  return createHash('sha256').update(canonicalJson(content)).digest('hex');
}

/** A new lesson's draft: the settings from the form, the default spacing, nothing pinned yet. */
export function initialContent(input: LessonCreate): LessonContent {
  return {
    settings: {
      title: input.title,
      description: input.description,
      tags: input.tags,
      level: input.level,
      safetyNotes: input.safetyNotes,
      minSpacingMs: LIMITS.defaultMinSpacingMs,
    },
    chapters: [],
    checkpoints: [],
  };
}

/** Tags as the list filters on them: each once, in the order first written. */
export function distinctTags(content: LessonContent): string[] {
  return [...new Set(content.settings.tags)];
}

/** "Copy of …", cut to the title limit without splitting a character written as two UTF-16 units. */
export function copyTitle(title: string): string {
  let copy = `Copy of ${title}`;
  if (copy.length <= LIMITS.lessonTitleMax) return copy;
  copy = copy.slice(0, LIMITS.lessonTitleMax);
  if (/[\uD800-\uDBFF]$/.test(copy)) copy = copy.slice(0, -1);
  return copy.trimEnd();
}

/**
 * The content of a duplicate: a new lesson, so every checkpoint and chapter gets a new key (results
 * and draws of the original never follow the copy); ids inside a checkpoint (options) stay.
 */
export function duplicateContent(content: LessonContent, title: string): LessonContent {
  return {
    settings: { ...content.settings, title },
    chapters: content.chapters.map((chapter) => ({ ...chapter, key: newKey() })),
    checkpoints: content.checkpoints.map((checkpoint) => ({ ...checkpoint, key: newKey() })),
  };
}

/** The recording facts the publish rules are checked against. */
export interface RecordingFacts {
  ready: boolean;
  durationMs: number | null;
  frameRate: number | null;
}

const NOT_PLAYABLE: LessonProblem = {
  path: 'recording',
  message:
    'The recording of this lesson is not ready to play (it may have failed processing or lost its files), so it cannot be published.',
};

/** What stops this content being published on this recording (lessonProblems, plus a recording that cannot play). */
export function problemsOf(content: LessonContent, recording: RecordingFacts): LessonProblem[] {
  const problems = lessonProblems(content, { durationMs: recording.durationMs ?? 0, frameRate: recording.frameRate });
  return recording.ready && recording.durationMs !== null ? problems : [NOT_PLAYABLE, ...problems];
}
