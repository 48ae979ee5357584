import { describe, expect, it } from 'vitest';
import { parseThumbnails, tileAt } from '../timeline/thumbnails';
import { activeCueIndex, parseVtt } from './parse-vtt';

describe('captions', () => {
  it('reads cues with plain text', () => {
    const { cues, errors } = parseVtt(
      'WEBVTT\n\n00:00.000 --> 00:02.000\n<v Narrator>The magnet &amp; the coil</v>\nmeet.\n\nintro\n00:02.500 --> 00:04.000\nCurrent flows.\n',
    );
    expect(errors).toBe(0);
    expect(cues).toEqual([
      { id: 'cue-0', startMs: 0, endMs: 2000, text: 'The magnet & the coil meet.' },
      { id: 'intro', startMs: 2500, endMs: 4000, text: 'Current flows.' },
    ]);
  });

  it('keeps readable cues when others are broken, and counts the problems', () => {
    const { cues, errors } = parseVtt('WEBVTT\n\n00:00.000 --> 00:01.000\nGood.\n\n00:0x --> nope\nBad.\n');
    expect(cues.map((c) => c.text)).toEqual(['Good.']);
    expect(errors).toBeGreaterThan(0);
  });

  it('finds the cue showing at a moment', () => {
    const cues = [
      { id: 'a', startMs: 0, endMs: 2000, text: 'a' },
      { id: 'b', startMs: 2500, endMs: 4000, text: 'b' },
      { id: 'c', startMs: 4000, endMs: 6000, text: 'c' },
    ];
    expect(activeCueIndex(cues, 1999)).toBe(0);
    expect(activeCueIndex(cues, 2200)).toBe(-1);
    expect(activeCueIndex(cues, 4000)).toBe(2);
    expect(activeCueIndex(cues, 7000)).toBe(-1);
    expect(activeCueIndex([], 0)).toBe(-1);
  });
});

describe('thumbnails track', () => {
  // The format api/src/features/recordings/thumbnails-vtt.ts writes.
  const vtt = [
    'WEBVTT',
    '',
    '00:00:00.000 --> 00:00:05.000',
    'http://127.0.0.1:4312/pinfield-media/sheet-0.jpg?X-Amz-Signature=a#xywh=0,0,160,90',
    '',
    '00:00:05.000 --> 00:00:10.000',
    'http://127.0.0.1:4312/pinfield-media/sheet-0.jpg?X-Amz-Signature=a#xywh=160,0,160,90',
    '',
    '00:00:10.000 --> 00:00:12.300',
    'http://127.0.0.1:4312/pinfield-media/sheet-1.jpg?X-Amz-Signature=b#xywh=0,90,160,90',
    '',
    '00:00:12.300 --> 00:00:13.000',
    'not a tile',
    '',
  ].join('\n');

  it('reads each tile with its sheet and rectangle', () => {
    const tiles = parseThumbnails(vtt);
    expect(tiles).toHaveLength(3);
    expect(tiles[1]).toEqual({
      startMs: 5000,
      endMs: 10_000,
      url: 'http://127.0.0.1:4312/pinfield-media/sheet-0.jpg?X-Amz-Signature=a',
      x: 160,
      y: 0,
      width: 160,
      height: 90,
    });
    expect(tiles[2]).toMatchObject({ startMs: 10_000, endMs: 12_300, x: 0, y: 90 });
  });

  it('picks the tile for a moment', () => {
    const tiles = parseThumbnails(vtt);
    expect(tileAt(tiles, 7000)?.x).toBe(160);
    expect(tileAt(tiles, 99_000)?.y).toBe(90);
    expect(tileAt([], 0)).toBeNull();
  });
});
