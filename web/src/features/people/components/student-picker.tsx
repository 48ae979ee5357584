import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { SearchIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { Loading } from '@/components/ui/spinner';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { usePeople } from '../api/get-people';
import { EmailAddress } from '@/components/ui/email-address';

type Props = {
  /** Students already in the class: listed as enrolled, not selectable. */
  excludeIds: ReadonlySet<string>;
  busy: boolean;
  /** Resolves when the enrolment is saved (the ticks are then cleared); rejects to keep them. */
  onPick: (userIds: string[]) => Promise<unknown>;
};

/** Search the school's students and tick the ones to enrol. */
export function StudentPicker({ excludeIds, busy, onPick }: Props) {
  const searchId = useId();
  const [search, setSearch] = useState('');
  const q = useDebouncedValue(search);
  const [chosen, setChosen] = useState<Set<string>>(new Set());
  const people = usePeople({ q, role: 'student', page: 1, pageSize: 50 });

  function toggle(userId: string, checked: boolean) {
    setChosen((current) => {
      const next = new Set(current);
      if (checked) next.add(userId);
      else next.delete(userId);
      return next;
    });
  }

  const list = people.data?.people ?? [];
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-col gap-1">
        <label htmlFor={searchId} className="font-bold">
          Find students
        </label>
        <div className="relative">
          <SearchIcon className="pointer-events-none absolute top-3 left-3 size-5 text-ink-muted" />
          <Input
            id={searchId}
            value={search}
            onChange={(event) => setSearch(event.target.value)}
            placeholder="Name or e-mail"
            className="pl-10"
            type="search"
          />
        </div>
      </div>
      {people.isPending ? <Loading label="Loading students…" /> : null}
      {people.isError ? <ErrorBanner error={people.error} title="Students could not be loaded" /> : null}
      {people.data ? (
        <ul className="max-h-80 divide-y divide-line overflow-y-auto rounded-md border border-line bg-surface">
          {list.length === 0 ? <li className="px-3 py-3 text-ink-muted">No students match “{q}”.</li> : null}
          {list.map((person) => {
            const enrolled = excludeIds.has(person.userId);
            return (
              <li key={person.userId}>
                <label className="flex cursor-pointer items-start gap-3 px-3 py-2.5 has-disabled:cursor-default">
                  <input
                    type="checkbox"
                    className="mt-1 size-5 accent-copper"
                    disabled={enrolled}
                    checked={enrolled || chosen.has(person.userId)}
                    onChange={(event) => toggle(person.userId, event.target.checked)}
                  />
                  <span className="min-w-0">
                    <span className="block font-bold">{person.name}</span>
                    <EmailAddress email={person.email} className="block text-ink-muted" />
                    {enrolled ? <span className="block text-sm text-teal-strong">Already in this class</span> : null}
                  </span>
                </label>
              </li>
            );
          })}
        </ul>
      ) : null}
      {people.data && people.data.total > list.length ? (
        <p className="text-sm text-ink-muted">
          Showing {list.length} of {people.data.total} students: search to narrow the list.
        </p>
      ) : null}
      <div>
        <Button
          disabled={chosen.size === 0}
          busy={busy}
          onClick={() => {
            onPick([...chosen]).then(
              () => setChosen(new Set()),
              () => undefined, // the page shows the error; keep the ticks so the admin can retry
            );
          }}
        >
          Enrol {chosen.size === 0 ? 'students' : chosen.size === 1 ? '1 student' : `${chosen.size} students`}
        </Button>
      </div>
    </div>
  );
}
