import { useEffect, useId, useRef, useState } from 'react';
import { LESSON_SORTS, LESSON_STATES, LessonListQuerySchema, type LessonListDto, type LessonListQuery } from '@core/contracts';
import { SearchIcon } from '@/components/ui/icons';
import { Input, Select } from '@/components/ui/input';
import { LESSON_STATE_LABELS } from '../lesson-labels';

const SORT_LABELS: Record<(typeof LESSON_SORTS)[number], string> = {
  updated: 'Recently changed',
  title: 'Title, A to Z',
  created: 'Newest first',
};

type FilterUpdate = (current: LessonListQuery) => LessonListQuery;
type LessonFilterBarProps = {
  filters: LessonListQuery;
  /** Tags and owners of the lessons the caller can see (from the list answer). */
  choices: Pick<LessonListDto, 'tags' | 'owners'> | undefined;
  /** The caller, left out of the list of people (they have "Only mine"). */
  meId: string;
  onChange: (update: FilterUpdate, options: { replace: boolean }) => void;
};

/** Typing waits this long before the search goes into the URL (one request per pause, not per key). */
const SEARCH_DELAY_MS = 300;

/** Search, tag, owner, state and order of the lessons list; each change goes into the page URL. */
export function LessonFilterBar({ filters, choices, meId, onChange }: LessonFilterBarProps) {
  const ids = { q: useId(), tag: useId(), owner: useId(), state: useId(), sort: useId() };
  const [text, setText] = useState(filters.q ?? '');
  const [urlQ, setUrlQ] = useState(filters.q ?? '');
  // The back button can change the search in the URL: the box follows it (but keeps what is being typed).
  if ((filters.q ?? '') !== urlQ) {
    setUrlQ(filters.q ?? '');
    if (text.trim() !== (filters.q ?? '')) setText(filters.q ?? '');
  }
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  useEffect(() => () => clearTimeout(timer.current), []);

  function search(value: string) {
    setText(value);
    clearTimeout(timer.current);
    // Typing replaces the history entry: back goes to the previous filters, not to each keystroke.
    timer.current = setTimeout(
      () => onChange((current) => ({ ...current, q: value.trim() || undefined }), { replace: true }),
      SEARCH_DELAY_MS,
    );
  }

  // A tag or person from the link that the list no longer offers stays selectable, so the select shows the truth.
  const tags = [...(choices?.tags ?? [])];
  if (filters.tag && !tags.includes(filters.tag)) tags.unshift(filters.tag);
  const people = (choices?.owners ?? []).filter((owner) => owner.id !== meId);
  const ownerIsPerson = filters.owner !== undefined && filters.owner !== 'me' && filters.owner !== 'others';
  if (ownerIsPerson && !people.some((person) => person.id === filters.owner))
    people.unshift({ id: filters.owner as string, name: 'The chosen person' });

  return (
    <div className="mb-4 grid gap-4 sm:grid-cols-2 lg:grid-cols-[1fr_10rem_12rem_10rem_11rem]">
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.q} className="font-bold">
          Search
        </label>
        <div className="relative">
          <SearchIcon className="pointer-events-none absolute top-3 left-3 size-5 text-ink-muted" />
          <Input
            id={ids.q}
            type="search"
            value={text}
            placeholder="Title, description or recording"
            className="pl-10"
            onChange={(event) => search(event.target.value)}
          />
        </div>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.tag} className="font-bold">
          Topic tag
        </label>
        <Select
          id={ids.tag}
          value={filters.tag ?? ''}
          onChange={(event) => onChange((current) => ({ ...current, tag: event.target.value || undefined }), { replace: false })}
        >
          <option value="">Any tag</option>
          {tags.map((tag) => (
            <option key={tag} value={tag}>
              {tag}
            </option>
          ))}
        </Select>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.owner} className="font-bold">
          Made by
        </label>
        <Select
          id={ids.owner}
          value={filters.owner ?? ''}
          onChange={(event) => {
            const parsed = LessonListQuerySchema.shape.owner.safeParse(event.target.value || undefined);
            onChange((current) => ({ ...current, owner: parsed.success ? parsed.data : undefined }), { replace: false });
          }}
        >
          <option value="">Anyone</option>
          <option value="me">Only me</option>
          <option value="others">Colleagues</option>
          {people.map((person) => (
            <option key={person.id} value={person.id}>
              {person.name}
            </option>
          ))}
        </Select>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.state} className="font-bold">
          State
        </label>
        <Select
          id={ids.state}
          value={filters.state ?? ''}
          onChange={(event) => {
            const parsed = LessonListQuerySchema.shape.state.safeParse(event.target.value || undefined);
            onChange((current) => ({ ...current, state: parsed.success ? parsed.data : undefined }), { replace: false });
          }}
        >
          <option value="">Any state</option>
          {LESSON_STATES.map((state) => (
            <option key={state} value={state}>
              {LESSON_STATE_LABELS[state]}
            </option>
          ))}
        </Select>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.sort} className="font-bold">
          Order
        </label>
        <Select
          id={ids.sort}
          value={filters.sort}
          onChange={(event) => {
            const parsed = LessonListQuerySchema.shape.sort.safeParse(event.target.value);
            const sort = parsed.success ? parsed.data : 'updated';
            onChange((current) => ({ ...current, sort }), { replace: false });
          }}
        >
          {LESSON_SORTS.map((sort) => (
            <option key={sort} value={sort}>
              {SORT_LABELS[sort]}
            </option>
          ))}
        </Select>
      </div>
    </div>
  );
}
