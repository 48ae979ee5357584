import { useRef, useState, type PointerEvent } from 'react';
import type { Chapter } from '@core/contracts';
import { cn } from '@/lib/cn';
import { formatTime } from '../time/format-time';
import { snapToFrame, timeToX, xToTime, type TimelineScale } from './timeline-math';

export type TimeRange = { startMs: number; endMs: number };

type ChapterLaneProps = {
  chapters: readonly Chapter[];
  scale: TimelineScale;
  frameRate: number;
  selectedKey: string | null;
  problemKeys: ReadonlySet<string>;
  range: TimeRange | null;
  onRange: (range: TimeRange | null) => void;
  onSelect: (key: string) => void;
};

/** Chapters as named bands; dragging across the empty lane marks a range to make a chapter from. */
export function ChapterLane({ chapters, scale, frameRate, selectedKey, problemKeys, range, onRange, onSelect }: ChapterLaneProps) {
  const laneRef = useRef<HTMLDivElement>(null);
  const [marking, setMarking] = useState<{ fromMs: number; pointerId: number } | null>(null);

  const timeAt = (clientX: number) => {
    const left = laneRef.current?.getBoundingClientRect().left ?? 0;
    return snapToFrame(xToTime(clientX - left, scale), frameRate);
  };

  function onPointerDown(event: PointerEvent<HTMLDivElement>) {
    if (event.target !== event.currentTarget || event.button !== 0) return;
    const fromMs = timeAt(event.clientX);
    setMarking({ fromMs, pointerId: event.pointerId });
    event.currentTarget.setPointerCapture?.(event.pointerId);
    onRange(null);
  }

  function onPointerMove(event: PointerEvent<HTMLDivElement>) {
    if (!marking || marking.pointerId !== event.pointerId) return;
    const toMs = Math.min(timeAt(event.clientX), scale.durationMs);
    onRange({ startMs: Math.min(marking.fromMs, toMs), endMs: Math.max(marking.fromMs, toMs) });
  }

  function onPointerUp(event: PointerEvent<HTMLDivElement>) {
    if (!marking || marking.pointerId !== event.pointerId) return;
    setMarking(null);
    // A click without travel marks nothing.
    if (range && range.endMs - range.startMs < 100) onRange(null);
  }

  return (
    <div
      ref={laneRef}
      className="relative h-9 cursor-crosshair border-b border-line bg-surface"
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      data-testid="chapter-lane"
    >
      {range ? (
        <div
          aria-hidden="true"
          className="pointer-events-none absolute inset-y-0 border-x-2 border-teal bg-teal-soft bg-[repeating-linear-gradient(45deg,transparent_0_6px,rgb(15_107_107/0.18)_6px_8px)]"
          style={{ left: timeToX(range.startMs, scale), width: Math.max(2, timeToX(range.endMs, scale) - timeToX(range.startMs, scale)) }}
        />
      ) : null}
      {chapters.map((chapter, index) => {
        const left = timeToX(chapter.startMs, scale);
        const width = Math.max(12, timeToX(chapter.endMs, scale) - left);
        const selected = chapter.key === selectedKey;
        const title = chapter.title.trim() || `Chapter ${index + 1}`;
        const flagged = problemKeys.has(chapter.key);
        return (
          <button
            key={chapter.key}
            type="button"
            aria-pressed={selected}
            aria-label={`Chapter “${title}”, ${formatTime(chapter.startMs)} to ${formatTime(chapter.endMs)}${flagged ? ', has problems to fix' : ''}`}
            title={`${title} (${formatTime(chapter.startMs)} – ${formatTime(chapter.endMs)})`}
            onClick={() => onSelect(chapter.key)}
            className={cn(
              'absolute top-1 bottom-1 cursor-pointer overflow-hidden rounded border-2 px-1.5 text-left text-xs leading-5 font-bold whitespace-nowrap',
              selected ? 'z-10 border-ink bg-copper-soft text-ink' : 'border-copper bg-copper-soft text-copper-strong',
              flagged && 'border-dashed border-danger',
            )}
            style={{ left, width }}
          >
            {flagged ? '! ' : ''}
            {title}
          </button>
        );
      })}
    </div>
  );
}
