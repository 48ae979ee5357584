import type { CaptionDto, OpenUploadDto, PlaybackDto, RecordingDetailDto, RecordingDto, UploadDto, UploadLimitsDto } from '@core/contracts';
import { nextId } from './data';

// Invented recordings of an obviously fictional school's physics demonstrations.
const GIB = 1024 ** 3;
const MIB = 1024 ** 2;

export const STORAGE_ORIGIN = 'http://127.0.0.1:4312';

export function buildRecording(overrides: Partial<RecordingDto> = {}): RecordingDto {
  return {
    id: nextId(),
    title: 'Pendulum release (test)',
    originalFileName: 'pendulum-release.mp4',
    state: 'ready',
    progress: 100,
    failure: null,
    sizeBytes: 48 * MIB,
    durationSeconds: 41.2,
    width: 1280,
    height: 720,
    frameRate: 29.97,
    videoCodec: 'h264',
    audioCodec: 'aac',
    rotation: 0,
    renditionMode: 'remux',
    posterUrl: `${STORAGE_ORIGIN}/pinfield-media/poster.jpg?X-Amz-Signature=a`,
    owner: { id: nextId(), name: 'Ada Quill' },
    canEdit: true,
    uploadId: null,
    usedBy: [],
    createdAt: '2025-03-03T09:00:00.000Z',
    updatedAt: '2025-03-03T09:05:00.000Z',
    ...overrides,
  };
}

export function buildCaption(overrides: Partial<CaptionDto> = {}): CaptionDto {
  const id = overrides.id ?? nextId();
  return {
    id,
    language: 'en',
    label: 'English',
    isDefault: true,
    cueCount: 12,
    url: `/api/recordings/rec/captions/${id}.vtt`,
    updatedAt: '2025-03-03T09:06:00.000Z',
    ...overrides,
  };
}

export function buildRecordingDetail(overrides: Partial<RecordingDetailDto> = {}): RecordingDetailDto {
  return { ...buildRecording(), captions: [], ...overrides };
}

export function buildPlayback(recording: RecordingDetailDto, overrides: Partial<PlaybackDto> = {}): PlaybackDto {
  return {
    recordingId: recording.id,
    src: { url: `${STORAGE_ORIGIN}/pinfield-media/web.mp4?X-Amz-Signature=first`, type: 'video/mp4' },
    posterUrl: recording.posterUrl,
    expiresAt: '2099-01-01T00:00:00.000Z',
    durationSeconds: recording.durationSeconds ?? 0,
    width: recording.width ?? 1280,
    height: recording.height ?? 720,
    thumbnailsUrl: `/api/recordings/${recording.id}/thumbnails.vtt`,
    captions: recording.captions,
    ...overrides,
  };
}

export function buildUpload(overrides: Partial<UploadDto> = {}): UploadDto {
  return {
    id: nextId(),
    recordingId: nextId(),
    key: 'schools/s/recordings/r/original',
    fileName: 'pendulum-release.mp4',
    size: 11,
    lastModified: 1_700_000_000_000,
    partSize: 8 * MIB,
    partCount: 1,
    createdAt: '2025-03-03T09:00:00.000Z',
    lastActivityAt: '2025-03-03T09:00:00.000Z',
    ...overrides,
  };
}

export function buildOpenUpload(overrides: Partial<OpenUploadDto> = {}): OpenUploadDto {
  return { ...buildUpload(), uploadedBytes: 0, uploadedParts: 0, ...overrides };
}

export function buildLimits(overrides: Partial<UploadLimitsDto> = {}): UploadLimitsDto {
  return { maxBytes: 2 * GIB, quotaBytes: 20 * GIB, usedBytes: 3 * GIB, accept: ['video/*', '.mp4', '.mov', '.mkv'], ...overrides };
}
