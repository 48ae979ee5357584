import type { LessonDto, LessonProblem, LessonSummaryDto, VersionDto, VersionSummaryDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import type { LessonDetailView, LessonView } from './lessons.read-model';
import type { VersionDetailView, VersionView } from './lesson-versions.read-model';
import type { RecordingFacts } from './lesson-content';
import { canEditLesson } from './lessons.policy';
import { lessonStateOf } from './lesson-state';

const person = (id: string | null, name: string | null) => (id !== null && name !== null ? { id, name } : null);
const iso = (date: Date | string) => new Date(date).toISOString();

/** What the publish rules need to know about a lesson's recording. */
export function recordingFactsOf(row: LessonView): RecordingFacts {
  return {
    ready: row.recordingState === 'ready' && row.recordingRenditionKey !== null,
    durationMs: row.recordingDurationSeconds === null ? null : Math.round(row.recordingDurationSeconds * 1000),
    frameRate: row.recordingFrameRate,
  };
}

/** Unpublished changes: never published, or the draft's hash differs from the newest version's. */
export const hasUnpublishedChanges = (row: { draftHash: string; latestHash: string | null }) =>
  row.latestHash === null || row.draftHash !== row.latestHash;

/** A lesson as lists show it; the poster URL is signed by the caller. */
export function presentLessonSummary(row: LessonView, posterUrl: string | null): LessonSummaryDto {
  const recording = recordingFactsOf(row);
  return {
    id: row.id,
    title: row.title,
    tags: row.tags,
    level: row.level,
    state: lessonStateOf(row),
    owner: person(row.ownerId, row.ownerName),
    recording: {
      id: row.recordingId,
      title: row.recordingTitle,
      durationMs: recording.durationMs,
      frameRate: recording.frameRate,
      ready: recording.ready,
    },
    shared: row.shared,
    checkpointCount: row.checkpointCount,
    publishedVersion: row.latestVersion,
    unpublishedChanges: hasUnpublishedChanges(row),
    posterUrl,
    createdAt: iso(row.createdAt),
    updatedAt: iso(row.updatedAt),
  };
}

/** A lesson with its draft, what stops it being published, and whether the caller may edit it. */
export function presentLesson(row: LessonDetailView, actor: Actor, posterUrl: string | null, problems: LessonProblem[]): LessonDto {
  return {
    ...presentLessonSummary(row, posterUrl),
    revision: row.revision,
    draft: row.draft,
    problems,
    savedAt: iso(row.savedAt),
    savedBy: person(row.savedById, row.savedByName),
    canEdit: canEditLesson(actor, row),
  };
}

export function presentVersionSummary(row: VersionView): VersionSummaryDto {
  return {
    id: row.id,
    number: row.number,
    note: row.note,
    publishedAt: iso(row.publishedAt),
    publishedBy: person(row.publishedById, row.publishedByName),
    checkpointCount: row.checkpointCount,
    changes: row.changes,
  };
}

export function presentVersion(row: VersionDetailView): VersionDto {
  return { ...presentVersionSummary(row), content: row.content };
}
