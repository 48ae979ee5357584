import { useQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState } from 'react';
import type { CaptionDto } from '@core/contracts';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Select } from '@/components/ui/input';
import { Loading } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { captionTextQueryOptions } from '../api/get-lesson-media';
import { formatClock, formatTime } from '../time/format-time';
import { activeCueIndex, parseVtt } from './parse-vtt';

type TranscriptProps = {
  lessonId: string;
  captions: readonly CaptionDto[];
  currentMs: number;
  onSeek: (ms: number) => void;
  /** "Pin here": the teacher chooses the kind next. */
  onPinAt: (ms: number) => void;
  className?: string;
};

/** The recording's captions as a list beside the video: the line being spoken is highlighted and kept in view. */
export function Transcript({ lessonId, captions, currentMs, onSeek, onPinAt, className }: TranscriptProps) {
  const fallback = captions.find((c) => c.isDefault) ?? captions[0] ?? null;
  const [chosenId, setChosenId] = useState<string | null>(null);
  const caption = captions.find((c) => c.id === chosenId) ?? fallback;
  const text = useQuery(captionTextQueryOptions(lessonId, caption?.url ?? null));
  const parsed = useMemo(() => (text.data === undefined ? null : parseVtt(text.data)), [text.data]);
  const cues = parsed?.cues ?? [];
  const active = activeCueIndex(cues, currentMs);
  const listRef = useRef<HTMLOListElement>(null);

  // Scroll the list (not the page) so the active line stays in view.
  useEffect(() => {
    const list = listRef.current;
    const item = active >= 0 ? list?.children[active] : null;
    if (!list || !(item instanceof HTMLElement)) return;
    const top = item.offsetTop - list.offsetTop;
    if (top < list.scrollTop || top + item.offsetHeight > list.scrollTop + list.clientHeight) {
      list.scrollTop = Math.max(0, top - list.clientHeight / 3);
    }
  }, [active]);

  return (
    <section aria-label="Transcript" className={cn('flex min-h-0 flex-col rounded-lg border border-line bg-surface', className)}>
      <div className="flex items-center justify-between gap-2 border-b border-line px-3 py-2">
        <h2 className="text-base">Transcript</h2>
        {captions.length > 1 ? (
          <Select
            aria-label="Caption track"
            className="min-h-9 w-auto py-1 text-sm"
            value={caption?.id ?? ''}
            onChange={(event) => setChosenId(event.target.value)}
          >
            {captions.map((c) => (
              <option key={c.id} value={c.id}>
                {c.label}
              </option>
            ))}
          </Select>
        ) : null}
      </div>
      {!caption ? (
        <p className="p-3 text-sm text-ink-muted">
          This recording has no captions yet. Add a caption file on the recording’s page to see the transcript here.
        </p>
      ) : text.isPending ? (
        <Loading label="Loading the transcript…" className="px-3" />
      ) : text.isError ? (
        <ErrorBanner error={text.error} title="The transcript could not be loaded" className="m-3" />
      ) : (
        <>
          {parsed && parsed.errors > 0 ? (
            <p className="px-3 pt-2 text-sm text-ink-muted">Some lines of this caption file could not be read and are left out.</p>
          ) : null}
          <ol ref={listRef} className="min-h-0 flex-1 overflow-y-auto p-1" aria-label={`Lines of ${caption.label}`}>
            {cues.map((cue, index) => (
              <li
                key={`${cue.id}-${cue.startMs}`}
                aria-current={index === active ? 'true' : undefined}
                className={cn('flex items-start gap-1 rounded-md px-1 py-0.5', index === active && 'bg-teal-soft outline-2 outline-teal')}
              >
                <button
                  type="button"
                  className="flex min-h-9 flex-1 cursor-pointer gap-2 rounded px-1 text-left hover:bg-sunken"
                  onClick={() => onSeek(cue.startMs)}
                  aria-label={`Jump to ${formatTime(cue.startMs)}: ${cue.text}`}
                >
                  <span className="shrink-0 pt-0.5 font-mono text-xs text-ink-muted">{formatClock(cue.startMs)}</span>
                  <span className={cn('text-sm', index === active && 'font-bold')}>{cue.text}</span>
                </button>
                <button
                  type="button"
                  className="min-h-9 shrink-0 cursor-pointer rounded border border-line px-2 text-xs font-bold text-copper hover:bg-copper-soft"
                  onClick={() => onPinAt(cue.startMs)}
                  aria-label={`Pin here, at ${formatTime(cue.startMs)}`}
                >
                  Pin here
                </button>
              </li>
            ))}
          </ol>
        </>
      )}
    </section>
  );
}
