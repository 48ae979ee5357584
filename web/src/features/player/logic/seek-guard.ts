import { SAME_MOMENT_MS, type Stop } from './stops';

export type SeekVerdict =
  | { action: 'allow' }
  /** An unanswered gate lies before the target: go back to it. */
  | { action: 'return'; stop: Stop }
  /** An unanswered pause checkpoint was jumped over: show it once, where the viewer landed. */
  | { action: 'show'; stop: Stop };

/**
 * What a seek from `fromMs` to `toMs` may do. `isDone` says whether a stop was answered, skipped or
 * acknowledged. A gate before the target refuses the seek whatever the starting point (jumping from
 * a chapter list counts too); a pause pin jumped over while seeking forward is shown once.
 */
export function guardSeek(stops: readonly Stop[], fromMs: number, toMs: number, isDone: (stop: Stop) => boolean): SeekVerdict {
  const gate = stops.find((s) => s.phase === 'pin' && s.behaviour === 'gate' && s.atMs < toMs - SAME_MOMENT_MS && !isDone(s));
  if (gate) return { action: 'return', stop: gate };
  if (toMs <= fromMs) return { action: 'allow' };
  const passed = stops.find(
    (s) => s.phase === 'pin' && s.behaviour === 'pause' && s.atMs > fromMs + SAME_MOMENT_MS && s.atMs < toMs - SAME_MOMENT_MS && !isDone(s),
  );
  return passed ? { action: 'show', stop: passed } : { action: 'allow' };
}
