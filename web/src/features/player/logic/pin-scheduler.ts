import { guardSeek } from './seek-guard';
import type { OverlayReason } from './player-state';
import { CallbackGaps, frameMarginMs, pauseBeforePin } from './frame-margin';
import { SAME_MOMENT_MS, timerDecision, type Stop } from './stops';

/** The few things the scheduler needs from a video; `clockOf` adapts a video.js player. */
export interface MediaClock {
  currentMs(): number;
  seekMs(ms: number): void;
  paused(): boolean;
  pause(): void;
  rate(): number;
  /**
   * requestVideoFrameCallback where the browser has it: called back with the presented frame's media
   * time and the wall-clock time (ms, performance.now()) at which the callback ran.
   */
  requestFrame: ((callback: (mediaMs: number, wallMs: number) => void) => () => void) | null;
  on(event: 'play' | 'pause' | 'timeupdate' | 'seeking' | 'seeked' | 'ratechange', listener: () => void): () => void;
}

export interface Timers {
  set(callback: () => void, ms: number): unknown;
  clear(handle: unknown): void;
}

export interface SchedulerHooks {
  /** The video should still stop (or show an aside) here. */
  isActive(stop: Stop): boolean;
  /** Answered, skipped or acknowledged: a seek may pass it. */
  isDone(stop: Stop): boolean;
  /** An overlay that holds the video is open: playing is refused until it closes. */
  isHolding(): boolean;
  onStop(stop: Stop, reason: OverlayReason): void;
}

const browserTimers: Timers = {
  set: (callback, ms) => setTimeout(callback, ms),
  clear: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
};

/**
 * Stops the video exactly at each pin. `timeupdate` comes only about four times a second, so where
 * the browser has requestVideoFrameCallback every presented frame is checked while playing: the
 * video is paused as soon as it could reach the pin before the next callback (a margin that grows
 * with the playback rate and with how late callbacks have come lately), then sought exactly onto the
 * pin, so no frame past it reaches the screen and the frame left there is the pinned one. Without
 * frame callbacks a timer aims at the pin from the time left and the rate. If playback overshot
 * anyway (a tab in the background), it is sought back. Seeks are guarded: an unanswered gate cannot
 * be passed, a jumped-over pause checkpoint is shown once.
 */
export class PinScheduler {
  private timer: unknown = null;
  private cancelFrame: (() => void) | null = null;
  /** The previous frame callback of this run of frames (media ms, wall ms). */
  private lastFrame: { mediaMs: number; wallMs: number } | null = null;
  /** Kept across runs: how late frame callbacks have come lately sets the early pause. */
  private readonly gaps = new CallbackGaps();
  /** The media time before the latest seek began: where a seek is measured from. */
  private lastMs: number;
  private ownSeekMs: number | null = null;
  private readonly detach: (() => void)[] = [];

  constructor(
    private readonly clock: MediaClock,
    private readonly stops: readonly Stop[],
    private readonly hooks: SchedulerHooks,
    private readonly timers: Timers = browserTimers,
  ) {
    this.lastMs = clock.currentMs();
    this.detach.push(
      clock.on('play', () => this.onPlay()),
      clock.on('pause', () => this.cancel()),
      clock.on('ratechange', () => this.arm()),
      clock.on('timeupdate', () => this.onTimeUpdate()),
      clock.on('seeking', () => this.onSeeking()),
      clock.on('seeked', () => this.arm()),
    );
  }

  dispose(): void {
    this.cancel();
    for (const off of this.detach.splice(0)) off();
  }

  /** A seek the viewer asked for (chapter list, checkpoint list): guarded like a drag on the bar. */
  seekTo(ms: number): void {
    this.clock.seekMs(ms);
  }

  /** Look again for the next stop (after an overlay closed or the state changed). */
  arm(): void {
    this.cancel();
    if (this.clock.paused()) return;
    const now = this.clock.currentMs();
    const stop = this.upcoming(now);
    if (!stop) return;
    // Every frame, not only near the pin: the gaps measured on the way tell how early to pause.
    if (this.clock.requestFrame) this.watchFrames(stop);
    else this.aimTimer(stop);
  }

  private upcoming(fromMs: number): Stop | null {
    return this.stops.find((s) => s.atMs >= fromMs - SAME_MOMENT_MS && this.hooks.isActive(s)) ?? null;
  }

  private aimTimer(stop: Stop): void {
    const decision = timerDecision(this.clock.currentMs(), stop.atMs, this.clock.rate());
    if (decision.stop) {
      this.reach(stop);
      return;
    }
    this.timer = this.timers.set(() => {
      this.timer = null;
      if (this.clock.paused() || !this.hooks.isActive(stop)) return this.arm();
      this.aimTimer(stop);
    }, decision.waitMs);
  }

  private watchFrames(stop: Stop): void {
    const request = this.clock.requestFrame;
    if (!request) return;
    this.cancelFrame = request((mediaMs, wallMs) => {
      this.cancelFrame = null;
      const rate = this.clock.rate();
      const last = this.lastFrame;
      if (last) this.gaps.note(wallMs - last.wallMs, mediaMs - last.mediaMs, rate);
      this.lastFrame = { mediaMs, wallMs };
      if (this.clock.paused() || !this.hooks.isActive(stop)) return this.arm();
      // The element's own time may be ahead of the reported frame when the callback ran late.
      const position = Math.max(mediaMs, this.clock.currentMs());
      if (pauseBeforePin(position, frameMarginMs(this.gaps.worst(), rate), stop.atMs)) this.reach(stop);
      else this.watchFrames(stop);
    });
  }

  private cancel(): void {
    if (this.timer !== null) this.timers.clear(this.timer);
    this.timer = null;
    this.cancelFrame?.();
    this.cancelFrame = null;
    this.lastFrame = null;
  }

  private ownSeek(ms: number): void {
    this.ownSeekMs = ms;
    this.lastMs = ms;
    this.clock.seekMs(ms);
  }

  private reach(stop: Stop, reason: OverlayReason = 'reached'): void {
    this.cancel();
    if (stop.pauses) {
      this.clock.pause();
      // Paused a little early (or late): the frame on screen becomes the pinned one.
      if (Math.abs(this.clock.currentMs() - stop.atMs) > 0) this.ownSeek(stop.atMs);
      this.lastMs = stop.atMs;
    }
    this.hooks.onStop(stop, reason);
    if (!stop.pauses) this.arm();
  }

  private onPlay(): void {
    if (this.hooks.isHolding()) {
      this.clock.pause();
      return;
    }
    this.lastMs = this.clock.currentMs();
    this.arm();
  }

  private onTimeUpdate(): void {
    const now = this.clock.currentMs();
    if (this.clock.paused()) return;
    // A pin crossed since the last look, during plain playback (a seek moves lastMs past it).
    const crossed = this.stops.find(
      (s) => s.atMs >= this.lastMs - SAME_MOMENT_MS && s.atMs <= now + SAME_MOMENT_MS && this.hooks.isActive(s),
    );
    this.lastMs = now;
    if (crossed) this.reach(crossed);
  }

  private onSeeking(): void {
    // A jump in media time is not a late frame callback.
    this.lastFrame = null;
    const to = this.clock.currentMs();
    if (this.ownSeekMs !== null && Math.abs(to - this.ownSeekMs) <= SAME_MOMENT_MS) {
      this.ownSeekMs = null;
      this.lastMs = to;
      return;
    }
    this.ownSeekMs = null;
    const verdict = guardSeek(this.stops, this.lastMs, to, (s) => this.hooks.isDone(s));
    if (verdict.action === 'return') {
      this.cancel();
      this.clock.pause();
      this.ownSeek(verdict.stop.atMs);
      this.hooks.onStop(verdict.stop, 'returned');
      return;
    }
    this.lastMs = to;
    if (verdict.action === 'show') {
      this.cancel();
      this.clock.pause();
      this.hooks.onStop(verdict.stop, 'passed');
    }
  }
}
