import { readdir, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ffprobe, videoOf } from '../../../tests/fixtures/media/inspect';
import { makeMediaDir, makeVideo } from '../../../tests/fixtures/media/generate';
import { processMedia } from './process-media';

const SLOW = { timeout: 180_000 };
let dir: string;

beforeAll(async () => {
  dir = await makeMediaDir('sheets');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('processMedia: thumbnail sheets', () => {
  it('splits a 4 min recording into a full 10x10 sheet and a second one, a tile every 2 s', SLOW, async () => {
    const input = await makeVideo({ dir, seconds: 240, width: 64, height: 36, fps: 5, codec: 'h264', audio: false });
    const workDir = join(dir, 'long out');
    const result = await processMedia({ inputPath: input, workDir, nice: 10 });

    expect(result.thumbnails).toMatchObject({ intervalSeconds: 2, columns: 10, rows: 10, tileWidth: 160, tileHeight: 90 });
    expect(result.thumbnails.sheets.map((s) => s.tiles)).toEqual([100, 20]);
    expect(result.thumbnails.sheets.map((s) => s.path)).toEqual([join(workDir, 'sheet-001.jpg'), join(workDir, 'sheet-002.jpg')]);
    for (const sheet of result.thumbnails.sheets) {
      expect(videoOf(await ffprobe(sheet.path))).toMatchObject({ codec_name: 'mjpeg', width: 1600, height: 900 });
    }
    expect(result.probe.durationSeconds).toBeCloseTo(240, 0);
    expect(Number((await ffprobe(result.rendition.path)).format.duration)).toBeCloseTo(240, 0);

    // A retry into the same folder leaves no sheet of the earlier, longer run behind.
    const short = await makeVideo({ dir, seconds: 3, width: 64, height: 36, fps: 5, codec: 'h264', audio: false });
    const again = await processMedia({ inputPath: short, workDir, nice: 10 });
    expect(again.thumbnails.sheets.map((s) => s.tiles)).toEqual([3]);
    expect((await readdir(workDir)).sort()).toEqual(['poster.jpg', 'rendition.mp4', 'sheet-001.jpg']);
    expect(videoOf(await ffprobe(again.thumbnails.sheets[0]!.path))).toMatchObject({ width: 480, height: 90 });
  });
});
