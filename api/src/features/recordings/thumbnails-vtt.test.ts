import { describe, expect, it } from 'vitest';
import { buildThumbnailsVtt, parseThumbnailGrid, vttTimestamp, type ThumbnailGrid } from './thumbnails-vtt';
import { playbackLifetimeSeconds, SIGV4_MAX_SECONDS } from './media-urls';

const grid: ThumbnailGrid = {
  intervalSeconds: 5,
  columns: 3,
  rows: 1,
  tileWidth: 100,
  tileHeight: 60,
  sheets: [
    { key: 'a', tiles: 3 },
    { key: 'b', tiles: 1 },
  ],
};

describe('vttTimestamp', () => {
  // WebVTT timestamps: hh:mm:ss.ttt, milliseconds in three digits (W3C WebVTT, "WebVTT timestamp").
  it('writes hours, minutes, seconds and milliseconds', () => {
    expect(vttTimestamp(0)).toBe('00:00:00.000');
    expect(vttTimestamp(75.5)).toBe('00:01:15.500');
    expect(vttTimestamp(3725.0004)).toBe('01:02:05.000');
  });
});

describe('buildThumbnailsVtt', () => {
  it('stretches the last tile to the duration when the tiles stop short of it', () => {
    const vtt = buildThumbnailsVtt(grid, 23, ['https://s/a?x=1&y=2', 'https://s/b']);
    expect(vtt).toBe(
      [
        'WEBVTT',
        '',
        '00:00:00.000 --> 00:00:05.000\nhttps://s/a?x=1&y=2#xywh=0,0,100,60',
        '',
        '00:00:05.000 --> 00:00:10.000\nhttps://s/a?x=1&y=2#xywh=100,0,100,60',
        '',
        '00:00:10.000 --> 00:00:15.000\nhttps://s/a?x=1&y=2#xywh=200,0,100,60',
        '',
        '00:00:15.000 --> 00:00:23.000\nhttps://s/b#xywh=0,0,100,60',
        '',
      ].join('\n'),
    );
  });

  it('leaves out tiles that start after the end', () => {
    const vtt = buildThumbnailsVtt(grid, 7, ['https://s/a', 'https://s/b']);
    expect(vtt.match(/-->/g)).toHaveLength(2);
    expect(vtt).toContain('00:00:05.000 --> 00:00:07.000\nhttps://s/a#xywh=100,0,100,60');
    expect(vtt).not.toContain('https://s/b');
  });
});

describe('parseThumbnailGrid', () => {
  it('accepts the stored shape and refuses anything else', () => {
    expect(parseThumbnailGrid(grid)).toEqual(grid);
    expect(parseThumbnailGrid(null)).toBeNull();
    expect(parseThumbnailGrid({ ...grid, sheets: [] })).toBeNull();
  });
});

describe('playbackLifetimeSeconds', () => {
  it('is the setting, or the duration plus 30 minutes, capped at the seven days SigV4 allows', () => {
    expect(playbackLifetimeSeconds(120, 600)).toBe(7200);
    expect(playbackLifetimeSeconds(120, null)).toBe(7200);
    expect(playbackLifetimeSeconds(120, 7000.2)).toBe(8801);
    expect(playbackLifetimeSeconds(60 * 24 * 8, 10)).toBe(SIGV4_MAX_SECONDS);
  });
});
