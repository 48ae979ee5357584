import { readdirSync, readFileSync } from 'node:fs';
import { mkdir, readdir, rm, stat } from 'node:fs/promises';
import { basename, join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeAudioOnly, makeGarbage, makeJpeg, makeMediaDir, makePdf, makeVideo } from '../../../tests/fixtures/media/generate';
import { ffmpegVersion, mediaUrl, runTool, ToolError } from './media-tools';
import { processMedia } from './process-media';
import { probeMedia } from './probe';
import { sniffFile } from './sniff';

const SLOW = { timeout: 180_000 };
let dir: string;

beforeAll(async () => {
  dir = await makeMediaDir('controls');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** ffmpeg/ffprobe processes whose arguments mention `marker`, with their niceness (/proc/<pid>/stat field 19, proc(5)). */
function toolProcesses(marker: string): { pid: number; tool: string; nice: number }[] {
  const found: { pid: number; tool: string; nice: number }[] = [];
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const args = readFileSync(`/proc/${entry}/cmdline`, 'utf8').split('\0');
      const tool = basename(args[0] ?? '');
      if ((tool !== 'ffmpeg' && tool !== 'ffprobe') || !args.some((a) => a.includes(marker))) continue;
      const stat = readFileSync(`/proc/${entry}/stat`, 'utf8');
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' '); // fields from the 3rd on
      found.push({ pid: Number(entry), tool, nice: Number(fields[16]) });
    } catch {
      // the process ended while we looked
    }
  }
  return found;
}

describe('running ffmpeg', () => {
  it('reports the installed version and an H.264 encoder', async () => {
    expect(await ffmpegVersion()).toMatch(/^\d+\.\d+/);
  });

  it('passes paths as ffmpeg file URLs, escaping % only in image patterns', () => {
    expect(mediaUrl('/tmp/a b/clip:1.mp4')).toBe('file:/tmp/a b/clip:1.mp4');
    expect(mediaUrl('/tmp/100% real', 'sheet-%03d.jpg')).toBe('file:/tmp/100%% real/sheet-%03d.jpg');
  });

  it('runs ffmpeg under nice, and an abort kills it and rejects with the reason', SLOW, async () => {
    const input = await makeVideo({ dir, seconds: 10, width: 1280, height: 720, fps: 30, codec: 'mpeg4', audio: true });
    const workDir = join(dir, 'abort-run');
    const controller = new AbortController();
    const reason = new Error('stopped by the test');
    let seen: { tool: string; nice: number }[] = [];
    const run = processMedia({
      inputPath: input,
      workDir,
      nice: 13,
      signal: controller.signal,
      onProgress: (percent) => {
        // Called from ffmpeg's status lines, so the encoder is running now.
        if (percent >= 9 && !controller.signal.aborted) {
          seen = toolProcesses('abort-run');
          controller.abort(reason);
        }
      },
    });
    await expect(run).rejects.toBe(reason);
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.every((p) => p.tool === 'ffmpeg' && p.nice === 13)).toBe(true);
    expect(toolProcesses('abort-run')).toEqual([]);
    expect(await readdir(workDir)).not.toContain('sheet-002.jpg');
  });

  it('runs ffprobe under nice too, streaming its lines, and kills it on abort', SLOW, async () => {
    const marker = 'testsrc2=duration=120:size=32x18:rate=5';
    const controller = new AbortController();
    let seen: { tool: string; nice: number }[] = [];
    const run = runTool('ffprobe', ['-v', 'error', '-f', 'lavfi', '-i', marker, '-show_entries', 'frame=pts_time', '-of', 'compact'], {
      nice: 7,
      signal: controller.signal,
      onLine: () => {
        if (controller.signal.aborted) return;
        seen = toolProcesses(marker);
        controller.abort(new Error('enough lines'));
      },
    });
    await expect(run).rejects.toThrow('enough lines');
    expect(seen).toEqual([expect.objectContaining({ tool: 'ffprobe', nice: 7 })]);
    expect(toolProcesses(marker)).toEqual([]);
  });

  it('turns a failing tool into a ToolError carrying its message', async () => {
    const error: unknown = await runTool('ffprobe', ['-v', 'error', mediaUrl(join(dir, 'nothing here.mp4'))], { nice: 0 }).catch(
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(ToolError);
    expect((error as ToolError).stderr).toMatch(/No such file or directory/);
  });

  it('rejects at once when already aborted, starting nothing', async () => {
    const controller = new AbortController();
    controller.abort(new Error('never started'));
    await expect(
      processMedia({ inputPath: join(dir, 'missing.mp4'), workDir: join(dir, 'never'), nice: 10, signal: controller.signal }),
    ).rejects.toThrow('never started');
    await expect(readdir(join(dir, 'never'))).rejects.toThrow(/ENOENT/);
  });

  it('refuses a work folder where the input has an output name, keeping the input', SLOW, async () => {
    const workDir = join(dir, 'clash');
    await mkdir(workDir);
    const input = await makeVideo({
      dir: workDir,
      name: 'rendition.mp4',
      seconds: 1,
      width: 64,
      height: 36,
      fps: 10,
      codec: 'h264',
      audio: false,
    });
    await expect(processMedia({ inputPath: input, workDir, nice: 10 })).rejects.toMatchObject({ code: 'processing_error' });
    expect(await readdir(workDir)).toEqual(['rendition.mp4']);
    expect((await stat(input)).size).toBeGreaterThan(0);
  });

  it('calls a vanished input a retryable processing error', async () => {
    await expect(processMedia({ inputPath: join(dir, 'gone.mp4'), workDir: join(dir, 'gone'), nice: 10 })).rejects.toMatchObject({
      code: 'processing_error',
      retryable: true,
    });
  });
});

describe('sniffFile on real bytes', () => {
  it('names the file from its bytes, not its name', SLOW, async () => {
    expect(await sniffFile(await makePdf(dir, 'Film é.mov'))).toEqual({ mime: 'application/pdf', label: 'a PDF', isVideo: false });
    expect(await sniffFile(await makeJpeg(dir, 'Bild é.mp4'))).toEqual({ mime: 'image/jpeg', label: 'a picture (JPEG)', isVideo: false });
    expect(await sniffFile(await makeAudioOnly({ dir, seconds: 1, container: 'mp3', name: 'Ton é.mp4' }))).toEqual({
      mime: 'audio/mpeg',
      label: 'audio only',
      isVideo: false,
    });
    expect(await sniffFile(await makeGarbage(dir, { bytes: 5000 }))).toEqual({
      mime: 'application/octet-stream',
      label: 'not a file type Pinfield recognises',
      isVideo: false,
    });
    const mov = await makeVideo({
      dir,
      name: 'Film é.pdf',
      seconds: 1,
      width: 64,
      height: 36,
      fps: 10,
      codec: 'h264',
      audio: false,
      container: 'mov',
    });
    expect(await sniffFile(mov)).toEqual({ mime: 'video/quicktime', label: 'a QuickTime video (MOV)', isVideo: true });
  });
});

describe('probeMedia on real files', () => {
  it.each([90, 180, 270] as const)('reads a %s° rotation from the display matrix', SLOW, async (rotation) => {
    const path = await makeVideo({
      dir,
      name: `turned ${rotation}.mp4`,
      seconds: 1,
      width: 320,
      height: 180,
      fps: 10,
      codec: 'h264',
      audio: false,
      rotation,
    });
    const probe = await probeMedia(path);
    expect(probe.rotation).toBe(rotation);
    expect([probe.displayWidth, probe.displayHeight]).toEqual(rotation === 180 ? [320, 180] : [180, 320]);
  });

  it('reads duration, rate, codecs and bitrate', SLOW, async () => {
    const path = await makeVideo({ dir, seconds: 2, width: 640, height: 360, fps: 25, codec: 'h264', audio: true, container: 'mkv' });
    const probe = await probeMedia(path, { nice: 5 });
    expect(probe).toMatchObject({
      formatName: 'matroska,webm',
      width: 640,
      height: 360,
      frameRate: 25,
      videoCodec: 'h264',
      audioCodec: 'aac',
      hasAudio: true,
      audioChannels: 2,
      rotation: 0,
      pixelFormat: 'yuv420p',
    });
    expect(probe.durationSeconds).toBeCloseTo(2, 1);
    expect(probe.bitrate).toBeGreaterThan(0);
  });
});
