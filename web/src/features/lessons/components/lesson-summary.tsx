import type { ReactNode } from 'react';
import type { LessonDto } from '@core/contracts';
import { RichText } from '@/components/rich-text/rich-text';
import { Card } from '@/components/ui/card';
import { plural } from '@/lib/format';
import { checkpointsByKind } from '../lesson-labels';
import { TagList } from './tag-list';

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="grid gap-1 sm:grid-cols-[10rem_minmax(0,1fr)]">
      <dt className="font-bold">{term}</dt>
      <dd className="min-w-0">{children}</dd>
    </div>
  );
}

/** What the lesson is: recording, level, tags, description, safety notes and its checkpoints by kind (of the draft). */
export function LessonSummary({ lesson }: { lesson: LessonDto }) {
  const { settings, chapters, checkpoints } = lesson.draft;
  const kinds = checkpointsByKind(lesson.draft);
  return (
    <div className="flex flex-col gap-6">
      <Card aria-labelledby="about-heading">
        <h2 id="about-heading" className="mb-3 text-xl">
          About the lesson
        </h2>
        <dl className="flex flex-col gap-3">
          <Fact term="Recording">
            {lesson.recording.title}
            {lesson.recording.ready ? null : <span className="text-ink-muted"> — no longer ready to play; students cannot watch it.</span>}
          </Fact>
          <Fact term="Level">{settings.level || <span className="text-ink-muted">Not given</span>}</Fact>
          <Fact term="Topic tags">
            {settings.tags.length > 0 ? <TagList tags={settings.tags} /> : <span className="text-ink-muted">None</span>}
          </Fact>
          <Fact term="Description">
            {settings.description.trim() ? <RichText markdown={settings.description} /> : <span className="text-ink-muted">None</span>}
          </Fact>
        </dl>
      </Card>
      <Card aria-labelledby="safety-heading">
        <h2 id="safety-heading" className="mb-3 text-xl">
          Safety notes
        </h2>
        {settings.safetyNotes.trim() ? (
          <RichText markdown={settings.safetyNotes} />
        ) : (
          <p className="text-ink-muted">None. Students see these before the video starts.</p>
        )}
      </Card>
      <Card aria-labelledby="checkpoints-heading">
        <h2 id="checkpoints-heading" className="mb-3 text-xl">
          Checkpoints
        </h2>
        {checkpoints.length === 0 ? (
          <p className="text-ink-muted">No checkpoints pinned yet.</p>
        ) : (
          <ul aria-label="Checkpoints by kind" className="flex flex-col gap-1">
            {kinds.map((row) => (
              <li key={row.kind} className="flex justify-between gap-4 border-b border-line py-1 last:border-b-0">
                <span>{row.label}</span>
                <span className="font-bold">{row.count}</span>
              </li>
            ))}
          </ul>
        )}
        <p className="mt-3 text-sm text-ink-muted">
          {plural(checkpoints.length, 'checkpoint')} and {plural(chapters.length, 'chapter')} in the draft.
        </p>
      </Card>
    </div>
  );
}
