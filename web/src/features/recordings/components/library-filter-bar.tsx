import { useEffect, useId, useRef, useState } from 'react';
import { RECORDING_SORTS, RECORDING_STATES, RecordingListQuerySchema, type RecordingListQuery } from '@core/contracts';
import { SearchIcon } from '@/components/ui/icons';
import { Input, Select } from '@/components/ui/input';

const STATE_LABELS: Record<(typeof RECORDING_STATES)[number], string> = {
  uploading: 'Uploading',
  processing: 'Processing',
  ready: 'Ready',
  failed: 'Failed',
};
const SORT_LABELS: Record<(typeof RECORDING_SORTS)[number], string> = {
  newest: 'Newest first',
  oldest: 'Oldest first',
  title: 'Title, A to Z',
  duration: 'Longest first',
  size: 'Largest first',
};

type FilterUpdate = (current: RecordingListQuery) => RecordingListQuery;
type FilterBarProps = { filters: RecordingListQuery; onChange: (update: FilterUpdate, options: { replace: boolean }) => void };

/** Typing waits this long before the search goes into the URL (one request per pause, not per key). */
const SEARCH_DELAY_MS = 300;

/** Search, state, whose recordings and order; each change goes into the page URL. */
export function LibraryFilterBar({ filters, onChange }: FilterBarProps) {
  const ids = { q: useId(), state: useId(), owner: useId(), sort: useId() };
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

  return (
    <div className="mb-4 grid gap-4 sm:grid-cols-2 lg:grid-cols-[1fr_11rem_13rem_11rem]">
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
            placeholder="Title or file name"
            className="pl-10"
            onChange={(event) => search(event.target.value)}
          />
        </div>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.state} className="font-bold">
          State
        </label>
        <Select
          id={ids.state}
          value={filters.state ?? ''}
          onChange={(event) => {
            const parsed = RecordingListQuerySchema.shape.state.safeParse(event.target.value || undefined);
            onChange((current) => ({ ...current, state: parsed.success ? parsed.data : undefined }), { replace: false });
          }}
        >
          <option value="">Any state</option>
          {RECORDING_STATES.map((state) => (
            <option key={state} value={state}>
              {STATE_LABELS[state]}
            </option>
          ))}
        </Select>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.owner} className="font-bold">
          Uploaded by
        </label>
        <Select
          id={ids.owner}
          value={filters.owner}
          onChange={(event) => {
            const owner = event.target.value === 'mine' ? 'mine' : 'school';
            onChange((current) => ({ ...current, owner }), { replace: false });
          }}
        >
          <option value="school">Anyone in the school</option>
          <option value="mine">Only me</option>
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
            const parsed = RecordingListQuerySchema.shape.sort.safeParse(event.target.value);
            const sort = parsed.success ? parsed.data : 'newest';
            onChange((current) => ({ ...current, sort }), { replace: false });
          }}
        >
          {RECORDING_SORTS.map((sort) => (
            <option key={sort} value={sort}>
              {SORT_LABELS[sort]}
            </option>
          ))}
        </Select>
      </div>
    </div>
  );
}
