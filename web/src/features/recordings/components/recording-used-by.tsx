import { Fragment } from 'react';
import { Link } from 'react-router-dom';
import type { RecordingDto } from '@core/contracts';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';

const STATE_WORDS = { draft: 'draft', published: 'published', archived: 'archived' } as const;

/** "Used by: <lesson>, <lesson>": the school's lessons built on this recording, each a link to its overview. */
export function RecordingUsedBy({ recording, className }: { recording: Pick<RecordingDto, 'usedBy'>; className?: string }) {
  if (recording.usedBy.length === 0) return null;
  return (
    <p className={cn('text-sm', className)}>
      <span className="text-ink-muted">Used by: </span>
      {recording.usedBy.map((lesson, index) => (
        <Fragment key={lesson.id}>
          {index > 0 ? ', ' : null}
          <Link to={paths.lessons.overview('/teacher', lesson.id)} className="font-bold text-copper underline">
            {lesson.title}
          </Link>
          <span className="text-ink-muted"> ({STATE_WORDS[lesson.state]})</span>
        </Fragment>
      ))}
    </p>
  );
}
