import type { MediaClock, Timers } from './pin-scheduler';

type Listener = () => void;

export type FakeClockOptions = {
  /** Offer per-frame callbacks (requestVideoFrameCallback). */
  frames?: boolean;
  /** Frames per second of media (30 unless said). */
  fps?: number;
  /**
   * How late (wall-clock ms) the n-th frame callback runs after its frame was presented: a loaded
   * machine's busy main thread. Frames go on being presented meanwhile; a callback that runs late
   * reports the latest frame presented by then, as a browser does.
   */
  callbackDelay?: (n: number) => number;
};

/**
 * A video and a wall clock for the scheduler's tests, stepped one wall-clock millisecond at a time:
 * media time runs at the playback rate, timeupdate comes every 250 ms, frames (when enabled) every
 * 1/fps s of media, timers when due. A "busy tab" drops timers and frames to test the overshoot path;
 * `callbackDelay` makes frame callbacks late instead. `presentedMs` lists every frame shown while
 * playing, so a test can tell whether one past a pin reached the screen.
 */
export class FakeClock implements MediaClock, Timers {
  ms = 0;
  playing = false;
  playbackRate = 1;
  wall = 0;
  /** Media times at which pause() was called. */
  pausedAt: number[] = [];
  /** Media times of the frames presented while playing, oldest first. */
  presentedMs: number[] = [];
  busy = false;
  private listeners = new Map<string, Set<Listener>>();
  private timerList: { id: number; at: number; fn: () => void }[] = [];
  private frameCallbacks: { id: number; fn: (mediaMs: number, wallMs: number) => void }[] = [];
  /** A frame callback waiting for the (late) main thread: when it runs, and the frame it reports. */
  private delivery: { at: number; mediaMs: number } | null = null;
  private deliveries = 0;
  private nextId = 1;
  private readonly frameMs: number;
  private readonly callbackDelay: (n: number) => number;
  requestFrame: MediaClock['requestFrame'];

  constructor(options: FakeClockOptions = {}) {
    this.frameMs = 1000 / (options.fps ?? 30);
    this.callbackDelay = options.callbackDelay ?? (() => 0);
    this.requestFrame = options.frames
      ? (fn) => {
          const id = this.nextId++;
          this.frameCallbacks.push({ id, fn });
          return () => {
            this.frameCallbacks = this.frameCallbacks.filter((c) => c.id !== id);
          };
        }
      : null;
  }

  currentMs = () => this.ms;
  paused = () => !this.playing;
  rate = () => this.playbackRate;
  pause = () => {
    if (!this.playing) return;
    this.pausedAt.push(this.ms);
    this.playing = false;
    this.emit('pause');
  };
  play(): void {
    this.playing = true;
    this.emit('play');
  }
  seekMs = (ms: number) => {
    this.ms = ms;
    this.emit('seeking');
    this.emit('seeked');
  };
  on(event: string, listener: Listener): () => void {
    const set = this.listeners.get(event) ?? new Set();
    set.add(listener);
    this.listeners.set(event, set);
    return () => set.delete(listener);
  }
  emit(event: string): void {
    for (const listener of [...(this.listeners.get(event) ?? [])]) listener();
  }
  set = (fn: () => void, ms: number) => {
    const id = this.nextId++;
    this.timerList.push({ id, at: this.wall + Math.max(0, ms), fn });
    return id;
  };
  clear = (handle: unknown) => {
    this.timerList = this.timerList.filter((t) => t.id !== handle);
  };

  /** The latest frame presented while playing (-1 before any). */
  get maxPresentedMs(): number {
    return this.presentedMs.reduce((max, ms) => Math.max(max, ms), -1);
  }

  /** Run the wall clock forward. */
  advance(wallMs: number): void {
    for (let step = 0; step < wallMs; step += 1) {
      this.wall += 1;
      if (this.playing) {
        const before = Math.floor(this.ms / this.frameMs);
        this.ms += this.playbackRate;
        const after = Math.floor(this.ms / this.frameMs);
        if (after > before) this.present(after * this.frameMs);
        if (this.wall % 250 === 0) this.emit('timeupdate');
      }
      this.deliverFrame();
      const due = this.timerList.filter((t) => t.at <= this.wall);
      this.timerList = this.timerList.filter((t) => t.at > this.wall);
      if (!this.busy) for (const timer of due) timer.fn();
    }
  }

  private present(mediaMs: number): void {
    this.presentedMs.push(mediaMs);
    if (this.busy || this.frameCallbacks.length === 0) return;
    if (this.delivery) this.delivery.mediaMs = mediaMs;
    else this.delivery = { at: this.wall + Math.max(0, this.callbackDelay(this.deliveries++)), mediaMs };
  }

  private deliverFrame(): void {
    const delivery = this.delivery;
    if (!delivery || delivery.at > this.wall) return;
    this.delivery = null;
    for (const callback of this.frameCallbacks.splice(0)) callback.fn(delivery.mediaMs, this.wall);
  }
}
