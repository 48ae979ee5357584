import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useDepartments } from '@/features/departments/api/get-departments';
import { CreateDepartmentForm } from '@/features/departments/components/create-department-form';
import { DepartmentTable } from '@/features/departments/components/department-table';

/** The school's departments with their class and staff counts, and a form to add one. */
export default function DepartmentsRoute() {
  const departments = useDepartments();
  return (
    <>
      <PageHeader
        title="Departments"
        description="Coordinators see every class of their department; substitutes see the departments they cover."
      />
      <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
        <div className="min-w-0">
          {departments.isPending ? <Loading label="Loading departments…" /> : null}
          {departments.isError ? <ErrorBanner error={departments.error} title="Departments could not be loaded" /> : null}
          {departments.data ? <DepartmentTable departments={departments.data.departments} /> : null}
        </div>
        <Card aria-labelledby="create-department-heading" className="flex h-fit flex-col gap-4">
          <h2 id="create-department-heading" className="text-xl">
            Create a department
          </h2>
          <CreateDepartmentForm />
        </Card>
      </div>
    </>
  );
}
