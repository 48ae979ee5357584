import type { LessonContent } from '../contracts/lessons';
import { checkpointLabel } from './checkpoint-label';

/**
 * A lesson's chapters and checkpoint times as WebVTT text tracks (W3C WebVTT: "chapters" and
 * "metadata" kinds), so other players and tools can show the chapter list and the pins. They carry
 * only what a student sees on the timeline: never prompts' answers, options' correctness or feedback.
 */

/** 75500 -> "00:01:15.500": a WebVTT timestamp with the hours always written. */
export function vttTime(ms: number): string {
  const total = Math.max(0, Math.round(ms));
  const pad = (n: number, width = 2) => String(n).padStart(width, '0');
  return `${pad(Math.floor(total / 3_600_000))}:${pad(Math.floor((total % 3_600_000) / 60_000))}:${pad(Math.floor((total % 60_000) / 1000))}.${pad(total % 1000, 3)}`;
}

/** Cue text is parsed for tags and character references: write &, < and > as references, on one line. */
function cueText(text: string): string {
  return text.replace(/\s+/g, ' ').trim().replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

/** One cue per chapter, in time order, its text the chapter title ("Chapter 2" while it has none). */
export function chaptersVtt(content: LessonContent): string {
  const cues = [...content.chapters]
    .map((chapter, index) => ({ chapter, index }))
    .sort((a, b) => a.chapter.startMs - b.chapter.startMs || a.index - b.index)
    .map(({ chapter, index }) => {
      // A draft may still hold a chapter that ends before it starts; a cue must still end after it begins.
      const end = Math.max(chapter.endMs, chapter.startMs + 1);
      const title = cueText(chapter.title) || `Chapter ${index + 1}`;
      return `${chapter.key}\n${vttTime(chapter.startMs)} --> ${vttTime(end)}\n${title}`;
    });
  return cues.length > 0 ? `WEBVTT\n\n${cues.join('\n\n')}\n` : 'WEBVTT\n';
}

/**
 * One metadata cue per checkpoint, from its pin until the next later pin (1 ms for the last), with
 * the payload `{"key","kind","label"}` as one line of JSON. `<`, `>` and `&` are written as JSON
 * escapes so the text can never contain "-->" or look like markup.
 */
export function checkpointsVtt(content: LessonContent): string {
  const sorted = [...content.checkpoints].sort((a, b) => a.atMs - b.atMs);
  const cues = sorted.map((checkpoint, index) => {
    const next = sorted.slice(index + 1).find((other) => other.atMs > checkpoint.atMs);
    const end = next ? next.atMs : checkpoint.atMs + 1;
    const payload = JSON.stringify({ key: checkpoint.key, kind: checkpoint.kind, label: checkpointLabel(checkpoint) })
      .replace(/&/g, '\\u0026')
      .replace(/</g, '\\u003c')
      .replace(/>/g, '\\u003e')
      .replace(/\u2028/g, '\\u2028')
      .replace(/\u2029/g, '\\u2029');
    return `${checkpoint.key}\n${vttTime(checkpoint.atMs)} --> ${vttTime(end)}\n${payload}`;
  });
  return cues.length > 0 ? `WEBVTT\n\n${cues.join('\n\n')}\n` : 'WEBVTT\n';
}
