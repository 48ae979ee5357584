import { useCallback } from 'react';
import type { CheckpointKind } from '@core/contracts';
import { newChapter, newCheckpoint } from '@core/lessons/new-checkpoint';
import { checkpointLabel } from '@core/lessons/checkpoint-label';
import { addChapter, addCheckpoint, copyOfCheckpoint, moveCheckpoint, removeCheckpoint } from './draft/content-edits';
import type { StudioDraft } from './draft/use-studio-draft';
import type { Selection } from './panel/problems-list';
import { pinnedText, refusalText } from './pinning/place-messages';
import { checkPlace, nearestFreeTime } from './pinning/pin-rules';
import { formatTime } from './time/format-time';
import type { TimeRange } from './timeline/chapter-lane';
import { snapToFrame, stepFrames, stepTime } from './timeline/timeline-math';

export type Notice = { tone: 'info' | 'error'; text: string; action?: { label: string; run: () => void } };

type ActionsInput = {
  draft: StudioDraft;
  durationMs: number;
  frameRate: number;
  selection: Selection;
  setSelection: (selection: Selection) => void;
  setNotice: (notice: Notice | null) => void;
  readMs: () => number;
  seek: (ms: number) => void;
  pause: () => void;
  range: TimeRange | null;
  setRange: (range: TimeRange | null) => void;
};

/** What the studio's buttons and shortcuts do to the draft: pin, move, nudge, delete, duplicate, chapters. */
export function useStudioActions(input: ActionsInput) {
  const { draft, durationMs, frameRate, selection, setSelection, setNotice, readMs, seek, pause, range, setRange } = input;
  const { content, change } = draft;
  const rules = { minSpacingMs: content.settings.minSpacingMs, durationMs, frameRate };
  const selectedKey = selection?.type === 'checkpoint' ? selection.key : null;
  const selected = content.checkpoints.find((c) => c.key === selectedKey) ?? null;

  const pin = (kind: CheckpointKind, atMs: number = readMs()) => {
    const check = checkPlace(content.checkpoints, atMs, rules);
    const at = snapToFrame(atMs, frameRate);
    if (!check.ok) {
      const free = check.nearestFreeMs;
      setNotice({
        tone: 'error',
        text: refusalText(check, 'pinned', at, durationMs, rules.minSpacingMs),
        action: free === null ? undefined : { label: `Pin at ${formatTime(free)} instead`, run: () => pin(kind, free) },
      });
      return;
    }
    const checkpoint = newCheckpoint(kind, check.atMs);
    change((c) => addCheckpoint(c, checkpoint));
    setSelection({ type: 'checkpoint', key: checkpoint.key });
    setNotice({ tone: 'info', text: pinnedText(kind, check.atMs) });
  };

  /** Moves a checkpoint; the reason it was refused, or null. */
  const moveTo = (key: string, atMs: number, group?: string): string | null => {
    const check = checkPlace(content.checkpoints, atMs, rules, key);
    if (!check.ok) return refusalText(check, 'moved', snapToFrame(atMs, frameRate), durationMs, rules.minSpacingMs);
    change((c) => moveCheckpoint(c, key, check.atMs), group);
    return null;
  };

  const moveWithNotice = (key: string, atMs: number) => {
    const refusal = moveTo(key, atMs);
    setNotice(refusal ? { tone: 'error', text: refusal } : null);
  };

  const nudge = (frames: number, seconds = 0) => {
    if (!selected) {
      setNotice({ tone: 'info', text: 'Select a checkpoint first (click its marker, or Tab to the markers and press Enter).' });
      return;
    }
    const target =
      seconds !== 0
        ? stepTime(selected.atMs, seconds * 1000, frameRate, durationMs)
        : stepFrames(selected.atMs, frames, frameRate, durationMs);
    if (target === selected.atMs) return;
    // Nudges of the same checkpoint in a row undo as one step.
    const refusal = moveTo(selected.key, target, `nudge:${selected.key}`);
    setNotice(refusal ? { tone: 'error', text: refusal } : null);
  };

  const remove = (key: string) => {
    const target = content.checkpoints.find((c) => c.key === key);
    if (!target) return;
    change((c) => removeCheckpoint(c, key));
    setSelection(null);
    setNotice({
      tone: 'info',
      text: `Deleted “${checkpointLabel(target)}” at ${formatTime(target.atMs)}.`,
      action: { label: 'Undo', run: draft.undo },
    });
  };

  const duplicate = (key: string) => {
    const source = content.checkpoints.find((c) => c.key === key);
    if (!source) return;
    const free = nearestFreeTime(content.checkpoints, source.atMs + rules.minSpacingMs, rules);
    if (free === null) {
      setNotice({ tone: 'error', text: 'Not duplicated: there is no free moment near this checkpoint.' });
      return;
    }
    const copy = copyOfCheckpoint(source, free);
    change((c) => addCheckpoint(c, copy));
    setSelection({ type: 'checkpoint', key: copy.key });
    setNotice({ tone: 'info', text: `Duplicated at ${formatTime(free)}: the copy is selected.` });
  };

  const addChapterHere = () => {
    const start = range ? range.startMs : snapToFrame(readMs(), frameRate);
    const inside = content.chapters.find((c) => start >= c.startMs && start < c.endMs);
    if (!range && inside) {
      setNotice({
        tone: 'error',
        text: `${formatTime(start)} is inside the chapter “${inside.title || 'untitled'}”: drag across the chapter lane to mark a range outside it, or shorten that chapter first.`,
      });
      return;
    }
    const nextStart = content.chapters
      .map((c) => c.startMs)
      .filter((s) => s > start)
      .sort((a, b) => a - b)[0];
    const end = range ? range.endMs : Math.min(durationMs, nextStart ?? durationMs, start + 60_000);
    if (end <= start) {
      setNotice({ tone: 'error', text: 'No room for a chapter here: the recording ends or the next chapter starts at this moment.' });
      return;
    }
    const chapter = newChapter(start, end);
    change((c) => addChapter(c, chapter));
    setRange(null);
    setSelection({ type: 'chapter', key: chapter.key });
    setNotice({
      tone: 'info',
      text: `Added a chapter from ${formatTime(start)} to ${formatTime(end)}: give it a title in the side panel.`,
    });
  };

  const stepPlayhead = useCallback(
    (frames: number) => {
      pause();
      seek(stepFrames(readMs(), frames, frameRate, durationMs));
    },
    [pause, seek, readMs, frameRate, durationMs],
  );

  return { selected, pin, moveTo, moveWithNotice, nudge, remove, duplicate, addChapterHere, stepPlayhead };
}

export type StudioActions = ReturnType<typeof useStudioActions>;
