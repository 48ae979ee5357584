import type { ViewingReport, ViewingResultDto } from '@core/contracts';
import { LIMITS } from '@core/limits';
import type { WatchedIntervals } from './watched-intervals';

/** Reports go out this often while something was watched. */
export const REPORT_EVERY_MS = 10_000;

type Timers = { every(callback: () => void, ms: number): unknown; stop(handle: unknown): void };

export type ReporterDeps = {
  watched: WatchedIntervals;
  /** Where the video is now (the resume point), in ms. */
  positionMs(): number;
  send(report: ViewingReport): Promise<ViewingResultDto>;
  /** The last report as the page goes away: nobody waits for it. */
  sendOnHide(report: ViewingReport): void;
  onResult?(result: ViewingResultDto): void;
  timers?: Timers;
};

const browserTimers: Timers = {
  every: (callback, ms) => setInterval(callback, ms),
  stop: (handle) => clearInterval(handle as ReturnType<typeof setInterval>),
};

/**
 * Batches what was watched: every 10 s, and whenever the page asks (pause, seek, hidden), one report
 * at a time; a report that failed gives its intervals back for the next one. A moved position alone
 * (a seek while paused) is reported too, so the resume point follows the student.
 */
export class ViewingReporter {
  private handle: unknown = null;
  private inFlight: Promise<void> | null = null;
  private lastPosition: number | null = null;
  private readonly timers: Timers;

  constructor(private readonly deps: ReporterDeps) {
    this.timers = deps.timers ?? browserTimers;
  }

  start(): void {
    if (this.handle === null) this.handle = this.timers.every(() => void this.report(), REPORT_EVERY_MS);
  }

  stop(): void {
    if (this.handle !== null) this.timers.stop(this.handle);
    this.handle = null;
  }

  /** Sends what is waiting now (one report at a time: a second call while one is out waits for it). */
  async report(): Promise<void> {
    if (this.inFlight) await this.inFlight;
    const next = this.next();
    if (!next) return;
    this.inFlight = this.deps
      .send(next)
      .then(
        (result) => {
          this.lastPosition = next.positionMs;
          this.deps.onResult?.(result);
        },
        () => this.deps.watched.restore(next.intervals),
      )
      .finally(() => {
        this.inFlight = null;
      });
    await this.inFlight;
  }

  /** The page is going away: hand everything to the keepalive/beacon path at once. */
  reportOnHide(): void {
    const next = this.next();
    if (!next) return;
    this.lastPosition = next.positionMs;
    this.deps.sendOnHide(next);
  }

  private next(): ViewingReport | null {
    const intervals = this.deps.watched.take(LIMITS.viewingIntervalsMax);
    const positionMs = Math.max(0, Math.round(this.deps.positionMs()));
    if (intervals.length === 0 && positionMs === this.lastPosition) return null;
    return { intervals, positionMs };
  }
}
