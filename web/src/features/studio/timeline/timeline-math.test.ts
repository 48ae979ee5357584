import { describe, expect, it } from 'vitest';
import {
  clampScroll,
  effectiveFrameRate,
  followPlayhead,
  frameMs,
  scrollAfterZoom,
  snapToFrame,
  stepFrames,
  stepTime,
  tickStepMs,
  ticksBetween,
  timeToX,
  timelineWidth,
  xToTime,
  zoomIn,
  zoomOut,
} from './timeline-math';

describe('timeline math', () => {
  it('maps time to pixels and back at a zoom', () => {
    const scale = { durationMs: 60_000, widthPx: timelineWidth(600, 2) };
    expect(scale.widthPx).toBe(1200);
    expect(timeToX(30_000, scale)).toBe(600);
    expect(timeToX(-5, scale)).toBe(0);
    expect(timeToX(90_000, scale)).toBe(1200);
    expect(xToTime(300, scale)).toBe(15_000);
    expect(xToTime(5000, scale)).toBe(60_000);
    expect(xToTime(timeToX(12_345, scale), scale)).toBeCloseTo(12_345, 6);
    expect(timeToX(5, { durationMs: 0, widthPx: 100 })).toBe(0);
  });

  it('snaps to frames of the recording, 30 per second when unknown', () => {
    expect(effectiveFrameRate(null)).toBe(30);
    expect(effectiveFrameRate(0)).toBe(30);
    expect(effectiveFrameRate(25)).toBe(25);
    expect(frameMs(25)).toBe(40);
    expect(snapToFrame(1019, 25)).toBe(1000);
    expect(snapToFrame(1021, 25)).toBe(1040);
    // 30 fps frames start at 0, 33, 67, 100 ms (1000/30 rounded to whole milliseconds)
    expect([10, 40, 60, 90].map((ms) => snapToFrame(ms, 30))).toEqual([0, 33, 67, 100]);
    expect(snapToFrame(-20, 30)).toBe(0);
  });

  it('steps by frames and seconds inside the recording', () => {
    expect(stepFrames(1000, 1, 25, 10_000)).toBe(1040);
    expect(stepFrames(1000, -1, 25, 10_000)).toBe(960);
    expect(stepFrames(33, 1, 30, 10_000)).toBe(67);
    expect(stepFrames(67, -1, 30, 10_000)).toBe(33);
    expect(stepFrames(20, -3, 25, 10_000)).toBe(0);
    expect(stepFrames(9990, 5, 25, 10_000)).toBe(10_000);
    expect(stepTime(1000, 1000, 25, 10_000)).toBe(2000);
    expect(stepTime(500, -1000, 25, 10_000)).toBe(0);
    expect(stepFrames(10_000, 1, 30, 10_010)).toBe(10_000);
  });

  it('zooms through fixed levels and keeps the moment under the pointer in place', () => {
    expect(zoomIn(1)).toBe(1.5);
    expect(zoomIn(32)).toBe(32);
    expect(zoomOut(1.5)).toBe(1);
    expect(zoomOut(1)).toBe(1);
    // 1000 px content, pointer 200 px into a 500 px view scrolled by 100: the moment at 300 px (30 %)
    // is at 600 px of the 2000 px content afterwards, still 200 px into the view.
    expect(scrollAfterZoom(100, 200, 1000, 2000, 500)).toBe(400);
    expect(scrollAfterZoom(0, 0, 1000, 500, 500)).toBe(0);
    expect(clampScroll(900, 1000, 500)).toBe(500);
  });

  it('scrolls only when the playhead leaves the view', () => {
    expect(followPlayhead(0, 300, 500, 2000)).toBe(0);
    expect(followPlayhead(0, 490, 500, 2000)).toBe(365);
    expect(followPlayhead(1000, 200, 500, 2000)).toBe(75);
    expect(followPlayhead(0, 1990, 500, 2000)).toBe(1500);
  });

  it('chooses a ruler step that leaves room between ticks', () => {
    expect(tickStepMs({ durationMs: 60_000, widthPx: 600 })).toBe(10_000);
    expect(tickStepMs({ durationMs: 60_000, widthPx: 600 * 32 })).toBe(500);
    expect(ticksBetween(900, 3100, 1000)).toEqual([1000, 2000, 3000]);
  });
});
