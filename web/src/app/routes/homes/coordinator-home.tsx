import { EmptyState } from '@/components/ui/empty-state';
import { ErrorBanner } from '@/components/ui/error-banner';
import { FieldLinesIcon, PeopleIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useDepartmentsOverview } from '@/features/departments/api/get-departments-overview';
import { DepartmentOverview } from '@/features/departments/components/department-overview';

/** A coordinator's home: the department(s) they lead, with staff and classes. */
export default function CoordinatorHomeRoute() {
  const overview = useDepartmentsOverview();
  return (
    <>
      <PageHeader title="Your department" description="The staff and classes of the department you coordinate." />
      {overview.isPending ? <Loading label="Loading your department…" /> : null}
      {overview.isError ? <ErrorBanner error={overview.error} title="Your department could not be loaded" /> : null}
      {overview.data?.departments.length === 0 ? (
        <EmptyState icon={<PeopleIcon className="size-8" />} title="You do not coordinate a department yet">
          Your school admin puts you in a department under People. Its staff and classes then appear here.
        </EmptyState>
      ) : null}
      <div className="flex flex-col gap-8">
        {overview.data?.departments.map((department) => (
          <DepartmentOverview key={department.id} department={department} />
        ))}
      </div>
      <section aria-labelledby="results-heading" className="mt-10 flex flex-col gap-4">
        <h2 id="results-heading" className="text-2xl">
          Lesson results
        </h2>
        <EmptyState icon={<FieldLinesIcon className="size-8" />} title="No results yet">
          Once teachers assign lessons, each class’s completion, where students stopped watching, the hardest checkpoints and the most
          common mistakes will appear here, class beside class.
        </EmptyState>
      </section>
    </>
  );
}
