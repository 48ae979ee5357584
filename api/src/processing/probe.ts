import { z } from 'zod';
import { FAILURE_MESSAGES, MediaFailure } from './media-failure';
import { flags, mediaUrl, runTool, ToolError, type ToolRunOptions } from './media-tools';
import { isIsoMediaMime, sniffKind } from './sniff';

export interface MediaProbe {
  /** ffprobe's demuxer name, e.g. "mov,mp4,m4a,3gp,3g2,mj2". */
  formatName: string;
  durationSeconds: number;
  /** Coded size of the first video stream. */
  width: number;
  height: number;
  /** Size as shown: sample aspect ratio applied, swapped for 90/270 rotation. */
  displayWidth: number;
  displayHeight: number;
  frameRate: number;
  videoCodec: string;
  audioCodec: string | null;
  /** Overall bits per second. */
  bitrate: number;
  /** Clockwise degrees the picture must turn to stand upright (phones write 90 for portrait). */
  rotation: 0 | 90 | 180 | 270;
  pixelFormat: string;
  hasAudio: boolean;
  /** Channels of the first audio stream, 0 without audio. */
  audioChannels: number;
  /** Coded as fields (camcorders' 1080i): `frameRate` counts frames, each holding two fields. */
  interlaced: boolean;
}

/** Facts processing needs beside the probe: where the video stream says it ends, and whether rates agree. */
export interface ProbeDetails {
  probe: MediaProbe;
  /** ffprobe's indexes of the video stream the probe describes (cover art skipped) and of the first audio stream. */
  videoStreamIndex: number;
  audioStreamIndex: number | null;
  /** Absolute time (container clock) of the video stream's first frame and declared end. */
  videoStartSeconds: number;
  videoEndSeconds: number;
  /** ffprobe's guessed base rate and the average rate agree: a hint of constant frame rate. */
  ratesAgree: boolean;
}

const num = z.union([z.string(), z.number()]).optional();
const StreamSchema = z.object({
  index: z.number().default(0),
  codec_type: z.string().optional(),
  codec_name: z.string().optional(),
  width: z.number().optional(),
  height: z.number().optional(),
  sample_aspect_ratio: z.string().optional(),
  pix_fmt: z.string().optional(),
  field_order: z.string().optional(),
  r_frame_rate: z.string().optional(),
  avg_frame_rate: z.string().optional(),
  start_time: num,
  duration: num,
  channels: z.number().optional(),
  disposition: z.object({ attached_pic: z.number().optional() }).partial().optional(),
  tags: z.record(z.string(), z.string()).optional(),
  side_data_list: z.array(z.object({ side_data_type: z.string().optional(), rotation: z.number().optional() })).optional(),
});
const ProbeOutputSchema = z.object({
  streams: z.array(StreamSchema).default([]),
  format: z.object({ format_name: z.string().optional(), duration: num, start_time: num, bit_rate: num, size: num }).default({}),
});
type ProbeStream = z.infer<typeof StreamSchema>;

/**
 * Duration, size, frame rate, codecs, bitrate and rotation of a local media file (ffprobe under nice).
 * Throws MediaFailure: `no_video_track` (audio only), `truncated` (an MP4/MOV by its bytes that
 * ffprobe cannot open: its index is missing) or `unreadable`.
 */
export async function probeMedia(filePath: string, options: Partial<ToolRunOptions> = {}): Promise<MediaProbe> {
  return (await probeDetails(filePath, options)).probe;
}

export async function probeDetails(filePath: string, options: Partial<ToolRunOptions> = {}): Promise<ProbeDetails> {
  const run = { nice: options.nice ?? 0, signal: options.signal };
  let stdout: string;
  try {
    ({ stdout } = await runTool(
      'ffprobe',
      ['-v', 'error', '-print_format', 'json', '-show_format', '-show_streams', mediaUrl(filePath)],
      run,
    ));
  } catch (error) {
    // A killed ffprobe is no verdict on the file: let the job fail as retryable.
    if (!(error instanceof ToolError) || error.killedBy) throw error;
    // An MP4 copied only in part loses the index (moov) that phones write at the end.
    const kind = await sniffKind(filePath);
    if (isIsoMediaMime(kind.mime)) throw new MediaFailure('truncated', FAILURE_MESSAGES.incomplete, false, { cause: error });
    throw new MediaFailure('unreadable', FAILURE_MESSAGES.unreadable, false, { cause: error });
  }
  const parsed = ProbeOutputSchema.safeParse(JSON.parse(stdout));
  if (!parsed.success) throw new MediaFailure('unreadable', FAILURE_MESSAGES.unreadable, false, { cause: parsed.error });
  return describeProbe(parsed.data);
}

/** Pure: ffprobe's JSON to the probe (exported for tests of the rotation and rate rules). */
export function describeProbe(data: z.infer<typeof ProbeOutputSchema>): ProbeDetails {
  const { streams, format } = data;
  // Cover art in an audio file is a one-picture "video" stream flagged attached_pic.
  const video = streams.find((s) => s.codec_type === 'video' && s.disposition?.attached_pic !== 1);
  const audio = streams.find((s) => s.codec_type === 'audio');
  if (!video) throw new MediaFailure('no_video_track', FAILURE_MESSAGES.noVideoTrack, false);
  const width = video.width ?? 0;
  const height = video.height ?? 0;
  if (width <= 0 || height <= 0) throw new MediaFailure('unreadable', FAILURE_MESSAGES.unreadable, false);

  const formatStart = toNumber(format.start_time) ?? 0;
  const videoStart = toNumber(video.start_time) ?? formatStart;
  const videoDuration = toNumber(video.duration);
  const formatDuration = toNumber(format.duration);
  const durationSeconds = formatDuration ?? videoDuration ?? 0;
  if (!(durationSeconds > 0)) throw new MediaFailure('unreadable', FAILURE_MESSAGES.noDuration, false);
  const videoEndSeconds = videoDuration !== undefined && videoDuration > 0 ? videoStart + videoDuration : formatStart + durationSeconds;

  const rotation = rotationOf(video);
  const sar = ratio(video.sample_aspect_ratio, ':');
  const shownWidth = Math.round(width * (sar && sar > 0 ? sar : 1));
  const quarterTurn = rotation === 90 || rotation === 270;
  const avg = ratio(video.avg_frame_rate, '/');
  const base = ratio(video.r_frame_rate, '/');
  const frameRate = avg && avg > 0 ? avg : base && base > 0 ? base : 0;
  const size = toNumber(format.size);
  const bitrate = toNumber(format.bit_rate) ?? (size ? Math.round((size * 8) / durationSeconds) : 0);

  return {
    probe: {
      formatName: format.format_name ?? 'unknown',
      durationSeconds,
      width,
      height,
      displayWidth: quarterTurn ? height : shownWidth,
      displayHeight: quarterTurn ? shownWidth : height,
      frameRate,
      videoCodec: video.codec_name ?? 'unknown',
      audioCodec: audio?.codec_name ?? null,
      bitrate,
      rotation,
      pixelFormat: video.pix_fmt ?? 'unknown',
      hasAudio: audio !== undefined,
      audioChannels: audio?.channels ?? 0,
      interlaced: ['tt', 'bb', 'tb', 'bt'].includes(video.field_order ?? ''),
    },
    videoStreamIndex: video.index,
    audioStreamIndex: audio?.index ?? null,
    videoStartSeconds: videoStart,
    videoEndSeconds,
    ratesAgree: avg !== undefined && base !== undefined && avg > 0 && Math.abs(avg - base) / base < 0.001,
  };
}

/**
 * The display matrix's rotation (ffprobe prints it counter-clockwise, as libavutil's
 * av_display_rotation_get returns it) or the older `rotate` tag (clockwise), as clockwise 0/90/180/270.
 */
function rotationOf(stream: ProbeStream): MediaProbe['rotation'] {
  const matrix = stream.side_data_list?.find((d) => d.rotation !== undefined)?.rotation;
  const tag = stream.tags?.rotate !== undefined ? Number(stream.tags.rotate) : undefined;
  const clockwise = matrix !== undefined ? -matrix : tag !== undefined && Number.isFinite(tag) ? tag : 0;
  const quarter = ((Math.round(clockwise / 90) % 4) + 4) % 4;
  return ([0, 90, 180, 270] as const)[quarter]!;
}

function toNumber(value: string | number | undefined): number | undefined {
  if (value === undefined || value === 'N/A') return undefined;
  const n = Number(value);
  return Number.isFinite(n) ? n : undefined;
}

function ratio(value: string | undefined, separator: string): number | undefined {
  if (!value) return undefined;
  const [a, b] = value.split(separator).map(Number);
  if (a === undefined || b === undefined || !Number.isFinite(a) || !Number.isFinite(b) || b === 0) return undefined;
  return a / b;
}

/**
 * Constant frame rate, measured: the first 300 video packets are evenly spaced (within 1 %) and the
 * base and average rates agree. Phones often record variable rate, which players stutter on.
 */
export async function measureConstantFrameRate(filePath: string, details: ProbeDetails, run: ToolRunOptions): Promise<boolean> {
  if (!details.ratesAgree) return false;
  const times: number[] = [];
  const args = [
    ...flags({
      '-v': 'error',
      '-select_streams': details.videoStreamIndex,
      '-read_intervals': '%+#300',
      '-show_entries': 'packet=dts_time',
      '-of': 'csv=p=0',
    }),
    mediaUrl(filePath),
  ];
  const { stdout } = await runTool('ffprobe', args, run);
  for (const line of stdout.split('\n')) {
    const t = Number(line.split(',')[0]);
    if (line.trim() !== '' && Number.isFinite(t)) times.push(t);
  }
  if (times.length < 3) return true; // too short to vary
  times.sort((a, b) => a - b);
  const gaps = times.slice(1).map((t, i) => t - times[i]!);
  const mean = gaps.reduce((a, b) => a + b, 0) / gaps.length;
  return mean > 0 && Math.max(...gaps) - Math.min(...gaps) <= 0.01 * mean;
}
