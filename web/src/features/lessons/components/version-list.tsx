import type { VersionSummaryDto } from '@core/contracts';
import { formatDateTime, plural, type SchoolClock } from '@/lib/format';
import { lessonDownloads } from '../api/lesson-downloads';
import { describeChanges } from '../describe-changes';

type VersionListProps = { lessonId: string; versions: VersionSummaryDto[]; clock: SchoolClock };

/** The published versions, newest first: when and by whom, the note, what changed, and each version's files. */
export function VersionList({ lessonId, versions, clock }: VersionListProps) {
  if (versions.length === 0) {
    return <p className="text-ink-muted">Not published yet. Students see a lesson only once a version is published.</p>;
  }
  return (
    <ol aria-label="Versions" className="flex flex-col gap-3">
      {versions.map((version) => {
        const first = version.number === Math.min(...versions.map((item) => item.number));
        const lines = describeChanges(version.changes);
        return (
          <li key={version.id} aria-labelledby={`version-${version.number}`} className="rounded-lg border border-line bg-surface p-4">
            <h3 id={`version-${version.number}`} className="text-lg">
              Version {version.number}
            </h3>
            <p className="text-sm text-ink-muted">
              Published {formatDateTime(version.publishedAt, clock)} by {version.publishedBy?.name ?? 'a former member of staff'} ·{' '}
              {plural(version.checkpointCount, 'checkpoint')}
            </p>
            {version.note ? <p className="mt-2 border-l-4 border-line pl-3">{version.note}</p> : null}
            {first ? (
              <p className="mt-2">The first published version.</p>
            ) : lines.length > 0 ? (
              <ul aria-label={`What changed in version ${version.number}`} className="mt-2 list-disc pl-5">
                {lines.map((line) => (
                  <li key={line}>{line}</li>
                ))}
              </ul>
            ) : (
              <p className="mt-2 text-ink-muted">No change to the checkpoints or settings.</p>
            )}
            <p className="mt-2 flex flex-wrap gap-x-4 text-sm">
              <a href={lessonDownloads.file(lessonId, version.number)} className="font-bold text-copper underline" download>
                Lesson file of version {version.number}
              </a>
              <a href={lessonDownloads.chapters(lessonId, version.number)} className="font-bold text-copper underline" download>
                Chapters (WebVTT)
              </a>
              <a href={lessonDownloads.checkpoints(lessonId, version.number)} className="font-bold text-copper underline" download>
                Checkpoint times (WebVTT)
              </a>
            </p>
          </li>
        );
      })}
    </ol>
  );
}
