import { useMemo, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { CHECKPOINT_KIND_LABELS, type Checkpoint } from '@core/contracts';
import { checkpointLabel } from '@core/lessons/checkpoint-label';
import { cn } from '@/lib/cn';
import { formatTime } from '../time/format-time';
import { KIND_SHORT_LABELS, KindIcon } from './kind-icons';
import { assignLanes } from './label-lanes';
import { snapToFrame, timeToX, xToTime, type TimelineScale } from './timeline-math';

const LANES = 3;
const LANE_HEIGHT = 20;
const MARKER_SIZE = 30;
/** Pointer travel below this is a click, not a drag. */
const DRAG_THRESHOLD_PX = 4;

export const MARKER_LANE_HEIGHT = LANES * LANE_HEIGHT + MARKER_SIZE + 6;

type MarkerLaneProps = {
  checkpoints: readonly Checkpoint[];
  scale: TimelineScale;
  frameRate: number;
  selectedKey: string | null;
  problemKeys: ReadonlySet<string>;
  onSelect: (key: string) => void;
  onMove: (key: string, atMs: number) => void;
};

type Drag = { key: string; startX: number; originMs: number; pointerId: number; moved: boolean };

export function markerName(checkpoint: Checkpoint, hasProblems: boolean): string {
  const kind = CHECKPOINT_KIND_LABELS[checkpoint.kind];
  const label = checkpointLabel(checkpoint);
  const name = label === kind ? kind : `${kind}: ${label}`;
  return `${name}, at ${formatTime(checkpoint.atMs)}${hasProblems ? ', has problems to fix' : ''}`;
}

/**
 * A marker per checkpoint: a button with the kind's icon, its short label stacked above in the first free
 * lane. Arrow keys move focus between markers (one Tab stop for all), Enter selects, and the pointer drags
 * a marker to a new frame with its time shown while dragging.
 */
export function MarkerLane({ checkpoints, scale, frameRate, selectedKey, problemKeys, onSelect, onMove }: MarkerLaneProps) {
  const buttons = useRef(new Map<string, HTMLButtonElement>());
  const drag = useRef<Drag | null>(null);
  const suppressClick = useRef(false);
  const [preview, setPreview] = useState<{ key: string; atMs: number } | null>(null);
  const [focusKey, setFocusKey] = useState<string | null>(null);

  const timeOf = (checkpoint: Checkpoint) => (preview?.key === checkpoint.key ? preview.atMs : checkpoint.atMs);
  const lanes = useMemo(
    () =>
      assignLanes(
        checkpoints.map((c) => ({ key: c.key, x: timeToX(c.atMs, scale), width: 30 + KIND_SHORT_LABELS[c.kind].length * 8 })),
        LANES,
      ),
    [checkpoints, scale],
  );
  const rovingKey = checkpoints.some((c) => c.key === focusKey) ? focusKey : (selectedKey ?? checkpoints[0]?.key ?? null);

  function focusAt(index: number) {
    const target = checkpoints[Math.min(Math.max(index, 0), checkpoints.length - 1)];
    if (!target) return;
    setFocusKey(target.key);
    buttons.current.get(target.key)?.focus();
  }

  function onKeyDown(event: KeyboardEvent<HTMLButtonElement>, index: number) {
    const moves: Record<string, number> = { ArrowLeft: index - 1, ArrowRight: index + 1, Home: 0, End: checkpoints.length - 1 };
    const next = moves[event.key];
    if (next === undefined) return;
    event.preventDefault();
    focusAt(next);
  }

  function onPointerDown(event: PointerEvent<HTMLButtonElement>, checkpoint: Checkpoint) {
    if (event.button !== 0) return;
    drag.current = { key: checkpoint.key, startX: event.clientX, originMs: checkpoint.atMs, pointerId: event.pointerId, moved: false };
    event.currentTarget.setPointerCapture?.(event.pointerId);
  }

  function onPointerMove(event: PointerEvent<HTMLButtonElement>) {
    const current = drag.current;
    if (!current || current.pointerId !== event.pointerId) return;
    const dx = event.clientX - current.startX;
    if (!current.moved && Math.abs(dx) < DRAG_THRESHOLD_PX) return;
    current.moved = true;
    const atMs = Math.min(snapToFrame(xToTime(timeToX(current.originMs, scale) + dx, scale), frameRate), scale.durationMs);
    setPreview({ key: current.key, atMs });
  }

  function onPointerUp(event: PointerEvent<HTMLButtonElement>) {
    const current = drag.current;
    drag.current = null;
    if (!current || current.pointerId !== event.pointerId) return;
    if (current.moved) {
      suppressClick.current = true;
      const target = preview?.key === current.key ? preview.atMs : current.originMs;
      setPreview(null);
      if (target !== current.originMs) onMove(current.key, target);
    }
  }

  return (
    <div className="relative" style={{ height: MARKER_LANE_HEIGHT }}>
      {checkpoints.map((checkpoint, index) => {
        const x = timeToX(timeOf(checkpoint), scale);
        const placed = lanes.get(checkpoint.key);
        const selected = checkpoint.key === selectedKey;
        const hasProblems = problemKeys.has(checkpoint.key);
        const dragging = preview?.key === checkpoint.key;
        const lane = dragging ? 0 : placed?.lane;
        return (
          <div key={checkpoint.key}>
            {lane !== null && lane !== undefined ? (
              <span
                aria-hidden="true"
                className={cn(
                  'pointer-events-none absolute border-l-2 pl-1 text-xs leading-5 font-bold whitespace-nowrap',
                  selected ? 'border-ink text-ink' : 'border-line-strong text-ink-muted',
                )}
                style={{ left: x, top: (LANES - 1 - lane) * LANE_HEIGHT, height: (lane + 1) * LANE_HEIGHT }}
              >
                {dragging ? formatTime(preview.atMs) : KIND_SHORT_LABELS[checkpoint.kind]}
                {!dragging && placed && placed.hiddenAfter > 0 ? ` +${placed.hiddenAfter}` : ''}
              </span>
            ) : null}
            <button
              type="button"
              ref={(element) => {
                if (element) buttons.current.set(checkpoint.key, element);
                else buttons.current.delete(checkpoint.key);
              }}
              tabIndex={checkpoint.key === rovingKey ? 0 : -1}
              aria-label={markerName(checkpoint, hasProblems)}
              aria-pressed={selected}
              title={markerName(checkpoint, hasProblems)}
              data-marker={checkpoint.key}
              onFocus={() => setFocusKey(checkpoint.key)}
              onKeyDown={(event) => onKeyDown(event, index)}
              onPointerDown={(event) => onPointerDown(event, checkpoint)}
              onPointerMove={onPointerMove}
              onPointerUp={onPointerUp}
              onPointerCancel={() => {
                drag.current = null;
                setPreview(null);
              }}
              onClick={() => {
                if (suppressClick.current) {
                  suppressClick.current = false;
                  return;
                }
                onSelect(checkpoint.key);
              }}
              className={cn(
                'absolute flex cursor-grab touch-none items-center justify-center rounded-md border-2 active:cursor-grabbing',
                selected ? 'z-20 border-ink bg-ink text-surface shadow-md' : 'z-10 border-line-strong bg-surface text-ink hover:bg-sunken',
                dragging && 'z-30 ring-2 ring-teal',
              )}
              style={{ left: x - MARKER_SIZE / 2, top: LANES * LANE_HEIGHT + 2, width: MARKER_SIZE, height: MARKER_SIZE }}
            >
              <KindIcon kind={checkpoint.kind} className="size-5" />
              {hasProblems ? (
                <span
                  aria-hidden="true"
                  className="absolute -top-2 -right-2 flex size-4 items-center justify-center rounded-full bg-danger text-[10px] font-bold text-surface"
                >
                  !
                </span>
              ) : null}
            </button>
          </div>
        );
      })}
    </div>
  );
}
