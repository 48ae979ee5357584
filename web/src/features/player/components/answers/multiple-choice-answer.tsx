import { useId, useState } from 'react';
import { ChoiceList } from './choice-list';
import { ProblemMessage } from './problem-message';
import { SubmitRow } from './submit-row';
import type { AnswerFormProps } from './answer-props';

export function MultipleChoiceAnswer({ checkpoint, locked, busy, problem, onSubmit }: AnswerFormProps<'multiple-choice'>) {
  const [chosen, setChosen] = useState<string[]>([]);
  const problemId = useId();
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        onSubmit({ kind: 'multiple-choice', optionIds: chosen });
      }}
    >
      <ChoiceList
        legend={checkpoint.allowSeveral ? 'Tick every option that applies' : 'Choose one option'}
        options={checkpoint.options}
        several={checkpoint.allowSeveral}
        chosen={chosen}
        disabled={locked || busy}
        onChange={setChosen}
        describedBy={problem ? problemId : undefined}
      />
      <ProblemMessage id={problemId} problem={problem} />
      <SubmitRow label="Check my answer" busy={busy} locked={locked} />
    </form>
  );
}
