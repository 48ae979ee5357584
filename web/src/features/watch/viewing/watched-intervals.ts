import type { WatchInterval } from '@core/contracts';

/** A timeupdate this far (media ms) from the last one is a jump (a seek the events did not show), not playback. */
export const MAX_STEP_MS = 3000;
/**
 * Up to this much (media ms) past where the video stood still is the same moment: the 'play' event
 * arrives a few ms after playback began, and the player's own step onto a pin (it pauses a frame
 * early, then shows the pinned frame) moves it a little. Without this, a pin at a second's midpoint
 * would leave that second unwatched.
 */
export const BRIDGE_MS = 250;

/**
 * The stretches of the recording actually played, from the player's events: an interval opens when
 * playback starts (where the video stood), grows with each timeupdate, and ends at pause, end, or
 * where playback last was when a seek began. `take()` hands over everything so far (the open interval
 * is cut there and goes on), clamped to the recording, in whole milliseconds, without empty intervals.
 */
export class WatchedIntervals {
  private closed: WatchInterval[] = [];
  private open: { startMs: number; lastMs: number } | null = null;
  /** Where the video stood still (paused, or after a seek), if it did since the last playback. */
  private restingMs: number | null;

  constructor(
    private readonly durationMs: number,
    startMs = 0,
  ) {
    this.restingMs = startMs;
  }

  /** Playback started (or went on after a seek) at `ms`. */
  play(ms: number): void {
    if (this.open) {
      this.progress(ms);
      return;
    }
    const rest = this.restingMs;
    const startMs = rest !== null && ms >= rest && ms - rest <= BRIDGE_MS ? rest : ms;
    this.open = { startMs, lastMs: Math.max(startMs, ms) };
    this.restingMs = null;
  }

  /** The playing video reached `ms`. */
  progress(ms: number): void {
    if (!this.open) return;
    if (ms < this.open.lastMs || ms - this.open.lastMs > MAX_STEP_MS) {
      this.close(this.open.lastMs);
      this.open = { startMs: ms, lastMs: ms };
      return;
    }
    this.open.lastMs = ms;
  }

  /** Paused or ended at `ms`. */
  stop(ms: number): void {
    if (this.open) {
      this.progress(ms);
      const end = this.open?.lastMs ?? ms;
      this.close(end);
      this.restingMs = end;
      return;
    }
    this.restingMs = ms;
  }

  /** A seek began: the video's time is already the target, so the interval ends where playback last was. */
  seeking(): void {
    if (!this.open) return;
    const end = this.open.lastMs;
    this.close(end);
    this.restingMs = end;
  }

  /** A seek ended at `ms`: a small step forward from where the video stood (onto a pin) is seen, not skipped. */
  seeked(ms: number): void {
    const rest = this.restingMs;
    if (rest !== null && ms > rest && ms - rest <= BRIDGE_MS) this.push({ startMs: rest, endMs: ms });
    this.restingMs = ms;
  }

  /** Everything watched since the last take, at most `max` intervals (the rest waits for the next report). */
  take(max: number): WatchInterval[] {
    if (this.open && this.open.lastMs > this.open.startMs) {
      this.push({ startMs: this.open.startMs, endMs: this.open.lastMs });
      this.open = { startMs: this.open.lastMs, lastMs: this.open.lastMs };
    }
    return this.closed.splice(0, max);
  }

  /** A report did not arrive: its intervals go out with the next one. */
  restore(intervals: readonly WatchInterval[]): void {
    this.closed = [...intervals, ...this.closed];
  }

  private close(endMs: number): void {
    if (this.open) this.push({ startMs: this.open.startMs, endMs });
    this.open = null;
  }

  private push(interval: WatchInterval): void {
    const startMs = Math.max(0, Math.min(this.durationMs, Math.floor(interval.startMs)));
    const endMs = Math.max(0, Math.min(this.durationMs, Math.ceil(interval.endMs)));
    if (endMs > startMs) this.closed.push({ startMs, endMs });
  }
}
