import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { countFrames, detectInterlacing, ffprobe, topAndBottomColour, topLevelBoxes, videoOf } from '../../../tests/fixtures/media/inspect';
import { makeMediaDir, makeVideo } from '../../../tests/fixtures/media/generate';
import { processMedia } from './process-media';

// ffmpeg work: generous limits, the machine has two cores shared with the running app.
const SLOW = { timeout: 180_000 };
let dir: string;

beforeAll(async () => {
  dir = await makeMediaDir('ready');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const rate = (fraction: string | undefined) => {
  const [a, b] = (fraction ?? '0/1').split('/').map(Number);
  return a! / b!;
};

describe('processMedia: files that end ready', () => {
  it('transcodes a high-bitrate 1080p phone file with a location tag to a 720p H.264/AAC fast-start MP4', SLOW, async () => {
    const input = await makeVideo({
      dir,
      seconds: 2,
      width: 1920,
      height: 1080,
      fps: 15,
      codec: 'h264',
      bitrateKbps: 12_000,
      audio: true,
      container: 'mov',
      metadata: { location: '+51.5000-000.1200/' },
    });
    const progress: number[] = [];
    const result = await processMedia({ inputPath: input, workDir: join(dir, 'big out'), nice: 10, onProgress: (p) => progress.push(p) });

    expect(result.contentType).toBe('video/quicktime');
    expect(result.probe).toMatchObject({ videoCodec: 'h264', width: 1920, height: 1080, frameRate: 15, hasAudio: true, rotation: 0 });
    expect(result.probe.bitrate).toBeGreaterThan(8_000_000);
    expect(result.rendition).toMatchObject({ mode: 'transcode', width: 1280, height: 720 });
    expect(result.rendition.transcodeReasons).toEqual(['size 1920x1080', expect.stringMatching(/^bitrate \d+ kb\/s$/)]);
    expect(result.rendition.bitrate).toBeLessThan(3_000_000);

    const out = await ffprobe(result.rendition.path);
    const video = videoOf(out);
    expect(video).toMatchObject({ codec_name: 'h264', profile: 'High', pix_fmt: 'yuv420p', width: 1280, height: 720 });
    expect(video.side_data_list ?? []).toEqual([]);
    expect(rate(video.r_frame_rate)).toBe(15);
    expect(rate(video.avg_frame_rate)).toBe(15);
    expect(out.streams.find((s) => s.codec_type === 'audio')).toMatchObject({ codec_name: 'aac', channels: 2 });
    expect(Number(out.format.duration)).toBeCloseTo(2, 0);
    expect(out.format.tags?.location).toBeUndefined();
    // Fast start: the index box (moov) comes before the media data (mdat), ISO/IEC 14496-12 boxes.
    const boxes = await topLevelBoxes(result.rendition.path);
    expect(boxes.indexOf('moov')).toBeGreaterThan(-1);
    expect(boxes.indexOf('moov')).toBeLessThan(boxes.indexOf('mdat'));

    const poster = videoOf(await ffprobe(result.poster.path));
    expect(poster).toMatchObject({ codec_name: 'mjpeg', width: 1280, height: 720 });
    expect(result.poster).toMatchObject({ width: 1280, height: 720 });
    expect(result.thumbnails).toMatchObject({ intervalSeconds: 1, columns: 2, rows: 1, tileWidth: 160, tileHeight: 90 });
    expect(result.thumbnails.sheets.map((s) => s.tiles)).toEqual([2]);
    expect(videoOf(await ffprobe(result.thumbnails.sheets[0]!.path))).toMatchObject({ width: 320, height: 90 });

    expect(progress[0]).toBe(0);
    expect(progress.at(-1)).toBe(100);
    expect(progress).toEqual([...progress].sort((a, b) => a - b));
    expect(new Set(progress).size).toBe(progress.length);
  });

  it('remuxes a 720p H.264/AAC file at a low bitrate, moving its index to the front', SLOW, async () => {
    const input = await makeVideo({ dir, seconds: 3, width: 1280, height: 720, fps: 30, codec: 'h264', audio: true, bitrateKbps: 800 });
    expect((await topLevelBoxes(input)).indexOf('moov')).toBeGreaterThan((await topLevelBoxes(input)).indexOf('mdat'));
    const result = await processMedia({ inputPath: input, workDir: join(dir, 'remux out'), nice: 10 });

    expect(result.rendition).toMatchObject({ mode: 'remux', width: 1280, height: 720, transcodeReasons: [] });
    const source = videoOf(await ffprobe(input));
    const out = await ffprobe(result.rendition.path);
    // A copy, not an encode: the same stream, frame for frame.
    expect(videoOf(out)).toMatchObject({ codec_name: 'h264', profile: source.profile, width: 1280, height: 720 });
    expect(await countFrames(result.rendition.path)).toBe(await countFrames(input));
    expect(out.streams.find((s) => s.codec_type === 'audio')?.codec_name).toBe('aac');
    const boxes = await topLevelBoxes(result.rendition.path);
    expect(boxes.indexOf('moov')).toBeLessThan(boxes.indexOf('mdat'));
    expect(result.thumbnails.sheets.map((s) => s.tiles)).toEqual([3]);
  });

  it('turns a portrait phone file with a rotation flag upright, with no flag left', SLOW, async () => {
    // Coded landscape, left half red; turned 90° clockwise the red half must be on top.
    const input = await makeVideo({
      dir,
      name: 'Hochformat é.mp4',
      seconds: 2,
      width: 1280,
      height: 720,
      fps: 30,
      codec: 'h264',
      audio: true,
      rotation: 90,
      pattern: 'halves',
    });
    const result = await processMedia({ inputPath: input, workDir: join(dir, 'portrait out'), nice: 10 });

    expect(result.probe).toMatchObject({ rotation: 90, width: 1280, height: 720, displayWidth: 720, displayHeight: 1280 });
    expect(result.rendition).toMatchObject({ mode: 'transcode', width: 720, height: 1280, transcodeReasons: ['rotation 90'] });
    const video = videoOf(await ffprobe(result.rendition.path));
    expect(video).toMatchObject({ width: 720, height: 1280 });
    expect(video.side_data_list ?? []).toEqual([]);
    expect(video.tags?.rotate).toBeUndefined();
    expect(await topAndBottomColour(result.rendition.path)).toEqual({ top: 'red', bottom: 'blue' });
    expect(await topAndBottomColour(result.poster.path)).toEqual({ top: 'red', bottom: 'blue' });
    expect(result.poster).toMatchObject({ width: 720, height: 1280 });
    expect(result.thumbnails).toMatchObject({ tileWidth: 160, tileHeight: 284 });
  });

  // Common practice: not every browser decodes HEVC (it depends on the system's decoders), all decode H.264.
  it('re-encodes HEVC, which many browsers cannot play, even when small', SLOW, async () => {
    const input = await makeVideo({ dir, seconds: 2, width: 320, height: 180, fps: 30, codec: 'hevc', audio: true });
    const result = await processMedia({ inputPath: input, workDir: join(dir, 'hevc out'), nice: 10 });
    expect(result.probe.videoCodec).toBe('hevc');
    expect(result.rendition).toMatchObject({ mode: 'transcode', width: 320, height: 180, transcodeReasons: ['video codec hevc'] });
    expect(videoOf(await ffprobe(result.rendition.path))).toMatchObject({ codec_name: 'h264', profile: 'High', width: 320, height: 180 });
  });

  it("turns a camcorder's interlaced fields into whole frames, one per field", SLOW, async () => {
    const input = await makeVideo({ dir, seconds: 2, width: 320, height: 180, fps: 25, codec: 'h264', audio: true, interlaced: true });
    // ffmpeg's idet filter sees the combing in the source, so the check below can fail.
    expect((await detectInterlacing(input)).interlaced).toBeGreaterThan(40);
    const result = await processMedia({ inputPath: input, workDir: join(dir, 'fields out'), nice: 10 });
    expect(result.probe).toMatchObject({ interlaced: true, frameRate: 25 });
    expect(result.rendition).toMatchObject({ mode: 'transcode', transcodeReasons: ['interlaced'] });
    const video = videoOf(await ffprobe(result.rendition.path));
    expect(rate(video.avg_frame_rate)).toBe(50);
    const seen = await detectInterlacing(result.rendition.path);
    expect(seen.progressive).toBeGreaterThan(9 * seen.interlaced);
  });

  it('keeps a video without sound silent, copied (H.264) or encoded (MPEG-4 Part 2)', SLOW, async () => {
    const h264 = await makeVideo({ dir, seconds: 2, width: 320, height: 180, fps: 30, codec: 'h264', audio: false });
    const mpeg4 = await makeVideo({ dir, seconds: 2, width: 320, height: 180, fps: 30, codec: 'mpeg4', audio: false });
    const copied = await processMedia({ inputPath: h264, workDir: join(dir, 'silent copy'), nice: 10 });
    const encoded = await processMedia({ inputPath: mpeg4, workDir: join(dir, 'silent encode'), nice: 10 });

    expect(copied.rendition.mode).toBe('remux');
    expect(encoded.rendition).toMatchObject({ mode: 'transcode', transcodeReasons: ['video codec mpeg4'] });
    for (const result of [copied, encoded]) {
      expect(result.probe).toMatchObject({ hasAudio: false, audioCodec: null });
      const out = await ffprobe(result.rendition.path);
      expect(out.streams.map((s) => s.codec_type)).toEqual(['video']);
      expect(videoOf(out).codec_name).toBe('h264');
    }
  });

  it('makes a clip under a second ready, with its poster half-way and one tile', SLOW, async () => {
    // A colon in the name must not be read as an ffmpeg protocol ("Kurz:" is not one).
    const input = await makeVideo({
      dir,
      name: 'Kurz: 0,4 s é.mp4',
      seconds: 0.4,
      width: 320,
      height: 180,
      fps: 30,
      codec: 'mpeg4',
      audio: true,
    });
    const result = await processMedia({ inputPath: input, workDir: join(dir, 'short out'), nice: 10 });

    expect(result.probe.durationSeconds).toBeLessThan(1);
    expect(result.thumbnails).toMatchObject({ columns: 1, rows: 1 });
    expect(result.thumbnails.sheets.map((s) => s.tiles)).toEqual([1]);
    expect(videoOf(await ffprobe(result.poster.path))).toMatchObject({ width: 320, height: 180 });
    const out = await ffprobe(result.rendition.path);
    expect(Number(out.format.duration)).toBeLessThan(1);
    expect(out.streams.map((s) => s.codec_type).sort()).toEqual(['audio', 'video']);
  });
});
