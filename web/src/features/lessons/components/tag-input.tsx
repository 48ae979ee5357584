import { useState, type KeyboardEvent } from 'react';
import { LIMITS } from '@core/limits';
import { LessonSettingsSchema } from '@core/contracts';
import { CloseIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import type { FieldControlProps } from '@/components/ui/field';

type TagInputProps = FieldControlProps & {
  value: string[];
  onChange: (tags: string[]) => void;
  onBlur?: () => void;
};

const TagSchema = LessonSettingsSchema.shape.tags.element;

/**
 * Topic tags: type one and press Enter or a comma; each shows with a remove button. Tags are stored lower-case
 * (the contract's rule), and a tag the contract refuses is explained under the box instead of being added.
 */
export function TagInput({ id, 'aria-describedby': describedBy, invalid, value, onChange, onBlur }: TagInputProps) {
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const problemId = `${id}-tag-problem`;

  /** Adds each typed tag in turn; stops at the first the contract refuses and says why. True when all were added. */
  function add(raws: string[]): boolean {
    let next = value;
    let ok = true;
    for (const raw of raws) {
      if (raw.trim() === '') continue;
      const parsed = TagSchema.safeParse(raw);
      const message = !parsed.success
        ? (parsed.error.issues[0]?.message ?? 'That tag cannot be used.')
        : next.includes(parsed.data)
          ? `“${parsed.data}” is already a tag.`
          : next.length >= LIMITS.lessonTagsMax
            ? `A lesson has at most ${LIMITS.lessonTagsMax} tags: remove one first.`
            : null;
      if (message || !parsed.success) {
        setProblem(message);
        ok = false;
        break;
      }
      next = [...next, parsed.data];
    }
    if (ok) setProblem(null);
    if (next !== value) onChange(next);
    return ok;
  }

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key === 'Enter' || event.key === ',') {
      event.preventDefault();
      if (add([text])) setText('');
    } else if (event.key === 'Backspace' && text === '' && value.length > 0) {
      onChange(value.slice(0, -1));
    }
  }

  return (
    <div className="flex flex-col gap-2">
      {value.length > 0 ? (
        <ul aria-label="Tags added" className="flex flex-wrap gap-1.5">
          {value.map((tag) => (
            <li key={tag} className="inline-flex items-center gap-1 rounded-md border border-line bg-sunken py-0.5 pr-1 pl-2 text-sm">
              {tag}
              <button
                type="button"
                aria-label={`Remove tag ${tag}`}
                onClick={() => onChange(value.filter((other) => other !== tag))}
                className="inline-flex size-7 cursor-pointer items-center justify-center rounded text-ink-muted hover:bg-line hover:text-ink"
              >
                <CloseIcon className="size-4" />
              </button>
            </li>
          ))}
        </ul>
      ) : null}
      <Input
        id={id}
        value={text}
        invalid={invalid || Boolean(problem)}
        aria-describedby={[describedBy, problem ? problemId : undefined].filter(Boolean).join(' ') || undefined}
        autoComplete="off"
        onChange={(event) => {
          // A pasted "coils, magnets" becomes two tags; the rest stays in the box.
          const parts = event.target.value.split(',');
          if (parts.length > 1) {
            const last = parts.pop() ?? '';
            setText(add(parts) ? last : event.target.value.replace(/,/g, ' ').trimStart());
            return;
          }
          setText(event.target.value);
        }}
        onKeyDown={onKeyDown}
        onBlur={() => {
          // Leaving the box keeps what was typed as a tag: nothing typed is lost.
          if (add([text])) setText('');
          onBlur?.();
        }}
      />
      {problem ? (
        <p id={problemId} className="text-sm font-bold text-danger">
          {problem}
        </p>
      ) : null}
    </div>
  );
}
