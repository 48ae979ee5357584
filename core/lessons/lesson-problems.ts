import type { Chapter, Checkpoint } from '../contracts/checkpoints';
import type { LessonContent, LessonProblem } from '../contracts/lessons';
import { checkpointLabel } from './checkpoint-label';
import { checkpointProblems } from './checkpoint-problems';
import { markdownProblems } from './markdown-problems';
import { formatGap, formatTime } from './time-format';

export interface LessonProblemContext {
  /** The recording's length; the checks against the end are skipped when it is unknown (not a positive number). */
  durationMs: number;
  /** Frames per second: two checkpoints inside one frame are at the same moment. */
  frameRate?: number | null;
}

function quoted(checkpoint: Checkpoint): string {
  return `“${checkpointLabel(checkpoint)}”`;
}

function timelineProblems(
  checkpoints: Checkpoint[],
  minSpacingMs: number,
  context: LessonProblemContext,
  add: (p: LessonProblem) => void,
): void {
  const known = Number.isFinite(context.durationMs) && context.durationMs > 0;
  const frameMs = context.frameRate && context.frameRate > 0 ? 1000 / context.frameRate : 0;
  const order = checkpoints.map((c, i) => ({ c, i })).sort((a, b) => a.c.atMs - b.c.atMs || a.i - b.i);
  order.forEach(({ c, i }, n) => {
    const previous = order[n - 1];
    if (previous) {
      const gap = c.atMs - previous.c.atMs;
      if (gap === 0 || gap < frameMs) {
        add({
          path: `checkpoints.${i}.atMs`,
          message: `This checkpoint is at the same moment (${formatTime(c.atMs)}) as ${quoted(previous.c)}: move one of them.`,
        });
      } else if (gap < minSpacingMs) {
        add({
          path: `checkpoints.${i}.atMs`,
          message:
            `This checkpoint (${formatTime(c.atMs)}) is only ${formatGap(gap)} after ${quoted(previous.c)} (${formatTime(previous.c.atMs)}); ` +
            `keep at least ${formatGap(minSpacingMs)} between checkpoints.`,
        });
      }
    }
    if (known && c.atMs > context.durationMs) {
      add({
        path: `checkpoints.${i}.atMs`,
        message: `This checkpoint is at ${formatTime(c.atMs)}, after the end of the recording (${formatTime(context.durationMs)}).`,
      });
    }
    if (c.kind === 'prediction') {
      if (c.revealAtMs <= c.atMs) {
        add({
          path: `checkpoints.${i}.revealAtMs`,
          message: `The reveal (${formatTime(c.revealAtMs)}) must come after the prediction itself (${formatTime(c.atMs)}).`,
        });
      } else if (known && c.revealAtMs > context.durationMs) {
        add({
          path: `checkpoints.${i}.revealAtMs`,
          message: `The reveal is at ${formatTime(c.revealAtMs)}, after the end of the recording (${formatTime(context.durationMs)}).`,
        });
      }
    }
  });
}

function chapterName(chapter: Chapter, index: number): string {
  return chapter.title.trim() === '' ? `chapter ${index + 1}` : `“${chapter.title.trim()}”`;
}

function chapterProblems(chapters: Chapter[], context: LessonProblemContext, add: (p: LessonProblem) => void): void {
  const known = Number.isFinite(context.durationMs) && context.durationMs > 0;
  chapters.forEach((chapter, j) => {
    if (chapter.title.trim() === '') add({ path: `chapters.${j}.title`, message: `Give chapter ${j + 1} a title.` });
    if (chapter.endMs <= chapter.startMs) {
      add({
        path: `chapters.${j}.endMs`,
        message: `The chapter ends (${formatTime(chapter.endMs)}) before or when it starts (${formatTime(chapter.startMs)}).`,
      });
    } else if (known && chapter.endMs > context.durationMs) {
      add({
        path: `chapters.${j}.endMs`,
        message: `The chapter ends at ${formatTime(chapter.endMs)}, after the end of the recording (${formatTime(context.durationMs)}).`,
      });
    }
  });
  const order = chapters.map((c, j) => ({ c, j })).sort((a, b) => a.c.startMs - b.c.startMs || a.j - b.j);
  let latest: { c: Chapter; j: number } | undefined;
  for (const entry of order) {
    if (latest && entry.c.startMs < latest.c.endMs) {
      add({
        path: `chapters.${entry.j}.startMs`,
        message: `${capital(chapterName(entry.c, entry.j))} starts at ${formatTime(entry.c.startMs)}, before ${chapterName(latest.c, latest.j)} ends (${formatTime(latest.c.endMs)}): chapters may not overlap.`,
      });
    }
    if (!latest || entry.c.endMs > latest.c.endMs) latest = entry;
  }
}

function capital(text: string): string {
  return text.charAt(0) === '“' ? text : text.charAt(0).toUpperCase() + text.slice(1);
}

function duplicateKeys(keys: string[], path: (i: number) => string, what: string, add: (p: LessonProblem) => void): void {
  const first = new Map<string, number>();
  keys.forEach((key, i) => {
    const earlier = first.get(key);
    if (earlier === undefined) first.set(key, i);
    else add({ path: path(i), message: `This ${what} has the same key as ${what} ${earlier + 1}; each needs its own key.` });
  });
}

/**
 * Every rule a lesson must meet before it is published, each at its path inside LessonContent
 * ('checkpoints.3.atMs', 'checkpoints.3.options.1.text', 'chapters.0.endMs') with a sentence saying
 * what to fix. A draft with problems is still saved; publishing is refused until there are none.
 */
export function lessonProblems(content: LessonContent, context: LessonProblemContext): LessonProblem[] {
  const problems: LessonProblem[] = [];
  const add = (problem: LessonProblem) => problems.push(problem);
  problems.push(...markdownProblems(content.settings.description, 'settings.description'));
  problems.push(...markdownProblems(content.settings.safetyNotes, 'settings.safetyNotes'));
  duplicateKeys(
    content.checkpoints.map((c) => c.key),
    (i) => `checkpoints.${i}.key`,
    'checkpoint',
    add,
  );
  duplicateKeys(
    content.chapters.map((c) => c.key),
    (j) => `chapters.${j}.key`,
    'chapter',
    add,
  );
  timelineProblems(content.checkpoints, content.settings.minSpacingMs, context, add);
  chapterProblems(content.chapters, context, add);
  content.checkpoints.forEach((checkpoint, i) => {
    for (const p of checkpointProblems(checkpoint)) add({ path: `checkpoints.${i}.${p.path}`, message: p.message });
  });
  return problems;
}
