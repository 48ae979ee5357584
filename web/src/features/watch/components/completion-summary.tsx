import type { CompletionDto } from '@core/contracts';
import { CheckIcon, InfoIcon } from '@/components/ui/icons';
import { plural } from '@/lib/format';

const percent = (share: number) => `${Math.floor(Math.max(0, Math.min(1, share)) * 100)} %`;

/** How far the student is against the completion rule, in words (the bar is decoration). */
export function CompletionSummary({ completion }: { completion: CompletionDto }) {
  const { watchedShare, watchShareNeeded, requiredAnswered, requiredTotal, done } = completion;
  return (
    <section aria-labelledby="completion-heading" className="flex flex-col gap-2 rounded-lg border border-line bg-surface p-4">
      <h2 id="completion-heading" className="flex items-center gap-2 font-bold">
        {done ? <CheckIcon className="size-5 text-success" /> : <InfoIcon className="size-5 text-teal" />}
        {done ? 'Lesson complete' : 'To complete this lesson'}
      </h2>
      <ul className="flex flex-col gap-1 text-sm">
        <li>
          Watched {percent(watchedShare)} of the recording
          {watchShareNeeded > 0 ? ` (${percent(watchShareNeeded)} needed)` : ''}
        </li>
        {requiredTotal > 0 ? (
          <li>
            {requiredAnswered} of {plural(requiredTotal, 'required question')} answered
          </li>
        ) : null}
      </ul>
      <div aria-hidden="true" className="h-2 overflow-hidden rounded-full bg-sunken">
        <div className="h-full bg-teal" style={{ width: percent(watchedShare).replace(' ', '') }} />
      </div>
    </section>
  );
}
