import type { Chapter, Checkpoint, LessonContent, LessonSettings } from '@core/contracts';
import { newKey } from '@core/lessons/new-key';

/**
 * The studio's edits to a draft, as pure functions returning new content. Checkpoints are kept in time
 * order (markers, arrow keys and the problems list all read them that way); keys never change here.
 */
const byTime = (a: Checkpoint, b: Checkpoint) => a.atMs - b.atMs;

export function addCheckpoint(content: LessonContent, checkpoint: Checkpoint): LessonContent {
  return { ...content, checkpoints: [...content.checkpoints, checkpoint].sort(byTime) };
}

export function replaceCheckpoint(content: LessonContent, next: Checkpoint): LessonContent {
  return { ...content, checkpoints: content.checkpoints.map((c) => (c.key === next.key ? next : c)).sort(byTime) };
}

/** Moves a checkpoint; a prediction's reveal moves with it so the gap the teacher chose stays the same. */
export function moveCheckpoint(content: LessonContent, key: string, atMs: number): LessonContent {
  const current = content.checkpoints.find((c) => c.key === key);
  if (!current || current.atMs === atMs) return content;
  const moved: Checkpoint =
    current.kind === 'prediction'
      ? { ...current, atMs, revealAtMs: Math.max(atMs, current.revealAtMs + atMs - current.atMs) }
      : { ...current, atMs };
  return replaceCheckpoint(content, moved);
}

export function removeCheckpoint(content: LessonContent, key: string): LessonContent {
  return { ...content, checkpoints: content.checkpoints.filter((c) => c.key !== key) };
}

/** A copy with a new key (keys identify a checkpoint across versions: a copy is another checkpoint). */
export function copyOfCheckpoint(checkpoint: Checkpoint, atMs: number): Checkpoint {
  const copy = structuredClone(checkpoint);
  copy.key = newKey();
  const shift = atMs - checkpoint.atMs;
  copy.atMs = atMs;
  if (copy.kind === 'prediction') copy.revealAtMs = Math.max(atMs, copy.revealAtMs + shift);
  return copy;
}

export function updateSettings(content: LessonContent, patch: Partial<LessonSettings>): LessonContent {
  return { ...content, settings: { ...content.settings, ...patch } };
}

const byStart = (a: Chapter, b: Chapter) => a.startMs - b.startMs;

export function addChapter(content: LessonContent, chapter: Chapter): LessonContent {
  return { ...content, chapters: [...content.chapters, chapter].sort(byStart) };
}

export function updateChapter(content: LessonContent, key: string, patch: Partial<Omit<Chapter, 'key'>>): LessonContent {
  return { ...content, chapters: content.chapters.map((c) => (c.key === key ? { ...c, ...patch } : c)).sort(byStart) };
}

export function removeChapter(content: LessonContent, key: string): LessonContent {
  return { ...content, chapters: content.chapters.filter((c) => c.key !== key) };
}

/** The undo group of a checkpoint edit: its key and the fields that changed (typing in one field is one step). */
export function checkpointEditGroup(before: Checkpoint | undefined, after: Checkpoint): string {
  if (!before) return `checkpoint:${after.key}`;
  const fields = Object.keys(after).filter(
    (field) => JSON.stringify((before as Record<string, unknown>)[field]) !== JSON.stringify((after as Record<string, unknown>)[field]),
  );
  return `checkpoint:${after.key}:${fields.sort().join(',')}`;
}
