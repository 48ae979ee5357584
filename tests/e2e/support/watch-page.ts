import { expect } from 'vitest';
import type { Locator, Page } from 'playwright-core';

/**
 * Driving and measuring the student player on the watch page. The player's root is
 * `[data-lesson-player]` with data-ready, data-stop-ms (pin time of the open panel) and
 * data-stop-id; the video is video.js around a <video> element.
 */

// Only what these helpers touch of the DOM (its types are not in the Node-side tsconfig).
interface FrameMetadata {
  mediaTime: number;
}
interface VideoLike {
  currentTime: number;
  pause(): void;
  paused: boolean;
  seeking: boolean;
  ended: boolean;
  playbackRate: number;
  hasAttribute(name: string): boolean;
  play(): Promise<void>;
  requestVideoFrameCallback(callback: (now: number, metadata: FrameMetadata) => void): number;
}
interface FrameProbe {
  /** Media time (ms) of the latest frame presented since the last reset; -1 before any. */
  maxFrameMs: number;
  frames: number;
  /** Where the video was when the player last asked it to pause (before any seek back to the pin). */
  pausedAtMs: number | null;
}
interface ProbeWindow {
  __frameProbe?: FrameProbe;
  document: { querySelector(selector: string): unknown };
}

const VIDEO = '[data-lesson-player] video';

export function playerOf(page: Page): Locator {
  return page.locator('[data-lesson-player]');
}

export async function waitForPlayerReady(page: Page): Promise<void> {
  await playerOf(page).and(page.locator('[data-ready="true"]')).waitFor({ timeout: 30_000 });
}

export interface VideoState {
  currentMs: number;
  paused: boolean;
  seeking: boolean;
  ended: boolean;
  rate: number;
  playsInline: boolean;
}

export async function videoState(page: Page): Promise<VideoState> {
  return page.$eval(VIDEO, (element) => {
    const video = element as unknown as VideoLike;
    return {
      currentMs: video.currentTime * 1000,
      paused: video.paused,
      seeking: video.seeking,
      ended: video.ended,
      rate: video.playbackRate,
      playsInline: video.hasAttribute('playsinline'),
    };
  });
}

/**
 * Records the media time of every frame the video presents (requestVideoFrameCallback) and where
 * the video was each time the player paused it, so a test can say where the video really stopped
 * and whether a frame past a pin reached the screen, not only where it ended up after seeking back.
 */
export async function installFrameProbe(page: Page): Promise<void> {
  await page.$eval(VIDEO, (element) => {
    const video = element as unknown as VideoLike;
    const win = globalThis as unknown as ProbeWindow;
    const probe: FrameProbe = { maxFrameMs: -1, frames: 0, pausedAtMs: null };
    win.__frameProbe = probe;
    const pause = video.pause.bind(video);
    video.pause = () => {
      probe.pausedAtMs = video.currentTime * 1000;
      pause();
    };
    const onFrame = (_now: number, metadata: FrameMetadata) => {
      probe.maxFrameMs = Math.max(probe.maxFrameMs, metadata.mediaTime * 1000);
      probe.frames += 1;
      video.requestVideoFrameCallback(onFrame);
    };
    video.requestVideoFrameCallback(onFrame);
  });
}

/** Forget the frames seen so far (before the video moves on from a stop). */
export async function resetFrameProbe(page: Page): Promise<void> {
  await page.evaluate(() => {
    const probe = (globalThis as unknown as ProbeWindow).__frameProbe;
    if (!probe) throw new Error('installFrameProbe() first.');
    probe.maxFrameMs = -1;
    probe.frames = 0;
    probe.pausedAtMs = null;
  });
}

async function readFrameProbe(page: Page): Promise<FrameProbe> {
  return page.evaluate(() => {
    const probe = (globalThis as unknown as ProbeWindow).__frameProbe;
    if (!probe) throw new Error('installFrameProbe() first.');
    return { ...probe };
  });
}

/** Starts the video with video.js's big play button, as a student does. */
export async function pressPlay(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Play Video' }).click();
}

/** Chooses a playback speed from video.js's speed menu in the control bar ('2x'). */
export async function chooseSpeed(page: Page, label: string): Promise<void> {
  await page.getByRole('button', { name: 'Playback Rate' }).click();
  await page.getByRole('menuitemradio', { name: new RegExp(`^${label.replace('.', '\\.')}`) }).click();
  expect((await videoState(page)).rate).toBe(Number.parseFloat(label));
}

export interface StopMeasurement {
  /** Where the paused video stands (ms of media time). */
  currentMs: number;
  /** Where it was when the player paused it. */
  pausedAtMs: number;
  /** The latest frame presented before and at the stop. */
  maxFrameMs: number;
  rate: number;
}

/**
 * Waits until the player opened the panel of the stop at `atMs` and the video is paused there, then
 * checks the rule: the paused time is never past the pin by more than one frame, and no
 * frame past it by more than one frame reached the screen on the way.
 */
export async function expectStopAt(page: Page, atMs: number, frameMs: number): Promise<StopMeasurement> {
  await playerOf(page)
    .and(page.locator(`[data-stop-ms="${atMs}"]`))
    .waitFor({ timeout: 30_000 });
  let state = await videoState(page);
  for (let tries = 0; tries < 50 && (!state.paused || state.seeking); tries += 1) {
    await page.waitForTimeout(20);
    state = await videoState(page);
  }
  expect(state.paused, `the video is paused at the stop at ${atMs} ms`).toBe(true);
  const probe = await readFrameProbe(page);
  // One frame, plus a millisecond for the element's floating-point seconds.
  const slack = frameMs + 1;
  expect(state.currentMs - atMs, `paused at ${state.currentMs.toFixed(1)} ms for the pin at ${atMs} ms`).toBeLessThanOrEqual(slack);
  expect(atMs - state.currentMs, `paused at ${state.currentMs.toFixed(1)} ms for the pin at ${atMs} ms`).toBeLessThanOrEqual(slack);
  const pausedAtMs = probe.pausedAtMs ?? Number.NaN;
  expect(pausedAtMs - atMs, `paused the video at ${pausedAtMs.toFixed(1)} ms for the pin at ${atMs} ms`).toBeLessThanOrEqual(slack);
  expect(probe.frames, 'frames were presented on the way to the stop').toBeGreaterThan(0);
  expect(probe.maxFrameMs - atMs, `a frame at ${probe.maxFrameMs.toFixed(1)} ms was shown for the pin at ${atMs} ms`).toBeLessThanOrEqual(
    slack,
  );
  return { currentMs: state.currentMs, pausedAtMs, maxFrameMs: probe.maxFrameMs, rate: state.rate };
}

/** The open checkpoint panel (over the video on wide screens, below it on phones). */
export function panelOf(page: Page, title: string): Locator {
  return page.getByRole('dialog', { name: title });
}

/** Moves the video as a drag on the progress bar would (the panel covers the bar on wide screens). */
export async function seekVideo(page: Page, ms: number): Promise<void> {
  await page.$eval(
    VIDEO,
    (element, seconds) => {
      (element as unknown as VideoLike).currentTime = seconds;
    },
    ms / 1000,
  );
}

/** Asks the element to play as a play key or button would; a holding panel must refuse it. */
export async function tryToPlay(page: Page): Promise<void> {
  await page.$eval(VIDEO, (element) => (element as unknown as VideoLike).play().catch(() => undefined));
}

/** Width of the page's content, to check that nothing scrolls sideways on a phone. */
export async function pageScrollWidth(page: Page): Promise<number> {
  return page.evaluate(
    () => (globalThis as unknown as { document: { documentElement: { scrollWidth: number } } }).document.documentElement.scrollWidth,
  );
}
