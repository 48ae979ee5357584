/**
 * Numbers behind the timeline: time to pixels and back at a zoom, frames, ruler ticks, and where to
 * scroll so the playhead stays in view. Pure, so every rule is tested without a browser.
 */
export const DEFAULT_FRAME_RATE = 30;
export const ZOOM_LEVELS = [1, 1.5, 2, 3, 4, 6, 8, 12, 16, 24, 32] as const;

export type TimelineScale = { durationMs: number; /** Width of the whole timeline content at this zoom. */ widthPx: number };

/** The recording's frame rate, or 30 when it is unknown or not a sensible number. */
export function effectiveFrameRate(frameRate: number | null | undefined): number {
  return frameRate && Number.isFinite(frameRate) && frameRate > 0 && frameRate <= 240 ? frameRate : DEFAULT_FRAME_RATE;
}

export function frameMs(frameRate: number): number {
  return 1000 / effectiveFrameRate(frameRate);
}

/** The start of the frame nearest to `ms`, in whole milliseconds (times are stored as integers). */
export function snapToFrame(ms: number, frameRate: number): number {
  const frame = frameMs(frameRate);
  return Math.max(0, Math.round(Math.round(ms / frame) * frame));
}

/** `ms` moved by whole frames (negative: back), landing on a frame and kept inside [0, durationMs]. */
export function stepFrames(ms: number, frames: number, frameRate: number, durationMs: number): number {
  const frame = frameMs(frameRate);
  const index = Math.round(ms / frame) + frames;
  const last = Math.floor(durationMs / frame);
  return Math.round(Math.min(Math.max(index, 0), last) * frame);
}

/** `ms` moved by `deltaMs` (one second), then onto a frame, inside the recording. */
export function stepTime(ms: number, deltaMs: number, frameRate: number, durationMs: number): number {
  return stepFrames(ms + deltaMs, 0, frameRate, durationMs);
}

export function timelineWidth(viewWidthPx: number, zoom: number): number {
  return Math.max(1, viewWidthPx) * zoom;
}

export function timeToX(ms: number, scale: TimelineScale): number {
  if (scale.durationMs <= 0) return 0;
  return (Math.min(Math.max(ms, 0), scale.durationMs) / scale.durationMs) * scale.widthPx;
}

export function xToTime(x: number, scale: TimelineScale): number {
  if (scale.widthPx <= 0) return 0;
  return Math.min(Math.max(x / scale.widthPx, 0), 1) * scale.durationMs;
}

export function zoomIn(zoom: number): number {
  return ZOOM_LEVELS.find((level) => level > zoom) ?? ZOOM_LEVELS[ZOOM_LEVELS.length - 1]!;
}

export function zoomOut(zoom: number): number {
  return [...ZOOM_LEVELS].reverse().find((level) => level < zoom) ?? ZOOM_LEVELS[0];
}

/**
 * The scroll position after zooming that keeps the moment under `anchorX` (pixels from the view's left
 * edge) where it was, so Ctrl+wheel zooms around the pointer.
 */
export function scrollAfterZoom(scrollLeft: number, anchorX: number, oldWidth: number, newWidth: number, viewWidth: number): number {
  const fraction = oldWidth > 0 ? (scrollLeft + anchorX) / oldWidth : 0;
  return clampScroll(fraction * newWidth - anchorX, newWidth, viewWidth);
}

export function clampScroll(scrollLeft: number, contentWidth: number, viewWidth: number): number {
  return Math.min(Math.max(0, scrollLeft), Math.max(0, contentWidth - viewWidth));
}

/**
 * Where to scroll so the playhead is visible: unchanged while it is inside the view (with a margin),
 * otherwise the playhead is put a quarter of the way in, so playback runs on into view.
 */
export function followPlayhead(scrollLeft: number, playheadX: number, viewWidth: number, contentWidth: number, margin = 24): number {
  if (playheadX >= scrollLeft + margin && playheadX <= scrollLeft + viewWidth - margin) return scrollLeft;
  return clampScroll(playheadX - viewWidth / 4, contentWidth, viewWidth);
}

const TICK_STEPS_MS = [100, 200, 500, 1000, 2000, 5000, 10_000, 15_000, 30_000, 60_000, 120_000, 300_000, 600_000, 1_800_000];

/** The smallest ruler step that leaves at least `minGapPx` between ticks. */
export function tickStepMs(scale: TimelineScale, minGapPx = 72): number {
  const pxPerMs = scale.durationMs > 0 ? scale.widthPx / scale.durationMs : 0;
  return TICK_STEPS_MS.find((step) => step * pxPerMs >= minGapPx) ?? TICK_STEPS_MS[TICK_STEPS_MS.length - 1]!;
}

/** Tick times from the first at or after `fromMs` to `toMs`. */
export function ticksBetween(fromMs: number, toMs: number, stepMs: number): number[] {
  const ticks: number[] = [];
  for (let t = Math.ceil(fromMs / stepMs) * stepMs; t <= toMs; t += stepMs) ticks.push(t);
  return ticks;
}
