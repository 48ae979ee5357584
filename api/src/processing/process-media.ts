import { mkdir, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { formatDuration } from '@core/recordings';
import { findEarlyEnd } from './completeness';
import { FAILURE_MESSAGES, MediaFailure, notVideoMessage, stopsEarlyMessage } from './media-failure';
import {
  clearOutputs,
  hasBytes,
  listSheets,
  OUTPUT_NAMES,
  outputNameClash,
  writePoster,
  writeRemux,
  writeSheets,
  writeTranscodeAndSheets,
} from './media-outputs';
import type { ToolRunOptions } from './media-tools';
import { measureConstantFrameRate, probeDetails, type MediaProbe, type ProbeDetails } from './probe';
import { fitRendition, planThumbnails, posterTime, remuxBlockers } from './rendition-plan';
import { sniffKind } from './sniff';

export interface ProcessedMedia {
  /** Sniffed MIME of the original. */
  contentType: string;
  /** Of the original. */
  probe: MediaProbe;
  poster: { path: string; width: number; height: number };
  thumbnails: {
    intervalSeconds: number;
    columns: number;
    rows: number;
    tileWidth: number;
    tileHeight: number;
    /** Tile k overall (0-based) shows time k x intervalSeconds; sheets fill row by row. */
    sheets: { path: string; tiles: number }[];
  };
  rendition: {
    path: string;
    mode: 'transcode' | 'remux';
    width: number;
    height: number;
    durationSeconds: number;
    bitrate: number;
    /** Why the source was not copied as it is (empty for a remux). */
    transcodeReasons: string[];
  };
}

export interface ProcessMediaOptions {
  inputPath: string;
  /** Created if missing; poster.jpg, sheet-NNN.jpg and rendition.mp4 are written here. */
  workDir: string;
  /** Niceness for ffmpeg/ffprobe (FFMPEG_NICE). */
  nice: number;
  /** Aborting kills the running ffmpeg; the promise then rejects with the signal's reason. */
  signal?: AbortSignal;
  /** Whole percentages 0-100, rising, across all steps. */
  onProgress?: (percent: number) => void;
}

/**
 * Checks a local video file and makes what the web needs from it: poster, thumbnail sheets and an
 * H.264/AAC MP4 rendition (remuxed when the source already fits). Pure of database and storage.
 * Throws MediaFailure with a sentence for the teacher; unexpected faults are `processing_error`, retryable.
 */
export async function processMedia(options: ProcessMediaOptions): Promise<ProcessedMedia> {
  const { inputPath, workDir, signal } = options;
  signal?.throwIfAborted();
  const run: ToolRunOptions = { nice: options.nice, signal };
  const report = progressReporter(options.onProgress);
  try {
    report(0);
    const { contentType, details } = await checkSource(inputPath, run);
    report(3);
    const { probe } = details;
    const size = fitRendition(probe.displayWidth, probe.displayHeight);
    const plan = planThumbnails(probe.durationSeconds, probe.displayWidth, probe.displayHeight);
    let reasons = remuxBlockers(probe, true);
    if (reasons.length === 0) reasons = remuxBlockers(probe, await measureConstantFrameRate(inputPath, details, run));
    const mode = reasons.length === 0 ? 'remux' : 'transcode';
    report(5);

    await mkdir(workDir, { recursive: true });
    if (outputNameClash(inputPath, workDir)) throw new Error(`the input ${inputPath} has the name of an output in ${workDir}`);
    await clearOutputs(workDir);
    const posterPath = join(workDir, OUTPUT_NAMES.poster);
    await writePoster(inputPath, posterPath, details, posterTime(probe.durationSeconds), size, run);
    // A video stream that ends before the container (audio runs on) can leave the poster's time empty.
    if (!(await hasBytes(posterPath))) await writePoster(inputPath, posterPath, details, 0, size, run);
    if (!(await hasBytes(posterPath))) throw new Error('ffmpeg wrote no poster frame');
    report(mode === 'remux' ? 10 : 8);

    let tiles: number;
    if (mode === 'transcode') {
      tiles = await writeTranscodeAndSheets(inputPath, workDir, details, size, plan, { ...run, onProgress: (f) => report(8 + 90 * f) });
    } else {
      tiles = await writeSheets(inputPath, workDir, details, plan, { ...run, onProgress: (f) => report(10 + 70 * f) });
      await writeRemux(inputPath, workDir, details, { ...run, onProgress: (f) => report(80 + 18 * f) });
    }
    const sheets = await checkSheets(workDir, tiles, plan.columns * plan.rows);
    const rendition = await checkRendition(join(workDir, OUTPUT_NAMES.rendition), details, run);
    report(100);
    return {
      contentType,
      probe,
      poster: { path: posterPath, ...size },
      thumbnails: {
        intervalSeconds: plan.intervalSeconds,
        columns: plan.columns,
        rows: plan.rows,
        tileWidth: plan.tileWidth,
        tileHeight: plan.tileHeight,
        sheets,
      },
      rendition: {
        path: rendition.path,
        mode,
        width: rendition.width,
        height: rendition.height,
        durationSeconds: rendition.durationSeconds,
        bitrate: rendition.bitrate,
        transcodeReasons: reasons,
      },
    };
  } catch (error) {
    if (signal?.aborted) throw signal.reason;
    if (error instanceof MediaFailure) throw error;
    throw new MediaFailure('processing_error', FAILURE_MESSAGES.processing, true, { cause: error });
  }
}

/** Sniff, probe and completeness: every reason a file can never become a recording, before any encoding. */
async function checkSource(inputPath: string, run: ToolRunOptions): Promise<{ contentType: string; details: ProbeDetails }> {
  const { size } = await stat(inputPath);
  if (size === 0) throw new MediaFailure('empty', FAILURE_MESSAGES.empty, false);
  const kind = await sniffKind(inputPath);
  // Audio goes on to the probe, which names it precisely: "no video track".
  if (!kind.isVideo && !kind.mime.startsWith('audio/')) throw new MediaFailure('not_video', notVideoMessage(kind), false);
  const details = await probeDetails(inputPath, run);
  const stop = await findEarlyEnd(inputPath, details, run);
  if (stop !== null) throw truncatedAt(stop);
  return { contentType: kind.mime, details };
}

function truncatedAt(seconds: number): MediaFailure {
  return new MediaFailure('truncated', seconds < 1 ? FAILURE_MESSAGES.incomplete : stopsEarlyMessage(formatDuration(seconds)), false);
}

async function checkSheets(workDir: string, tiles: number, perSheet: number): Promise<{ path: string; tiles: number }[]> {
  const paths = await listSheets(workDir);
  const expected = Math.ceil(tiles / perSheet);
  if (tiles < 1 || paths.length !== expected)
    throw new Error(`expected ${expected} thumbnail sheets for ${tiles} tiles, found ${paths.length}`);
  for (const path of paths) if (!(await hasBytes(path))) throw new Error(`thumbnail sheet ${path} is empty`);
  return paths.map((path, i) => ({ path, tiles: Math.min(perSheet, tiles - i * perSheet) }));
}

/** Reads the rendition back with ffprobe; a decode that ended early means the source did too. */
async function checkRendition(path: string, source: ProbeDetails, run: ToolRunOptions) {
  if (!(await hasBytes(path))) throw new Error('ffmpeg wrote no rendition');
  const out = await probeDetails(path, run);
  const sourceVideo = source.videoEndSeconds - source.videoStartSeconds;
  const outVideo = out.videoEndSeconds - out.videoStartSeconds;
  if (outVideo < sourceVideo - Math.max(1, Math.min(5, 0.02 * sourceVideo))) throw truncatedAt(outVideo);
  return { path, width: out.probe.width, height: out.probe.height, durationSeconds: out.probe.durationSeconds, bitrate: out.probe.bitrate };
}

function progressReporter(onProgress: ((percent: number) => void) | undefined): (percent: number) => void {
  let last = -1;
  return (percent) => {
    const whole = Math.min(100, Math.max(0, Math.floor(percent)));
    if (whole > last) {
      last = whole;
      onProgress?.(whole);
    }
  };
}
