import { CHECKPOINT_KIND_LABELS, type StudentLessonView } from '@core/contracts';
import { formatTime } from '@core/lessons/time-format';
import { CheckIcon } from '@/components/ui/icons';
import type { Stop } from '../logic/stops';

type CheckpointListProps = {
  view: StudentLessonView;
  stops: readonly Stop[];
  isDone: (stop: Stop) => boolean;
  disabled: boolean;
  onOpen: (stop: Stop) => void;
};

/** The checkpoints in time order, each a button that jumps to it: the progress bar's ticks, readable and reachable by keyboard. */
export function CheckpointList({ view, stops, isDone, disabled, onOpen }: CheckpointListProps) {
  const pins = stops.filter((stop) => stop.phase === 'pin');
  if (pins.length === 0) return null;
  return (
    <nav aria-label="Checkpoints" className="flex flex-col gap-2">
      <h2 className="font-bold">Checkpoints</h2>
      <ol className="flex flex-col gap-1">
        {pins.map((stop, index) => {
          const checkpoint = view.checkpoints.find((c) => c.key === stop.key);
          if (!checkpoint) return null;
          const done = isDone(stop);
          const name = checkpoint.label.trim() || CHECKPOINT_KIND_LABELS[checkpoint.kind];
          return (
            <li key={stop.id}>
              <button
                type="button"
                disabled={disabled}
                onClick={() => onOpen(stop)}
                aria-label={`Checkpoint ${index + 1} of ${pins.length} at ${formatTime(stop.atMs)}: ${name}${done ? ', done' : ''}${stop.behaviour === 'gate' ? ', must be answered' : ''}`}
                className="flex min-h-11 w-full items-center gap-3 rounded-md border border-line bg-surface px-3 py-2 text-left hover:bg-sunken disabled:cursor-not-allowed disabled:opacity-60"
              >
                <span className="font-mono text-sm text-ink-muted">{formatTime(stop.atMs)}</span>
                <span className="min-w-0 flex-1 break-words">{name}</span>
                {done ? (
                  <span className="flex items-center gap-1 text-sm text-success">
                    <CheckIcon className="size-4" />
                    Done
                  </span>
                ) : null}
              </button>
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
