import { Button } from '@/components/ui/button';
import { formatClock } from '../logic/watch-text';

/** "Resume at 02:41?": where the student stopped last time, or from the start. */
export function ResumeOffer({ resumeMs, onResume, onDismiss }: { resumeMs: number; onResume: () => void; onDismiss: () => void }) {
  const at = formatClock(resumeMs);
  return (
    <section
      aria-label="Resume"
      className="flex flex-col gap-3 rounded-lg border border-teal bg-teal-soft p-4 sm:flex-row sm:items-center sm:justify-between"
    >
      <p className="font-bold">
        You stopped at {at} last time. Resume at {at}?
      </p>
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button onClick={onResume}>Resume at {at}</Button>
        <Button variant="secondary" onClick={onDismiss}>
          Start from the beginning
        </Button>
      </div>
    </section>
  );
}
