import type { MediaClock, Timers } from './pin-scheduler';

type Listener = () => void;

/**
 * A video and a wall clock for the scheduler's tests, stepped one wall-clock millisecond at a time:
 * media time runs at the playback rate, timeupdate comes every 250 ms, frames (when enabled) every
 * 1/30 s of media, timers when due. A "busy tab" drops timers and frames to test the overshoot path.
 */
export class FakeClock implements MediaClock, Timers {
  ms = 0;
  playing = false;
  playbackRate = 1;
  wall = 0;
  /** Media times at which pause() was called. */
  pausedAt: number[] = [];
  busy = false;
  private listeners = new Map<string, Set<Listener>>();
  private timerList: { id: number; at: number; fn: () => void }[] = [];
  private frameCallbacks: { id: number; fn: (mediaMs: number) => void }[] = [];
  private nextId = 1;
  requestFrame: MediaClock['requestFrame'];

  constructor(options: { frames?: boolean } = {}) {
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

  /** Run the wall clock forward. */
  advance(wallMs: number): void {
    const frame = 1000 / 30;
    for (let step = 0; step < wallMs; step += 1) {
      this.wall += 1;
      if (this.playing) {
        const before = Math.floor(this.ms / frame);
        this.ms += this.playbackRate;
        const after = Math.floor(this.ms / frame);
        if (after > before && !this.busy) {
          const callbacks = this.frameCallbacks.splice(0);
          for (const callback of callbacks) callback.fn(after * frame);
        }
        if (this.wall % 250 === 0) this.emit('timeupdate');
      }
      const due = this.timerList.filter((t) => t.at <= this.wall);
      this.timerList = this.timerList.filter((t) => t.at > this.wall);
      if (!this.busy) for (const timer of due) timer.fn();
    }
  }
}
