import { readdir, rm, stat } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import type { ProbeDetails } from './probe';
import { FFMPEG_THREADS, flags, mediaUrl, runFfmpeg, type FfmpegRunOptions } from './media-tools';
import { RENDITION, shownFrameRate, targetFrameRate, type ThumbnailPlan } from './rendition-plan';

/** Fixed names in the work folder, so a retried job overwrites instead of piling up files. */
export const OUTPUT_NAMES = { poster: 'poster.jpg', rendition: 'rendition.mp4', sheetPattern: 'sheet-%03d.jpg' } as const;
const SHEET_FILE = /^sheet-(\d{3,})\.jpg$/;

type StepOptions = Pick<FfmpegRunOptions, 'nice' | 'signal' | 'onProgress'>;
interface Size {
  width: number;
  height: number;
}

const threads = { '-threads': FFMPEG_THREADS };
// Phones store the place of filming in the file's metadata: none of it is copied to what students get.
const noMetadata = { '-map_metadata': -1, '-map_chapters': -1 };

/** Removes what an earlier attempt may have left, so stale sheets are never counted. */
export async function clearOutputs(workDir: string): Promise<void> {
  const names = await readdir(workDir);
  const ours = names.filter((n) => n === OUTPUT_NAMES.poster || n === OUTPUT_NAMES.rendition || SHEET_FILE.test(n));
  await Promise.all(ours.map((n) => rm(join(workDir, n), { force: true })));
}

/** true when the input sits in the work folder under one of the output names (it would be deleted). */
export function outputNameClash(inputPath: string, workDir: string): boolean {
  if (resolve(dirname(inputPath)) !== resolve(workDir)) return false;
  const name = basename(inputPath);
  return name === OUTPUT_NAMES.poster || name === OUTPUT_NAMES.rendition || SHEET_FILE.test(name);
}

/** The sheet files written, in order. */
export async function listSheets(workDir: string): Promise<string[]> {
  const names = (await readdir(workDir)).filter((n) => SHEET_FILE.test(n)).sort();
  return names.map((n) => join(workDir, n));
}

/** true when the file exists and has bytes: ffmpeg exits 0 even when it wrote nothing. */
export async function hasBytes(path: string): Promise<boolean> {
  try {
    return (await stat(path)).size > 0;
  } catch {
    return false;
  }
}

/** Interlaced (camcorder) fields become whole frames, one per field, before anything else sees them. */
function deinterlacer(details: ProbeDetails): string {
  return details.probe.interlaced ? 'bwdif=mode=send_field:deint=all,' : '';
}

/** One JPEG frame at `seconds`, upright (ffmpeg applies the rotation), at the rendition's size. */
export async function writePoster(input: string, output: string, details: ProbeDetails, seconds: number, size: Size, step: StepOptions) {
  const picture = `${deinterlacer(details)}scale=${size.width}:${size.height},setsar=1`;
  await runFfmpeg(
    (c) =>
      c
        .input(mediaUrl(input))
        .inputOptions(flags({ ...threads, '-ss': seconds.toFixed(3) }))
        .output(mediaUrl(output))
        .outputOptions(flags({ '-map': `0:${details.videoStreamIndex}`, '-frames:v': 1, '-vf': picture, '-q:v': 3, '-update': 1 }))
        .outputOptions(flags({ ...noMetadata, ...threads })),
    step,
  );
}

/** fps -> scale -> tile: one tile every interval; showinfo logs each tile so they can be counted exactly. */
function thumbnailChain(plan: ThumbnailPlan): string {
  const { intervalSeconds, tileWidth, tileHeight, columns, rows } = plan;
  return `fps=1/${intervalSeconds}:round=up,scale=${tileWidth}:${tileHeight},setsar=1,showinfo,tile=${columns}x${rows}`;
}

/** showinfo's line for each frame through it: "[Parsed_showinfo_3 @ 0x..] n:  12 pts: ...". */
function tileCounter(): { onStderrLine: (line: string) => void; count: () => number } {
  let tiles = 0;
  return {
    onStderrLine: (line) => {
      if (/showinfo.*\bn:\s*\d+\s+pts:/.test(line)) tiles++;
    },
    count: () => tiles,
  };
}

// Each tiled sheet is one image: no frame-rate games (image2 would otherwise be treated as constant rate).
const sheetOutput = flags({ '-fps_mode': 'passthrough', '-q:v': 5, ...noMetadata });

/** Thumbnail sheets alone (the remux path, where nothing else decodes the video). Returns the tile count. */
export async function writeSheets(input: string, workDir: string, details: ProbeDetails, plan: ThumbnailPlan, step: StepOptions) {
  const counter = tileCounter();
  await runFfmpeg(
    (c) =>
      c
        .input(mediaUrl(input))
        .inputOptions(flags(threads))
        .output(mediaUrl(workDir, OUTPUT_NAMES.sheetPattern))
        .outputOptions([...flags({ '-map': `0:${details.videoStreamIndex}`, '-vf': thumbnailChain(plan) }), ...sheetOutput]),
    { ...step, durationSeconds: details.probe.durationSeconds, onStderrLine: counter.onStderrLine },
  );
  return counter.count();
}

/**
 * The H.264/AAC rendition and the thumbnail sheets in one decoding pass (split filter), since
 * decoding a 4K HEVC phone file is the expensive part. Returns the tile count.
 */
export async function writeTranscodeAndSheets(
  input: string,
  workDir: string,
  details: ProbeDetails,
  size: Size,
  plan: ThumbnailPlan,
  step: StepOptions,
): Promise<number> {
  const { probe } = details;
  const rate = targetFrameRate(shownFrameRate(probe));
  const graph = [
    `[0:${details.videoStreamIndex}]${deinterlacer(details)}split=2[main][thumbs]`,
    `[main]scale=${size.width}:${size.height},setsar=1[video]`,
    `[thumbs]${thumbnailChain(plan)}[sheets]`,
  ].join(';');
  const video = flags({
    '-map': '[video]',
    '-c:v': 'libx264',
    '-preset': 'veryfast',
    '-profile:v': 'high',
    '-pix_fmt': 'yuv420p',
    '-crf': RENDITION.crf,
    '-maxrate': `${RENDITION.maxrateKbps}k`,
    '-bufsize': `${RENDITION.bufsizeKbps}k`,
    '-r': rate.expression,
    '-fps_mode': 'cfr',
    '-g': Math.max(1, Math.round(rate.value * RENDITION.keyframeSeconds)),
  });
  // No audio stays no audio: browsers play a video-only MP4, and a silent track would claim sound that was never recorded.
  const audio = flags(
    details.audioStreamIndex === null
      ? { '-an': true }
      : {
          '-map': `0:${details.audioStreamIndex}`,
          '-c:a': 'aac',
          '-b:a': `${RENDITION.audioKbps}k`,
          '-ac': Math.min(2, Math.max(1, probe.audioChannels)),
          '-ar': 48000,
        },
  );
  const container = flags({ '-movflags': '+faststart', ...noMetadata, '-sn': true, '-dn': true, ...threads });
  const counter = tileCounter();
  await runFfmpeg(
    (c) =>
      c
        .input(mediaUrl(input))
        .inputOptions(flags(threads))
        .complexFilter(graph)
        .output(mediaUrl(join(workDir, OUTPUT_NAMES.rendition)))
        .outputOptions([...video, ...audio, ...container])
        .output(mediaUrl(workDir, OUTPUT_NAMES.sheetPattern))
        .outputOptions([...flags({ '-map': '[sheets]' }), ...sheetOutput]),
    { ...step, durationSeconds: probe.durationSeconds, onStderrLine: counter.onStderrLine },
  );
  return counter.count();
}

/** Copies H.264/AAC as they are into an MP4 with the index first (fast start). */
export async function writeRemux(input: string, workDir: string, details: ProbeDetails, step: StepOptions): Promise<void> {
  const audio: Record<string, string | true> =
    details.audioStreamIndex === null ? { '-an': true } : { '-map': `0:${details.audioStreamIndex}` };
  await runFfmpeg(
    (c) =>
      c
        .input(mediaUrl(input))
        .output(mediaUrl(join(workDir, OUTPUT_NAMES.rendition)))
        // Two -map options: one list each, since an object holds a key once.
        .outputOptions(flags({ '-map': `0:${details.videoStreamIndex}` }))
        .outputOptions(flags({ ...audio, '-c': 'copy', '-movflags': '+faststart', ...noMetadata, '-sn': true, '-dn': true })),
    { ...step, durationSeconds: details.probe.durationSeconds },
  );
}
