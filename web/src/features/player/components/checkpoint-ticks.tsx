import { useEffect, useState } from 'react';
import { createPortal } from 'react-dom';
import { CHECKPOINT_KIND_LABELS, type StudentLessonView } from '@core/contracts';
import { formatTime } from '@core/lessons/time-format';
import type { Stop } from '../logic/stops';
import type { Player } from '../video-player';

type CheckpointTicksProps = { player: Player | null; view: StudentLessonView; stops: readonly Stop[]; durationMs: number };

function tickTitle(view: StudentLessonView, stop: Stop): string {
  const checkpoint = view.checkpoints.find((c) => c.key === stop.key);
  const name = checkpoint ? checkpoint.label.trim() || CHECKPOINT_KIND_LABELS[checkpoint.kind] : 'Checkpoint';
  return `${name} at ${formatTime(stop.atMs)}${stop.behaviour === 'gate' ? ' (answer to go on)' : ''}`;
}

/**
 * Plain ticks on video.js's progress bar, one per checkpoint pin. The bar is a slider, whose content
 * assistive technology does not read, so the ticks are decorative there; the checkpoint list beside
 * the video carries the same moments as labelled buttons. Gates (which hold the video until
 * answered) are drawn taller and wider, so shape tells them apart, not colour alone.
 */
export function CheckpointTicks({ player, view, stops, durationMs }: CheckpointTicksProps) {
  const [holder, setHolder] = useState<Element | null>(null);
  useEffect(() => {
    if (!player) return;
    const find = () => setHolder(player.el().querySelector('.vjs-progress-holder'));
    player.ready(find);
    return () => setHolder(null);
  }, [player]);
  if (!holder || durationMs <= 0) return null;
  return createPortal(
    <span aria-hidden="true" className="pointer-events-none absolute inset-0" data-checkpoint-ticks="">
      {stops
        .filter((stop) => stop.phase === 'pin')
        .map((stop) => (
          <span
            key={stop.id}
            title={tickTitle(view, stop)}
            data-behaviour={stop.behaviour}
            className={
              stop.behaviour === 'gate'
                ? 'absolute top-[-5px] bottom-[-5px] w-[5px] -translate-x-1/2 rounded-sm bg-copper shadow-[0_0_0_1px_rgba(27,36,48,0.9)]'
                : 'absolute top-[-3px] bottom-[-3px] w-[3px] -translate-x-1/2 rounded-sm bg-paper shadow-[0_0_0_1px_rgba(27,36,48,0.9)]'
            }
            style={{ left: `${Math.min(100, Math.max(0, (stop.atMs / durationMs) * 100))}%` }}
          />
        ))}
    </span>,
    holder,
  );
}
