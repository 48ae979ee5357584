import { CHECKPOINT_KIND_LABELS, type CheckpointKind } from '@core/contracts';
import { checkpointLabel } from '@core/lessons/checkpoint-label';
import { formatGap } from '@core/lessons/time-format';
import { formatTime } from '../time/format-time';
import type { PlaceCheck } from './pin-rules';

/** Why a pin or a move was refused, in one sentence that names the neighbour and the rule. */
export function refusalText(
  check: Exclude<PlaceCheck, { ok: true }>,
  verb: 'pinned' | 'moved',
  atMs: number,
  durationMs: number,
  minSpacingMs: number,
): string {
  if (check.reason === 'past-end') {
    return `Not ${verb}: ${formatTime(atMs)} is past the end of the recording (${formatTime(durationMs)}).`;
  }
  const gap = Math.abs(check.neighbour.atMs - atMs);
  return `Not ${verb}: ${formatTime(atMs)} is only ${formatGap(gap)} from “${checkpointLabel(check.neighbour)}” at ${formatTime(check.neighbour.atMs)}; this lesson keeps at least ${formatGap(minSpacingMs)} between checkpoints.`;
}

export function pinnedText(kind: CheckpointKind, atMs: number): string {
  return `Pinned a ${CHECKPOINT_KIND_LABELS[kind].toLowerCase()} at ${formatTime(atMs)}.`;
}
