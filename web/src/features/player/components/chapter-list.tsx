import type { Chapter } from '@core/contracts';
import { formatTime } from '@core/lessons/time-format';
import { cn } from '@/lib/cn';

/** The lesson's chapters; choosing one jumps there (a gate on the way still holds). */
export function ChapterList({ chapters, currentMs, onJump }: { chapters: Chapter[]; currentMs: number; onJump: (ms: number) => void }) {
  if (chapters.length === 0) return null;
  return (
    <nav aria-label="Chapters" className="flex flex-col gap-2">
      <h2 className="font-bold">Chapters</h2>
      <ol className="flex flex-col gap-1">
        {chapters.map((chapter, index) => {
          const current = currentMs >= chapter.startMs && currentMs < chapter.endMs;
          return (
            <li key={chapter.key}>
              <button
                type="button"
                aria-current={current ? 'true' : undefined}
                onClick={() => onJump(chapter.startMs)}
                className={cn(
                  'flex min-h-11 w-full items-center gap-3 rounded-md border px-3 py-2 text-left',
                  current ? 'border-teal border-2 bg-teal-soft font-bold' : 'border-line bg-surface hover:bg-sunken',
                )}
              >
                <span className="font-mono text-sm text-ink-muted">{formatTime(chapter.startMs)}</span>
                <span className="min-w-0 flex-1 break-words">{chapter.title.trim() || `Chapter ${index + 1}`}</span>
                {current ? <span className="text-sm">(playing)</span> : null}
              </button>
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
