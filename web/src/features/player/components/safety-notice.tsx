import { RichText } from '@/components/rich-text/rich-text';
import { Button } from '@/components/ui/button';
import { AlertIcon } from '@/components/ui/icons';

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
      <p className="text-sm">Your school’s own safety rules and local regulations come first; follow them whenever they differ.</p>
      <div>
        <Button size="lg" onClick={onAcknowledge} className="w-full sm:w-auto">
          I have read the safety notes
        </Button>
      </div>
    </section>
  );
}
