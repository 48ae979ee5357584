import { EmptyState } from '@/components/ui/empty-state';
import { ErrorBanner } from '@/components/ui/error-banner';
import { FieldLinesIcon, PeopleIcon } from '@/components/ui/icons';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useDepartmentsOverview } from '@/features/departments/api/get-departments-overview';
import { DepartmentOverview } from '@/features/departments/components/department-overview';

/** A substitute teacher's home: the departments they cover, and where cover plans will be. */
export default function SubstituteHomeRoute() {
  const overview = useDepartmentsOverview();
  return (
    <>
      <PageHeader title="Your cover" description="The departments you cover, their classes and the colleagues you cover for." />
      <section aria-labelledby="cover-heading" className="mb-10 flex flex-col gap-4">
        <h2 id="cover-heading" className="text-2xl">
          Cover plans and shared lessons
        </h2>
        <EmptyState icon={<FieldLinesIcon className="size-8" />} title="No cover plans yet">
          When a colleague sets you a cover plan (a class, the dates, and the lesson to run), it appears here, together with the lessons
          colleagues share with their department. You can run them with the class, and copy one into your own library without changing the
          original.
        </EmptyState>
      </section>
      {overview.isPending ? <Loading label="Loading your departments…" /> : null}
      {overview.isError ? <ErrorBanner error={overview.error} title="Your departments could not be loaded" /> : null}
      {overview.data?.departments.length === 0 ? (
        <EmptyState icon={<PeopleIcon className="size-8" />} title="You are not covering a department yet">
          Your school admin puts you in the department you cover, under People. It then appears here.
        </EmptyState>
      ) : null}
      <div className="flex flex-col gap-8">
        {overview.data?.departments.map((department) => (
          <DepartmentOverview key={department.id} department={department} />
        ))}
      </div>
    </>
  );
}
