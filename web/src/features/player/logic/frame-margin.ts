import { SAME_MOMENT_MS } from './stops';

/** Assumed wall-clock gap between frame callbacks until two of them measured one (a 30 fps video at 1x). */
export const DEFAULT_CALLBACK_GAP_MS = 1000 / 30;
/**
 * The longest gap that counts. A stall longer than this (a tab in the background, a debugger) says
 * nothing about the next frames and would make every later pause needlessly early.
 */
export const MAX_CALLBACK_GAP_MS = 150;
/**
 * How many of the worst recent gaps the pause comes before the pin: the next callback may run this
 * many times later than the worst one measured lately and the video still stops before the pin.
 */
export const CALLBACK_GAP_FACTOR = 2;
/** How many of the latest gaps are remembered (about a second and a quarter of a 24 fps video at 2x). */
export const GAP_HISTORY = 60;

/**
 * The gaps between frame callbacks, in wall-clock ms, that set how early the video must be paused.
 * A gap counts as the longer of the wall time between two callbacks and the media advance between
 * them at the playback rate (a frame callback skipped while the page was busy shows in either).
 */
export class CallbackGaps {
  private readonly gaps: number[] = [];

  note(wallMs: number, mediaStepMs: number, rate: number): void {
    const gap = Math.max(wallMs, rate > 0 ? mediaStepMs / rate : 0);
    if (!Number.isFinite(gap) || gap <= 0) return;
    this.gaps.push(Math.min(gap, MAX_CALLBACK_GAP_MS));
    if (this.gaps.length > GAP_HISTORY) this.gaps.shift();
  }

  /** The worst recent gap (the default before any was measured). */
  worst(): number {
    return this.gaps.length === 0 ? DEFAULT_CALLBACK_GAP_MS : Math.max(...this.gaps);
  }
}

/**
 * Media milliseconds the video may still play before the page next gets to pause it: the worst
 * recent callback gap, times the safety factor, at the playback rate (2x plays twice the media in
 * the same wall time).
 */
export function frameMarginMs(worstGapMs: number, rate: number): number {
  const safeRate = rate > 0 ? rate : 1;
  return CALLBACK_GAP_FACTOR * Math.min(worstGapMs, MAX_CALLBACK_GAP_MS) * safeRate;
}

/**
 * At a frame callback: pause now if the video could reach the pin before the next chance to pause
 * (it is then sought exactly onto the pin), so no frame past the pin reaches the screen.
 */
export function pauseBeforePin(positionMs: number, marginMs: number, stopMs: number): boolean {
  return positionMs + marginMs >= stopMs - SAME_MOMENT_MS;
}
