import type { Chapter, LessonProblem } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { cn } from '@/lib/cn';
import { messageAt } from '../draft/problems';
import { formatTime } from '../time/format-time';
import { TimeField } from './time-field';

type ChaptersEditorProps = {
  chapters: readonly Chapter[];
  durationMs: number;
  selectedKey: string | null;
  problems: ReadonlyMap<string, LessonProblem[]>;
  onSelect: (key: string) => void;
  onChange: (key: string, patch: Partial<Omit<Chapter, 'key'>>, field: string) => void;
  onDelete: (key: string) => void;
};

/** Every chapter with its title, start and end; the selected one is opened. */
export function ChaptersEditor({ chapters, durationMs, selectedKey, problems, onSelect, onChange, onDelete }: ChaptersEditorProps) {
  return (
    <section aria-labelledby="chapters-title" className="flex flex-col gap-3">
      <h2 id="chapters-title" className="text-xl">
        Chapters
      </h2>
      {chapters.length === 0 ? (
        <p className="text-sm text-ink-muted">
          No chapters. Drag across the chapter lane of the timeline to mark a range, or use “Add chapter here”.
        </p>
      ) : null}
      <ol className="flex flex-col gap-2">
        {chapters.map((chapter, index) => {
          const list = problems.get(chapter.key);
          const open = chapter.key === selectedKey;
          const name = chapter.title.trim() || `Chapter ${index + 1}`;
          return (
            <li key={chapter.key} className={cn('rounded-md border p-3', open ? 'border-ink bg-surface' : 'border-line bg-sunken')}>
              {open ? (
                <div className="flex flex-col gap-3">
                  <Field label="Chapter title" error={messageAt(list, 'title')}>
                    {(control) => (
                      <Input
                        {...control}
                        value={chapter.title}
                        maxLength={LIMITS.chapterTitleMax}
                        onChange={(event) => onChange(chapter.key, { title: event.target.value }, 'title')}
                      />
                    )}
                  </Field>
                  <div className="flex flex-wrap gap-3">
                    <TimeField
                      label="Starts"
                      valueMs={chapter.startMs}
                      problem={messageAt(list, 'startMs')}
                      onCommit={(ms) => {
                        if (ms >= chapter.endMs) return `The start must be before the end (${formatTime(chapter.endMs)}).`;
                        onChange(chapter.key, { startMs: ms }, 'startMs');
                        return null;
                      }}
                    />
                    <TimeField
                      label="Ends"
                      valueMs={chapter.endMs}
                      problem={messageAt(list, 'endMs')}
                      onCommit={(ms) => {
                        if (ms <= chapter.startMs) return `The end must be after the start (${formatTime(chapter.startMs)}).`;
                        if (ms > durationMs) return `The recording ends at ${formatTime(durationMs)}.`;
                        onChange(chapter.key, { endMs: ms }, 'endMs');
                        return null;
                      }}
                    />
                  </div>
                  {list
                    ?.filter((p) => !['title', 'startMs', 'endMs'].includes(p.path))
                    .map((p) => (
                      <p key={p.message} className="text-sm font-bold text-danger">
                        {p.message}
                      </p>
                    ))}
                  <div>
                    <Button size="sm" variant="danger" onClick={() => onDelete(chapter.key)}>
                      Delete chapter
                    </Button>
                  </div>
                </div>
              ) : (
                <button
                  type="button"
                  className="flex w-full cursor-pointer justify-between gap-2 text-left"
                  onClick={() => onSelect(chapter.key)}
                >
                  <span className="font-bold">
                    {list && list.length > 0 ? '! ' : ''}
                    {name}
                  </span>
                  <span className="font-mono text-sm text-ink-muted">
                    {formatTime(chapter.startMs)} – {formatTime(chapter.endMs)}
                  </span>
                </button>
              )}
            </li>
          );
        })}
      </ol>
    </section>
  );
}
