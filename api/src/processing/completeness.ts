import type { ProbeDetails } from './probe';
import { flags, mediaUrl, runTool, ToolError, type ToolRunOptions } from './media-tools';

/** The last seconds decoded to confirm a file plays to its end. */
const TAIL_SECONDS = 3;

/**
 * Where the playable video really ends, in seconds from its start, when that is well before the
 * duration the container declares (a phone file copied only in part); null when it plays to the end.
 *
 * Cheap first: decode only the last few seconds (ffprobe seeks there through the index). Only if
 * those do not reach the end does it scan the whole file, reading packets and decoding key frames
 * only, then decode from the last good key frame to find the exact stop.
 */
export async function findEarlyEnd(filePath: string, details: ProbeDetails, run: ToolRunOptions): Promise<number | null> {
  const { videoStartSeconds: start, videoEndSeconds: end, videoStreamIndex: stream } = details;
  const frameSeconds = details.probe.frameRate > 0 ? 1 / details.probe.frameRate : 0.04;
  // "Well before": a second, or 2 % of long recordings (up to 5 s), absorbs muxers' rounding.
  const tolerance = Math.max(1, Math.min(5, 0.02 * (end - start)));
  const reachesEnd = (lastFrame: number) => lastFrame + frameSeconds >= end - tolerance;

  const tail = await lastDecodedFrame(filePath, stream, Math.max(start, end - TAIL_SECONDS), run);
  if (reachesEnd(tail)) return null;

  const scan = await scanPackets(filePath, stream, run);
  if (scan.lastPacketEnd === -Infinity) return 0;
  // The bytes themselves run out: the missing part was never copied.
  if (scan.lastPacketEnd < end - tolerance) return Math.max(0, Math.min(scan.lastPacketEnd, end) - start);
  if (scan.lastKeyFrame === -Infinity) return 0;
  // The packets are all there but do not decode (a tail of zeros): find where decoding stops.
  const decoded = await lastDecodedFrame(filePath, stream, scan.lastKeyFrame, run);
  const lastGood = Math.max(decoded, scan.lastKeyFrame);
  return reachesEnd(lastGood) ? null : Math.max(0, lastGood + frameSeconds - start);
}

/** The latest frame time (absolute seconds) decoded from `from` to the end of the file, or -Infinity. */
async function lastDecodedFrame(filePath: string, stream: number, from: number, run: ToolRunOptions): Promise<number> {
  let last = -Infinity;
  const args = [
    ...flags({
      '-v': 'error',
      '-select_streams': stream,
      '-read_intervals': `${from.toFixed(3)}%`,
      '-show_entries': 'frame=best_effort_timestamp_time,pkt_dts_time,pts_time',
      '-of': 'compact',
    }),
    mediaUrl(filePath),
  ];
  await tolerateToolError(
    runTool('ffprobe', args, {
      ...run,
      onLine: (line) => {
        const entry = parseCompact(line);
        if (entry?.section !== 'frame') return;
        const time = firstNumber(entry.fields, ['best_effort_timestamp_time', 'pts_time', 'pkt_dts_time']);
        if (time !== undefined) last = Math.max(last, time);
      },
    }),
  );
  return last;
}

/** Reads every packet of the stream and decodes only its key frames. */
async function scanPackets(
  filePath: string,
  stream: number,
  run: ToolRunOptions,
): Promise<{ lastPacketEnd: number; lastKeyFrame: number }> {
  let lastPacketEnd = -Infinity;
  let lastKeyFrame = -Infinity;
  const args = [
    ...flags({
      '-v': 'error',
      '-select_streams': stream,
      '-skip_frame': 'nokey',
      '-show_entries': 'packet=pts_time,dts_time,duration_time:frame=best_effort_timestamp_time,pkt_dts_time,pts_time',
      '-of': 'compact',
    }),
    mediaUrl(filePath),
  ];
  await tolerateToolError(
    runTool('ffprobe', args, {
      ...run,
      onLine: (line) => {
        const entry = parseCompact(line);
        if (entry?.section === 'packet') {
          const time = Math.max(firstNumber(entry.fields, ['pts_time']) ?? -Infinity, firstNumber(entry.fields, ['dts_time']) ?? -Infinity);
          lastPacketEnd = Math.max(lastPacketEnd, time + (firstNumber(entry.fields, ['duration_time']) ?? 0));
        } else if (entry?.section === 'frame') {
          const time = firstNumber(entry.fields, ['best_effort_timestamp_time', 'pts_time', 'pkt_dts_time']);
          if (time !== undefined) lastKeyFrame = Math.max(lastKeyFrame, time);
        }
      },
    }),
  );
  return { lastPacketEnd, lastKeyFrame };
}

/** A damaged file can make ffprobe exit non-zero after printing what it could read: keep that. */
async function tolerateToolError(run: Promise<unknown>): Promise<void> {
  try {
    await run;
  } catch (error) {
    if (!(error instanceof ToolError) || error.killedBy) throw error;
  }
}

/** One line of ffprobe's compact writer: `frame|key=value|key=value`. */
export function parseCompact(line: string): { section: string; fields: Map<string, string> } | null {
  const parts = line.split('|');
  const section = parts[0];
  if (!section) return null;
  const fields = new Map<string, string>();
  for (const part of parts.slice(1)) {
    const at = part.indexOf('=');
    if (at > 0) fields.set(part.slice(0, at), part.slice(at + 1));
  }
  return { section, fields };
}

function firstNumber(fields: Map<string, string>, keys: string[]): number | undefined {
  for (const key of keys) {
    const value = fields.get(key);
    if (value === undefined || value === 'N/A') continue;
    const n = Number(value);
    if (Number.isFinite(n)) return n;
  }
  return undefined;
}
