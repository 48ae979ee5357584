import { describe, expect, it } from 'vitest';
import type { MediaProbe } from './probe';
import {
  fitRendition,
  planThumbnails,
  posterTime,
  remuxBlockers,
  shownFrameRate,
  targetFrameRate,
  thumbnailInterval,
} from './rendition-plan';

describe('posterTime', () => {
  it('is 3 s, or half of a shorter clip', () => {
    expect(posterTime(60)).toBe(3);
    expect(posterTime(6)).toBe(3);
    expect(posterTime(4)).toBe(2);
    expect(posterTime(0.4)).toBeCloseTo(0.2);
  });
});

describe('thumbnailInterval', () => {
  it.each([
    [0.4, 1],
    [60, 1],
    [61, 2],
    [300, 2],
    [301, 5],
    [1200, 5],
    [1201, 10],
    [3600, 10],
    [3601, 20],
    [7200, 20],
    [7201, 30],
    [6 * 3600, 30],
  ])('%s s -> every %s s', (duration, interval) => {
    expect(thumbnailInterval(duration)).toBe(interval);
  });
});

describe('planThumbnails', () => {
  it('makes one row for a few seconds', () => {
    expect(planThumbnails(4, 1920, 1080)).toEqual({
      intervalSeconds: 1,
      columns: 4,
      rows: 1,
      tileWidth: 160,
      tileHeight: 90,
      expectedTiles: 4,
    });
  });
  it('gives a clip under a second one tile', () => {
    expect(planThumbnails(0.4, 320, 180)).toMatchObject({ columns: 1, rows: 1, expectedTiles: 1 });
  });
  it('caps a sheet at 10x10 and counts the tiles of a 4 min recording', () => {
    expect(planThumbnails(240, 64, 36)).toMatchObject({ intervalSeconds: 2, columns: 10, rows: 10, expectedTiles: 120 });
  });
  it('keeps portrait tiles 160 wide with an even height', () => {
    expect(planThumbnails(10, 720, 1280)).toMatchObject({ tileWidth: 160, tileHeight: 284 });
  });
});

describe('fitRendition', () => {
  it.each([
    [1920, 1080, 1280, 720],
    [3840, 2160, 1280, 720],
    [1080, 1920, 720, 1280],
    [4000, 3000, 960, 720],
    [3840, 1644, 1280, 548],
    [640, 360, 640, 360],
    [1279, 719, 1280, 720],
    [64, 36, 64, 36],
  ])('%sx%s -> %sx%s', (w, h, width, height) => {
    expect(fitRendition(w, h)).toEqual({ width, height });
  });
});

describe('targetFrameRate', () => {
  it.each([
    [30, '30'],
    [30000 / 1001, '30000/1001'],
    [29.7, '30000/1001'],
    [25, '25'],
    [60, '60'],
    [59.94, '60000/1001'],
    [120, '60'],
    [240, '60'],
    [100, '50'],
    [90, '45'],
    [15, '15'],
    [0, '30'],
    [Number.NaN, '30'],
  ])('%s fps -> %s', (rate, expression) => {
    expect(targetFrameRate(rate).expression).toBe(expression);
  });
});

describe('shownFrameRate', () => {
  it('shows each field of an interlaced source as a frame', () => {
    expect(shownFrameRate({ frameRate: 25, interlaced: true })).toBe(50);
    expect(targetFrameRate(shownFrameRate({ frameRate: 30000 / 1001, interlaced: true })).expression).toBe('60000/1001');
    expect(shownFrameRate({ frameRate: 25, interlaced: false })).toBe(25);
  });
});

describe('remuxBlockers', () => {
  const fits: MediaProbe = {
    formatName: 'mov,mp4,m4a,3gp,3g2,mj2',
    durationSeconds: 60,
    width: 1280,
    height: 720,
    displayWidth: 1280,
    displayHeight: 720,
    frameRate: 30,
    videoCodec: 'h264',
    audioCodec: 'aac',
    bitrate: 2_000_000,
    rotation: 0,
    pixelFormat: 'yuv420p',
    hasAudio: true,
    audioChannels: 2,
    interlaced: false,
  };

  it('lets an H.264/AAC 720p file at constant rate and modest bitrate be copied', () => {
    expect(remuxBlockers(fits, true)).toEqual([]);
    expect(remuxBlockers({ ...fits, audioCodec: null, hasAudio: false, audioChannels: 0 }, true)).toEqual([]);
    expect(remuxBlockers({ ...fits, width: 720, height: 1280, displayWidth: 720, displayHeight: 1280 }, true)).toEqual([]);
  });

  it.each([
    [{ videoCodec: 'hevc' }, 'video codec hevc'],
    [{ pixelFormat: 'yuv420p10le' }, 'pixel format yuv420p10le'],
    [{ audioCodec: 'mp3' }, 'audio codec mp3'],
    [{ rotation: 90 as const, displayWidth: 720, displayHeight: 1280 }, 'rotation 90'],
    [{ width: 1920, height: 1080, displayWidth: 1920, displayHeight: 1080 }, 'size 1920x1080'],
    [{ width: 1278, height: 719, displayWidth: 1278, displayHeight: 719 }, 'size 1278x719'],
    [{ displayWidth: 1706 }, 'non-square pixels'],
    [{ frameRate: 120 }, 'frame rate 120.00'],
    [{ interlaced: true }, 'interlaced'],
    [{ bitrate: 8_000_000 }, 'bitrate 8000 kb/s'],
  ])('transcodes for %o', (change, reason) => {
    expect(remuxBlockers({ ...fits, ...change }, true)).toEqual([reason]);
  });

  it('transcodes a variable frame rate', () => {
    expect(remuxBlockers(fits, false)).toEqual(['variable frame rate']);
  });

  it('does not call a rotated file non-square', () => {
    expect(remuxBlockers({ ...fits, rotation: 90, displayWidth: 720, displayHeight: 1280 }, true)).not.toContain('non-square pixels');
  });
});
