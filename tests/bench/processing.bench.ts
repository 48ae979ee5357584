/**
 * Processing benchmark (a script, not a test): `npm run bench:processing`.
 * Generates a 60 s 1080p phone-like file (HEVC 10 Mb/s, 30 fps, AAC, portrait rotation flag, index at
 * the end) and a 60 s 720p H.264/AAC file at 2 Mb/s, runs processMedia on each as the worker does
 * (niceness FFMPEG_NICE, default 10), and prints as its last line
 * `processing: transcode <x> of duration, remux <y> of duration` (wall time / media duration).
 * Generating the inputs is not timed. Other load on the machine slows the niced ffmpeg: run it idle.
 */
import { readFileSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { ffmpegVersion } from '../../api/src/processing/media-tools';
import { processMedia, type ProcessedMedia } from '../../api/src/processing/process-media';
import { makeMediaDir, makeVideo } from '../fixtures/media/generate';

const SECONDS = 60;
const nice = Number(process.env.FFMPEG_NICE ?? 10);

/** CPU seconds of this process's finished children (ffmpeg, ffprobe): /proc/self/stat cutime + cstime, proc(5). */
function childCpuSeconds(): number {
  const stat = readFileSync('/proc/self/stat', 'utf8');
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  return (Number(fields[13]) + Number(fields[14])) / 100; // clock ticks; USER_HZ is 100 on Linux
}

async function timed(label: string, inputPath: string, workDir: string): Promise<{ ratio: number; result: ProcessedMedia }> {
  const started = performance.now();
  const cpuBefore = childCpuSeconds();
  const result = await processMedia({ inputPath, workDir, nice });
  const seconds = (performance.now() - started) / 1000;
  const cpu = childCpuSeconds() - cpuBefore;
  const { rendition, probe, thumbnails } = result;
  console.log(
    `${label}: ${probe.videoCodec} ${probe.width}x${probe.height} rot ${probe.rotation} ${Math.round(probe.bitrate / 1000)} kb/s -> ` +
      `${rendition.mode} ${rendition.width}x${rendition.height} ${Math.round(rendition.bitrate / 1000)} kb/s, ` +
      `${thumbnails.sheets.length} sheet(s), ${seconds.toFixed(1)} s wall, ${cpu.toFixed(1)} s ffmpeg CPU`,
  );
  return { ratio: seconds / probe.durationSeconds, result };
}

const dir = await makeMediaDir('bench');
try {
  console.log(`ffmpeg ${await ffmpegVersion()}, nice ${nice}; generating inputs (not timed)...`);
  const phone = await makeVideo({
    dir,
    name: 'phone 1080p hevc.mov',
    seconds: SECONDS,
    width: 1920,
    height: 1080,
    fps: 30,
    codec: 'hevc',
    bitrateKbps: 10_000,
    audio: true,
    rotation: 90,
    container: 'mov',
  });
  const web = await makeVideo({
    dir,
    name: 'camera 720p h264.mp4',
    seconds: SECONDS,
    width: 1280,
    height: 720,
    fps: 30,
    codec: 'h264',
    bitrateKbps: 2_000,
    audio: true,
  });

  console.log(`load average before timing: ${loadavg()[0]!.toFixed(1)} (two cores; above about 1 the niced ffmpeg waits for other work)`);
  const transcode = await timed('transcode', phone, join(dir, 'phone out'));
  const remux = await timed('remux', web, join(dir, 'web out'));
  if (transcode.result.rendition.mode !== 'transcode' || remux.result.rendition.mode !== 'remux') {
    throw new Error('bench: the inputs did not take the expected paths (transcode, remux)');
  }
  console.log(`processing: transcode ${transcode.ratio.toFixed(2)} of duration, remux ${remux.ratio.toFixed(2)} of duration`);
} finally {
  await rm(dir, { recursive: true, force: true });
}
