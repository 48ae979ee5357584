import { PageHeader } from '@/components/ui/page-header';
import { RosterImport } from '@/features/roster/components/roster-import';

/** Import many people at once from a CSV roster, checked row by row before anything is saved. */
export default function RosterRoute() {
  return (
    <>
      <PageHeader
        title="Import a roster"
        description="Add many people at once from a CSV file. Pinfield checks every row first and saves nothing until all of them are right."
      />
      <RosterImport />
    </>
  );
}
