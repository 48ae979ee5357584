import { guardSeek } from './seek-guard';
import type { OverlayReason } from './player-state';
import { FRAME_WINDOW_MS, SAME_MOMENT_MS, stopAtFrame, timerDecision, wallMsUntil, type Stop } from './stops';

/** The few things the scheduler needs from a video; `clockOf` adapts a video.js player. */
export interface MediaClock {
  currentMs(): number;
  seekMs(ms: number): void;
  paused(): boolean;
  pause(): void;
  rate(): number;
  /** requestVideoFrameCallback where the browser has it: called back with the presented frame's media time. */
  requestFrame: ((callback: (mediaMs: number) => void) => () => void) | null;
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

/** Before the first two frames give the real step: a 30 fps frame of media. */
const DEFAULT_FRAME_MS = 1000 / 30;

/**
 * Stops the video exactly at each pin. `timeupdate` comes only about four times a second, so a
 * timer aims at the pin from the time left and the playback rate, then (where the browser has it)
 * each presented frame is checked; the video is paused early and seeked to the pin, so the frame on
 * screen is the pinned one. If playback overshot anyway (a busy tab), it is seeked back. Seeks are
 * guarded: an unanswered gate cannot be passed, a jumped-over pause checkpoint is shown once.
 */
export class PinScheduler {
  private timer: unknown = null;
  private cancelFrame: (() => void) | null = null;
  private lastFrameMs: number | null = null;
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
    const wall = wallMsUntil(now, stop.atMs, this.clock.rate());
    if (this.clock.requestFrame && wall <= FRAME_WINDOW_MS) {
      this.watchFrames(stop);
      return;
    }
    if (this.clock.requestFrame) {
      this.timer = this.timers.set(() => this.arm(), wall - FRAME_WINDOW_MS / 2);
      return;
    }
    this.aimTimer(stop);
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
    this.cancelFrame = request((mediaMs) => {
      this.cancelFrame = null;
      const rate = this.clock.rate();
      const observed = this.lastFrameMs === null ? null : mediaMs - this.lastFrameMs;
      this.lastFrameMs = mediaMs;
      const step = observed !== null && observed > 0 && observed < 250 * rate ? observed : DEFAULT_FRAME_MS * rate;
      if (this.clock.paused() || !this.hooks.isActive(stop)) return this.arm();
      if (stopAtFrame(mediaMs, step, stop.atMs)) this.reach(stop);
      else this.watchFrames(stop);
    });
  }

  private cancel(): void {
    if (this.timer !== null) this.timers.clear(this.timer);
    this.timer = null;
    this.cancelFrame?.();
    this.cancelFrame = null;
    this.lastFrameMs = null;
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
