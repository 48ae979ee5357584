import { Card } from '@/components/ui/card';
import { ErrorBanner } from '@/components/ui/error-banner';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useSchool } from '@/features/school/api/get-school';
import { EmailDomains } from '@/features/school/components/email-domains';

/** The school's settings an admin manages here: the e-mail domains that may join classes by code. */
export default function SchoolRoute() {
  const school = useSchool();
  return (
    <>
      <PageHeader title="School" description="Settings that apply to everyone in the school." />
      {school.isPending ? <Loading label="Loading the school…" /> : null}
      {school.isError ? <ErrorBanner error={school.error} title="The school could not be loaded" /> : null}
      {school.data ? (
        <div className="grid items-start gap-8 lg:grid-cols-2">
          <Card className="flex flex-col gap-2">
            <h2 className="text-xl">{school.data.name}</h2>
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
              <dt className="font-bold">Time zone</dt>
              <dd className="font-mono">{school.data.timeZone}</dd>
              <dt className="font-bold">Locale</dt>
              <dd className="font-mono">{school.data.locale}</dd>
            </dl>
            <p className="text-sm text-ink-muted">Dates are entered and shown in this time zone; numbers are read in this locale.</p>
          </Card>
          <Card aria-labelledby="domains-heading" className="flex flex-col gap-3">
            <h2 id="domains-heading" className="text-xl">
              E-mail domains for class codes
            </h2>
            <p>
              A student whose verified e-mail address ends in one of these domains may join a class with its code. Anyone else gets a
              neutral answer and needs an invitation.
            </p>
            <EmailDomains school={school.data} />
          </Card>
        </div>
      ) : null}
    </>
  );
}
