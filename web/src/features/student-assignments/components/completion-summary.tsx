import type { CompletionDto } from '@core/contracts';
import { Card } from '@/components/ui/card';
import { answeredText, watchedText, wholePercent } from '../assignment-words';
import { shortSchoolTime, type SchoolTime } from '../school-time';
import { STATE_ICONS } from './state-icons';

/** Whether the lesson is done, and if not, what is still missing, against the completion rule. */
export function CompletionSummary({ completion, time }: { completion: CompletionDto; time: SchoolTime }) {
  const Icon = STATE_ICONS[completion.done ? 'done' : 'in-progress'];
  const watchedEnough = completion.watchedShare + 1e-9 >= completion.watchShareNeeded;
  const answeredEnough = completion.requiredAnswered >= completion.requiredTotal;
  return (
    <Card aria-labelledby="completion-heading" className="flex flex-col gap-2">
      <h2 id="completion-heading" className="flex items-center gap-2 text-xl">
        <Icon className={completion.done ? 'size-6 text-success' : 'size-6 text-teal'} />
        {completion.done ? 'Done' : 'Not done yet'}
      </h2>
      {completion.done && completion.completedAt ? (
        <p>You finished this lesson on {shortSchoolTime(completion.completedAt, time)}.</p>
      ) : null}
      {completion.done ? null : (
        <p>To finish, watch at least {wholePercent(completion.watchShareNeeded)} % of the recording and answer every required question.</p>
      )}
      <ul className="flex flex-col gap-1">
        <li>
          <span className="font-bold">{watchedEnough ? 'Watched enough:' : 'Still to watch:'}</span> {watchedText(completion)}
        </li>
        <li>
          <span className="font-bold">{answeredEnough ? 'Answered:' : 'Still to answer:'}</span> {answeredText(completion)}
        </li>
      </ul>
    </Card>
  );
}
