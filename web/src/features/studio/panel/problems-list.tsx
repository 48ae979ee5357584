import type { LessonContent } from '@core/contracts';
import { checkpointLabel } from '@core/lessons/checkpoint-label';
import { AlertIcon } from '@/components/ui/icons';
import { countProblems, type GroupedProblems } from '../draft/problems';
import { formatTime } from '../time/format-time';

export type Selection = { type: 'checkpoint'; key: string } | { type: 'chapter'; key: string } | null;

type Entry = { id: string; where: string; message: string; target: Selection };

const SETTING_NAMES: Record<string, string> = {
  title: 'Title',
  tags: 'Tags',
  level: 'Level',
  description: 'Description',
  safetyNotes: 'Safety notes',
  minSpacingMs: 'Minimum spacing',
};

function entriesOf(content: LessonContent, problems: GroupedProblems): Entry[] {
  const entries: Entry[] = [];
  for (const p of problems.settings) {
    const head = p.path.split('.')[0] ?? '';
    entries.push({
      id: `s:${p.path}:${p.message}`,
      where: `Lesson settings · ${SETTING_NAMES[head] ?? head}`,
      message: p.message,
      target: null,
    });
  }
  content.chapters.forEach((chapter, index) => {
    for (const p of problems.chapters.get(chapter.key) ?? []) {
      const name = chapter.title.trim() || `Chapter ${index + 1}`;
      entries.push({
        id: `h:${chapter.key}:${p.path}:${p.message}`,
        where: `Chapter “${name}”`,
        message: p.message,
        target: { type: 'chapter', key: chapter.key },
      });
    }
  });
  for (const checkpoint of content.checkpoints) {
    for (const p of problems.checkpoints.get(checkpoint.key) ?? []) {
      entries.push({
        id: `c:${checkpoint.key}:${p.path}:${p.message}`,
        where: `${formatTime(checkpoint.atMs)} · ${checkpointLabel(checkpoint)}`,
        message: p.message,
        target: { type: 'checkpoint', key: checkpoint.key },
      });
    }
  }
  for (const p of problems.other) entries.push({ id: `o:${p.path}:${p.message}`, where: 'Lesson', message: p.message, target: null });
  return entries;
}

/** Everything to fix before publishing; each entry opens what it is about. */
export function ProblemsList({
  content,
  problems,
  onSelect,
}: {
  content: LessonContent;
  problems: GroupedProblems;
  onSelect: (target: Selection) => void;
}) {
  const count = countProblems(problems);
  if (count === 0) return <p className="text-sm text-success">No problems: this draft is ready to publish.</p>;
  const entries = entriesOf(content, problems);
  return (
    <section aria-labelledby="problems-title">
      <h2 id="problems-title" className="flex items-center gap-2 text-base text-danger">
        <AlertIcon className="size-5" />
        {count === 1 ? '1 problem to fix before publishing' : `${count} problems to fix before publishing`}
      </h2>
      <ul className="mt-2 flex max-h-56 flex-col gap-1 overflow-y-auto">
        {entries.map((entry) => (
          <li key={entry.id}>
            <button
              type="button"
              className="w-full cursor-pointer rounded-md px-2 py-1 text-left hover:bg-sunken"
              onClick={() => onSelect(entry.target)}
            >
              <span className="block text-sm font-bold">{entry.where}</span>
              <span className="block text-sm text-ink-muted">{entry.message}</span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
