import type { Behaviour, StudentCheckpoint, StudentLessonView } from '@core/contracts';

/**
 * The moments the player acts on: each checkpoint's pin and, for a prediction, its reveal later in
 * the recording. Times are in milliseconds of media time.
 */
export type Stop = {
  /** The checkpoint key, or `<key>:reveal` for a prediction's reveal. */
  id: string;
  key: string;
  atMs: number;
  phase: 'pin' | 'reveal';
  behaviour: Behaviour;
  /** Pause and gate stop the video; an aside is shown beside it while it plays. A reveal always pauses. */
  pauses: boolean;
};

/** Media times closer than this are the same moment (floating-point seconds from the element). */
export const SAME_MOMENT_MS = 1;

export function revealId(key: string): string {
  return `${key}:reveal`;
}

export function buildStops(view: StudentLessonView): Stop[] {
  const stops: Stop[] = [];
  for (const checkpoint of view.checkpoints) {
    stops.push({
      id: checkpoint.key,
      key: checkpoint.key,
      atMs: checkpoint.atMs,
      phase: 'pin',
      behaviour: checkpoint.behaviour,
      pauses: checkpoint.behaviour !== 'aside',
    });
    if (checkpoint.kind === 'prediction') {
      stops.push({
        id: revealId(checkpoint.key),
        key: checkpoint.key,
        atMs: checkpoint.revealAtMs,
        phase: 'reveal',
        behaviour: 'pause',
        pauses: true,
      });
    }
  }
  // Stable: at the same moment a pin comes before a reveal.
  return stops.sort((a, b) => a.atMs - b.atMs || (a.phase === b.phase ? 0 : a.phase === 'pin' ? -1 : 1));
}

/** The first stop still to act on at or after `fromMs`. */
export function nextStop(stops: readonly Stop[], fromMs: number, isActive: (stop: Stop) => boolean): Stop | null {
  for (const stop of stops) {
    if (stop.atMs >= fromMs - SAME_MOMENT_MS && isActive(stop)) return stop;
  }
  return null;
}

/** How early a timer aims before the pin (wall-clock ms): timers run late, never early. */
export const TIMER_LEAD_MS = 40;

/** Wall-clock milliseconds from now until the media reaches `stopMs` at `rate`. */
export function wallMsUntil(currentMs: number, stopMs: number, rate: number): number {
  const safeRate = rate > 0 ? rate : 1;
  return Math.max(0, (stopMs - currentMs) / safeRate);
}

/**
 * When a timer fired: stop now (and seek forward to the pin) if the pin is within the timer's
 * lead, otherwise wait this many more wall-clock milliseconds.
 */
export function timerDecision(currentMs: number, stopMs: number, rate: number): { stop: true } | { stop: false; waitMs: number } {
  const wall = wallMsUntil(currentMs, stopMs, rate);
  if (wall <= TIMER_LEAD_MS * 1.5) return { stop: true };
  return { stop: false, waitMs: wall - TIMER_LEAD_MS };
}

/**
 * The pins of checkpoints that take no answer (equation cards, notes) lying before `ms`: on resuming
 * there, the student saw them last time, and nothing on the server says so (answers do).
 */
export function answerlessPinsBefore(view: StudentLessonView, stops: readonly Stop[], ms: number): string[] {
  const answerless = new Set(view.checkpoints.filter((c) => !('attempts' in c)).map((c) => c.key));
  return stops.filter((s) => s.phase === 'pin' && answerless.has(s.key) && s.atMs < ms - SAME_MOMENT_MS).map((s) => s.id);
}

export function checkpointAt(view: StudentLessonView, key: string): StudentCheckpoint | undefined {
  return view.checkpoints.find((c) => c.key === key);
}
