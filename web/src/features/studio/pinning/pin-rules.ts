import type { Checkpoint } from '@core/contracts';
import { frameMs, snapToFrame } from '../timeline/timeline-math';

export type SpacingRules = { minSpacingMs: number; durationMs: number; frameRate: number };

export type PlaceCheck =
  | { ok: true; atMs: number }
  | { ok: false; reason: 'too-close'; neighbour: Checkpoint; nearestFreeMs: number | null }
  | { ok: false; reason: 'past-end'; nearestFreeMs: number | null };

/** The checkpoint closer than the lesson's spacing to `atMs`, ignoring the one being moved. */
export function collisionAt(checkpoints: readonly Checkpoint[], atMs: number, minSpacingMs: number, ignoreKey?: string): Checkpoint | null {
  let closest: Checkpoint | null = null;
  for (const checkpoint of checkpoints) {
    if (checkpoint.key === ignoreKey) continue;
    const gap = Math.abs(checkpoint.atMs - atMs);
    if (gap < minSpacingMs && (!closest || gap < Math.abs(closest.atMs - atMs))) closest = checkpoint;
  }
  return closest;
}

/**
 * The free frame nearest to `atMs`: at least the spacing from every other checkpoint and inside the
 * recording. Candidates are `atMs` itself and the first frame outside each neighbour's spacing on either side.
 */
export function nearestFreeTime(checkpoints: readonly Checkpoint[], atMs: number, rules: SpacingRules, ignoreKey?: string): number | null {
  const frame = frameMs(rules.frameRate);
  const lastFrame = Math.floor(rules.durationMs / frame);
  const candidates = [snapToFrame(Math.min(atMs, rules.durationMs), rules.frameRate)];
  for (const checkpoint of checkpoints) {
    if (checkpoint.key === ignoreKey) continue;
    let after = Math.ceil((checkpoint.atMs + rules.minSpacingMs) / frame);
    while (Math.round(after * frame) - checkpoint.atMs < rules.minSpacingMs) after += 1;
    let before = Math.floor((checkpoint.atMs - rules.minSpacingMs) / frame);
    while (checkpoint.atMs - Math.round(before * frame) < rules.minSpacingMs) before -= 1;
    if (after <= lastFrame) candidates.push(Math.round(after * frame));
    if (before >= 0) candidates.push(Math.round(before * frame));
  }
  let best: number | null = null;
  for (const candidate of candidates) {
    if (candidate < 0 || candidate > rules.durationMs) continue;
    if (collisionAt(checkpoints, candidate, rules.minSpacingMs, ignoreKey)) continue;
    if (best === null || Math.abs(candidate - atMs) < Math.abs(best - atMs)) best = candidate;
  }
  return best;
}

/** Whether a checkpoint may be pinned (or moved) to `atMs`, snapped to a frame; if not, why and where instead. */
export function checkPlace(checkpoints: readonly Checkpoint[], atMs: number, rules: SpacingRules, ignoreKey?: string): PlaceCheck {
  const snapped = snapToFrame(atMs, rules.frameRate);
  if (snapped > rules.durationMs) {
    return { ok: false, reason: 'past-end', nearestFreeMs: nearestFreeTime(checkpoints, rules.durationMs, rules, ignoreKey) };
  }
  const neighbour = collisionAt(checkpoints, snapped, rules.minSpacingMs, ignoreKey);
  if (neighbour)
    return { ok: false, reason: 'too-close', neighbour, nearestFreeMs: nearestFreeTime(checkpoints, snapped, rules, ignoreKey) };
  return { ok: true, atMs: snapped };
}
