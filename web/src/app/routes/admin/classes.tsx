import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useAdminClasses } from '@/features/classes/api/get-admin-classes';
import { AdminClassTable } from '@/features/classes/components/admin-class-table';
import { CreateClassForm } from '@/features/classes/components/create-class-form';
import { useDepartments } from '@/features/departments/api/get-departments';
import { usePeople } from '@/features/people/api/get-people';

/** All classes of the school, and a form to create one with its department and teacher. */
export default function ClassesRoute() {
  const classes = useAdminClasses();
  const departments = useDepartments();
  const teachers = usePeople({ role: 'teacher', page: 1, pageSize: 100 });
  const teacherOptions = (teachers.data?.people ?? []).map((person) => ({ id: person.userId, name: `${person.name} (${person.email})` }));
  return (
    <>
      <PageHeader
        title="Classes"
        description="Each class has a teacher, a department and a join code. Open a class to enrol or remove students."
      />
      <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
        <div className="min-w-0">
          {classes.isPending ? <Loading label="Loading classes…" /> : null}
          {classes.isError ? <ErrorBanner error={classes.error} title="Classes could not be loaded" /> : null}
          {classes.data ? <AdminClassTable classes={classes.data.classes} classHref={paths.admin.class} /> : null}
        </div>
        <Card aria-labelledby="create-class-heading" className="flex h-fit flex-col gap-4">
          <h2 id="create-class-heading" className="text-xl">
            Create a class
          </h2>
          {departments.isError ? <ErrorBanner error={departments.error} title="Departments could not be loaded" /> : null}
          {teachers.isError ? <ErrorBanner error={teachers.error} title="Teachers could not be loaded" /> : null}
          <CreateClassForm departments={departments.data?.departments ?? []} teachers={teacherOptions} />
        </Card>
      </div>
    </>
  );
}
