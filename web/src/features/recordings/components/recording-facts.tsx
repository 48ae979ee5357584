import type { ReactNode } from 'react';
import type { RecordingDto } from '@core/contracts';
import { formatBytes, formatDuration } from '@core/recordings';
import { formatDateTime, type SchoolClock } from '@/lib/format';

const LATER = 'Known after processing';

/** ffprobe's codec names as people read them on a camera or in a file manager. */
const CODEC_NAMES: Record<string, string> = {
  h264: 'H.264',
  hevc: 'HEVC (H.265)',
  av1: 'AV1',
  vp8: 'VP8',
  vp9: 'VP9',
  mpeg4: 'MPEG-4 Part 2',
  mpeg2video: 'MPEG-2',
  prores: 'ProRes',
  aac: 'AAC',
  mp3: 'MP3',
  opus: 'Opus',
  vorbis: 'Vorbis',
  ac3: 'Dolby Digital (AC-3)',
  pcm_s16le: 'PCM (uncompressed)',
};

export function codecName(codec: string): string {
  return CODEC_NAMES[codec] ?? codec.toUpperCase();
}

function picture(recording: RecordingDto): string {
  if (recording.width === null || recording.height === null) return LATER;
  const turned = recording.rotation ? `, turned ${Math.abs(recording.rotation)}° when played` : '';
  return `${recording.width} × ${recording.height} pixels${turned}`;
}

function webVersion(recording: RecordingDto): string {
  if (recording.renditionMode === 'transcode') return 'Converted to H.264 video and AAC sound (at most 1280 × 720)';
  if (recording.renditionMode === 'remux') return 'The original streams, repackaged (it already played everywhere)';
  return recording.state === 'failed' ? 'Not made' : 'Not made yet';
}

function sound(recording: RecordingDto): string {
  if (recording.audioCodec) return codecName(recording.audioCodec);
  return recording.state === 'ready' ? 'No sound track' : LATER;
}

/** What Pinfield knows about the file, in plain words. */
export function RecordingFacts({ recording, clock }: { recording: RecordingDto; clock: SchoolClock }) {
  const facts: [string, ReactNode][] = [
    ['Length', recording.durationSeconds === null ? LATER : <span className="font-mono">{formatDuration(recording.durationSeconds)}</span>],
    ['Picture', picture(recording)],
    ['Frame rate', recording.frameRate === null ? LATER : `${Number(recording.frameRate.toFixed(2))} frames per second`],
    ['Video format', recording.videoCodec === null ? LATER : codecName(recording.videoCodec)],
    ['Sound format', sound(recording)],
    ['File size', formatBytes(recording.sizeBytes)],
    ['Web version', webVersion(recording)],
    ['Original file', <span className="break-all">{recording.originalFileName}</span>],
    ['Uploaded by', recording.owner?.name ?? 'A former member of staff'],
    ['Added', formatDateTime(recording.createdAt, clock)],
    ['Last changed', formatDateTime(recording.updatedAt, clock)],
  ];
  return (
    <dl className="grid grid-cols-[minmax(7rem,auto)_1fr] gap-x-4 gap-y-2">
      {facts.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="font-bold">{term}</dt>
          <dd className="min-w-0">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
