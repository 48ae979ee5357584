import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { useAdminClasses } from '@/features/classes/api/get-admin-classes';
import { useDepartments } from '@/features/departments/api/get-departments';
import { InviteForm } from '@/features/people/components/invite-form';

/** Invite one person into the school. */
export default function InviteRoute() {
  const departments = useDepartments();
  const classes = useAdminClasses();
  return (
    <>
      <PageHeader
        title="Invite a person"
        description="They get an e-mail with a sign-in link, and appear under People as invited until they sign in."
      />
      {departments.isError ? (
        <ErrorBanner error={departments.error} title="Departments could not be loaded for the form" className="mb-4" />
      ) : null}
      {classes.isError ? <ErrorBanner error={classes.error} title="Classes could not be loaded for the form" className="mb-4" /> : null}
      <Card>
        <InviteForm departments={departments.data?.departments ?? []} classes={classes.data?.classes ?? []} />
      </Card>
    </>
  );
}
