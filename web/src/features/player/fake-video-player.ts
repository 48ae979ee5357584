import type { Player } from './video-player';

type Listener = () => void;

/**
 * The part of a video.js player LessonPlayer uses, driven by hand in component tests: set the
 * time, fire the events a browser would. Setting the time fires seeking, seeked and timeupdate at once.
 */
export class FakeVideoPlayer {
  ms = 0;
  isPaused = true;
  rate = 1;
  plays = 0;
  readonly element = document.createElement('div');
  private listeners = new Map<string, Set<Listener>>();

  constructor() {
    this.element.tabIndex = -1;
    const holder = document.createElement('div');
    holder.className = 'vjs-progress-holder';
    this.element.appendChild(holder);
    document.body.appendChild(this.element);
  }

  asPlayer(): Player {
    // Only the methods below are used by the code under test.
    return this as unknown as Player;
  }

  currentTime(seconds?: number): number {
    if (seconds !== undefined) {
      this.ms = seconds * 1000;
      this.emit('seeking');
      this.emit('seeked');
      this.emit('timeupdate');
    }
    return this.ms / 1000;
  }
  paused = () => this.isPaused;
  ended = () => false;
  playbackRate = () => this.rate;
  play = () => {
    this.plays += 1;
    this.isPaused = false;
    this.emit('play');
    return Promise.resolve();
  };
  pause = () => {
    if (this.isPaused) return;
    this.isPaused = true;
    this.emit('pause');
  };
  el = () => this.element;
  isDisposed = () => false;
  isFullscreen = () => false;
  exitFullscreen = () => undefined;
  ready = (callback: () => void) => callback();
  on = (event: string, listener: Listener) => {
    const set = this.listeners.get(event) ?? new Set();
    set.add(listener);
    this.listeners.set(event, set);
  };
  off = (event: string, listener: Listener) => {
    this.listeners.get(event)?.delete(listener);
  };
  emit(event: string): void {
    for (const listener of [...(this.listeners.get(event) ?? [])]) listener();
  }
  /** Playback moved on by itself to `ms` (a timeupdate, as a playing video sends). */
  playTo(ms: number): void {
    this.ms = ms;
    this.emit('timeupdate');
  }
  /** The viewer dragged the progress bar to `ms`. */
  seekByViewer(ms: number): void {
    this.currentTime(ms / 1000);
  }
}
