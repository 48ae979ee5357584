import type { ReactNode } from 'react';
import type { RecordingDto } from '@core/contracts';
import { formatBytes, formatDuration } from '@core/recordings';
import { formatDateTime, type SchoolClock } from '@/lib/format';

const LATER = 'Known after processing';

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
  if (recording.audioCodec) return recording.audioCodec;
  return recording.state === 'ready' ? 'No sound track' : LATER;
}

/** What Pinfield knows about the file, in plain words. */
export function RecordingFacts({ recording, clock }: { recording: RecordingDto; clock: SchoolClock }) {
  const facts: [string, ReactNode][] = [
    ['Length', recording.durationSeconds === null ? LATER : <span className="font-mono">{formatDuration(recording.durationSeconds)}</span>],
    ['Picture', picture(recording)],
    ['Frame rate', recording.frameRate === null ? LATER : `${Number(recording.frameRate.toFixed(2))} frames per second`],
    ['Video format', recording.videoCodec ?? LATER],
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
