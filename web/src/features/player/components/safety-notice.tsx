import { RichText } from '@/components/rich-text/rich-text';
import { Button } from '@/components/ui/button';
import { AlertIcon } from '@/components/ui/icons';
import { notesDeferToSchool } from '../logic/safety-deferral';

/**
 * The line deferring to the school's own rules, under the lesson's safety notes; left out when the
 * notes already say so themselves (the studio's suggested cautions do), so it is not said twice.
 */
export function SchoolRulesLine({ notes }: { notes: string }) {
  if (notesDeferToSchool(notes)) return null;
  return <p className="text-sm">Your school’s own safety rules and local regulations come first; follow them whenever they differ.</p>;
}

/** The lesson's safety notes, acknowledged before the video can start. */
export function SafetyNotice({ notes, onAcknowledge }: { notes: string; onAcknowledge: () => void }) {
  return (
    <section
      aria-labelledby="safety-notes-heading"
      className="flex flex-col gap-3 rounded-lg border-l-4 border-copper bg-copper-soft p-4 sm:p-5"
    >
      <h2 id="safety-notes-heading" className="flex items-center gap-2 text-xl font-bold">
        <AlertIcon className="size-6 shrink-0 text-copper" />
        Safety notes before you watch
      </h2>
      <RichText markdown={notes} />
      <SchoolRulesLine notes={notes} />
      <div>
        <Button size="lg" onClick={onAcknowledge} className="w-full sm:w-auto">
          I have read the safety notes
        </Button>
      </div>
    </section>
  );
}
