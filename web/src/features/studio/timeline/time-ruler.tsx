import { formatClock } from '../time/format-time';
import { tickStepMs, ticksBetween, timeToX, xToTime, type TimelineScale } from './timeline-math';

/** Tick marks with times, only across the part in view. */
export function TimeRuler({ scale, viewStart, viewWidth }: { scale: TimelineScale; viewStart: number; viewWidth: number }) {
  const step = tickStepMs(scale);
  const from = xToTime(Math.max(0, viewStart - 80), scale);
  const to = xToTime(viewStart + viewWidth + 80, scale);
  return (
    <div className="relative h-6 border-b border-line bg-sunken text-xs text-ink-muted" aria-hidden="true">
      {ticksBetween(from, to, step).map((ms) => (
        <span
          key={ms}
          className="absolute top-0 h-full border-l border-line-strong pl-1 leading-6 whitespace-nowrap"
          style={{ left: timeToX(ms, scale) }}
        >
          {formatClock(ms, step < 1000)}
        </span>
      ))}
    </div>
  );
}
