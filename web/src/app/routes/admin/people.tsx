import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import { ROLE_LABELS, ROLES, RoleSchema, type Role } from '@core/roles';
import { Button, buttonVariants } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { MailIcon, SearchIcon, UploadIcon } from '@/components/ui/icons';
import { Input, Select } from '@/components/ui/input';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { usePeople } from '@/features/people/api/get-people';
import { PeopleTable } from '@/features/people/components/people-table';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { useSchoolClock } from '../homes/use-school-clock';

const PAGE_SIZE = 25;

/** The school's people: search, filter by role, page through, see who is invited or active, change roles. */
export default function PeopleRoute() {
  const searchId = useId();
  const roleId = useId();
  const clock = useSchoolClock();
  const [search, setSearch] = useState('');
  const [role, setRole] = useState<Role | undefined>();
  const [page, setPage] = useState(1);
  const q = useDebouncedValue(search.trim());
  const people = usePeople({ q: q || undefined, role, page, pageSize: PAGE_SIZE });

  const total = people.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
  const first = total === 0 ? 0 : (page - 1) * PAGE_SIZE + 1;
  const last = Math.min(total, page * PAGE_SIZE);

  return (
    <>
      <PageHeader
        title="People"
        description="Everyone in the school, with their roles. Invited people become active when they first sign in."
        actions={
          <>
            <Link to={paths.admin.invite} className={buttonVariants({ variant: 'primary' })}>
              <MailIcon className="size-5" />
              Invite a person
            </Link>
            <Link to={paths.admin.roster} className={buttonVariants({ variant: 'secondary' })}>
              <UploadIcon className="size-5" />
              Import a roster
            </Link>
          </>
        }
      />
      <div className="mb-4 grid gap-4 sm:grid-cols-[1fr_16rem]">
        <div className="flex flex-col gap-1">
          <label htmlFor={searchId} className="font-bold">
            Search
          </label>
          <div className="relative">
            <SearchIcon className="pointer-events-none absolute top-3 left-3 size-5 text-ink-muted" />
            <Input
              id={searchId}
              type="search"
              value={search}
              placeholder="Name or e-mail"
              className="pl-10"
              onChange={(event) => {
                setSearch(event.target.value);
                setPage(1);
              }}
            />
          </div>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={roleId} className="font-bold">
            Role
          </label>
          <Select
            id={roleId}
            value={role ?? ''}
            onChange={(event) => {
              const parsed = RoleSchema.safeParse(event.target.value);
              setRole(parsed.success ? parsed.data : undefined);
              setPage(1);
            }}
          >
            <option value="">All roles</option>
            {ROLES.map((item) => (
              <option key={item} value={item}>
                {ROLE_LABELS[item]}
              </option>
            ))}
          </Select>
        </div>
      </div>
      {people.isPending ? <Loading label="Loading people…" /> : null}
      {people.isError ? <ErrorBanner error={people.error} title="People could not be loaded" className="mb-4" /> : null}
      {people.data ? (
        <>
          <p aria-live="polite" className="mb-2 text-ink-muted">
            {total === 0 ? 'Nobody found.' : `Showing ${first}–${last} of ${total}.`}
            {people.isFetching ? ' Updating…' : ''}
          </p>
          <PeopleTable people={people.data.people} clock={clock} />
          <nav aria-label="Pages of people" className="mt-4 flex flex-wrap items-center gap-3">
            <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => setPage((value) => value - 1)}>
              Previous page
            </Button>
            <span>
              Page <span className="font-mono">{page}</span> of <span className="font-mono">{pages}</span>
            </span>
            <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => setPage((value) => value + 1)}>
              Next page
            </Button>
          </nav>
        </>
      ) : null}
    </>
  );
}
